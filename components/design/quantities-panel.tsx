"use client";

import type { CompactionSpec, FillQuantities } from "@/lib/design";
import { formatCount } from "@/lib/format";

export interface QuantitiesPanelProps {
  quantities: FillQuantities;
  /** One per fill material that has a compaction test; empty when none has. */
  specs: CompactionSpec[];
  fillKeys: string[];
}

const m3 = (v: number) => formatCount(Math.round(v));

/** Cross-section areas and volumes of the fill, with the placement specification beside them. */
export function QuantitiesPanel({ quantities: q, specs, fillKeys }: QuantitiesPanelProps) {
  return (
    <section
      className="panel grid gap-4 p-4 lg:grid-cols-2"
      aria-labelledby="quantities-heading"
      data-testid="quantities"
    >
      <div>
        <h3 id="quantities-heading" className="text-base font-semibold">
          Fill quantities
        </h3>
        <table className="mt-1 w-full text-sm">
          <thead className="text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th scope="col" className="text-left">
                Part
              </th>
              <th scope="col" className="text-right">
                Area (m²)
              </th>
              <th scope="col" className="text-right">
                Volume for {q.crestLength} m (m³)
              </th>
            </tr>
          </thead>
          <tbody>
            <tr className="border-t border-rule">
              <th scope="row" className="py-1 text-left font-normal">
                Whole section above the foundation
              </th>
              <td className="text-right tabular-nums">{q.sectionArea.toFixed(1)}</td>
              <td className="text-right tabular-nums">{m3(q.sectionArea * q.crestLength)}</td>
            </tr>
            <tr className="border-t border-rule">
              <th scope="row" className="py-1 text-left font-normal">
                Earth fill
              </th>
              <td className="text-right tabular-nums" data-testid="fill-area">
                {q.fillArea.toFixed(1)}
              </td>
              <td className="text-right tabular-nums" data-testid="fill-volume">
                {m3(q.fillVolume)}
              </td>
            </tr>
            {q.coreArea !== null && q.shellArea !== null ? (
              <>
                <tr className="border-t border-rule">
                  <th scope="row" className="py-1 pl-3 text-left font-normal">
                    of which core
                  </th>
                  <td className="text-right tabular-nums">{q.coreArea.toFixed(1)}</td>
                  <td className="text-right tabular-nums">{m3(q.coreVolume ?? 0)}</td>
                </tr>
                <tr className="border-t border-rule">
                  <th scope="row" className="py-1 pl-3 text-left font-normal">
                    of which shells
                  </th>
                  <td className="text-right tabular-nums">{q.shellArea.toFixed(1)}</td>
                  <td className="text-right tabular-nums">{m3(q.shellVolume ?? 0)}</td>
                </tr>
              </>
            ) : null}
            <tr className="border-t border-rule">
              <th scope="row" className="py-1 text-left font-normal">
                Toe drain
              </th>
              <td className="text-right tabular-nums">{q.drainArea.toFixed(1)}</td>
              <td className="text-right tabular-nums">{m3(q.drainVolume)}</td>
            </tr>
          </tbody>
        </table>
        <p className="mt-1 text-xs text-ink-soft">
          Areas by the shoelace formula on the generated outline; volumes take the section as a prism over the crest
          length, an upper bound where the dam is lower toward the abutments.
        </p>
      </div>
      <div data-testid="compaction-spec">
        <h3 className="text-base font-semibold">Compaction specification</h3>
        {specs.length === 0 ? (
          <p className="mt-1 text-sm text-ink-soft">
            No compaction test is recorded for {fillKeys.join(" or ")}. Add one on the material&apos;s page to get the
            acceptance window.
          </p>
        ) : (
          specs.map((s) => (
            <div key={s.materialKey} className="mt-1 text-sm">
              <p className="font-medium">
                {s.materialKey}: from “{s.setName}”
              </p>
              <ul className="list-disc pl-5">
                <li>
                  Maximum dry density {s.maxDryDensity.toFixed(3)} Mg/m³ at optimum moisture{" "}
                  {s.optimumMoisture.toFixed(1)} %.
                </li>
                <li>
                  Place to at least {s.percent} % of it: dry density ≥{" "}
                  <strong data-testid="spec-min-density">{s.minDryDensity.toFixed(3)} Mg/m³</strong>.
                </li>
                <li>
                  Moisture content between{" "}
                  <strong data-testid="spec-moisture">
                    {s.moistureFrom.toFixed(1)} % and {s.moistureTo.toFixed(1)} %
                  </strong>
                  {s.extrapolated ? " (a limit read beyond the tested points: confirm with another test)" : ""}.
                </li>
                {s.dryMassForVolume !== null ? (
                  <li>Dry soil for the fill volume at that density: about {m3(s.dryMassForVolume)} t.</li>
                ) : null}
              </ul>
              {s.warnings.length ? <p className="text-xs text-ink-soft">Test notes: {s.warnings.join("; ")}.</p> : null}
            </div>
          ))
        )}
      </div>
    </section>
  );
}
