"use client";

import { sweepCase, type SweepReading } from "@/lib/design";
import { formatCount } from "@/lib/format";

export interface RecommendationPanelProps {
  reading: SweepReading;
  /** Whether the pair, rechecked under every case, meets every required FS (null while unknown). */
  recheckOk: boolean | null;
  /** Fill area (m³/m) of the pair, and of the faces as entered, for the cost of flatter faces. */
  pairFillArea: number | null;
  enteredFillArea: number;
  entered: { upstream: number; downstream: number };
  crestLength: number;
}

const m3 = (v: number) => formatCount(Math.round(v));

/** The steepest pair of face slopes that meets every required FS, and what it costs in fill. */
export function RecommendationPanel({
  reading,
  recheckOk,
  pairFillArea,
  enteredFillArea,
  entered,
  crestLength,
}: RecommendationPanelProps) {
  return (
    <section className="panel space-y-3 p-4" aria-labelledby="recommendation-heading" data-testid="recommendation">
      <h3 id="recommendation-heading" className="text-base font-semibold">
        Steepest faces that meet every required FS
      </h3>
      <dl className="grid gap-3 sm:grid-cols-2">
        {(["upstream", "downstream"] as const).map((face) => {
          const f = reading.faces[face];
          return (
            <div key={face} className="rounded-md border border-rule p-3">
              <dt className="text-xs font-medium uppercase tracking-wide text-ink-soft">{face} face</dt>
              <dd
                className="text-2xl font-semibold tabular-nums"
                data-testid={`recommended-${face}`}
                data-ratio={f.ratio ?? ""}
              >
                {f.ratio === null ? "none in the range" : `${f.ratio.toFixed(2)}H:1V`}
              </dd>
              <dd className="text-xs text-ink-soft">
                {f.ratio === null
                  ? `${f.governing ? sweepCase(f.governing).label : "A case"} does not reach its required FS ` +
                    "even at the flattest ratio tried: widen the range, add a berm, or change the materials."
                  : `Governed by ${sweepCase(f.governing!).label.toLowerCase()}; ` +
                    `entered ${entered[face].toFixed(2)}H:1V.`}
              </dd>
              {f.fillArea !== null ? (
                <dd className="text-xs text-ink-soft">
                  Fill at this slope, other face as entered: {f.fillArea.toFixed(1)} m³/m (
                  {m3(f.fillArea * crestLength)} m³).
                </dd>
              ) : null}
            </div>
          );
        })}
      </dl>
      {reading.pair && pairFillArea !== null ? (
        <p className="text-sm" data-testid="pair-fill">
          The pair {reading.pair.upstream.toFixed(2)} / {reading.pair.downstream.toFixed(2)} needs{" "}
          {pairFillArea.toFixed(1)} m³ of fill per metre ({m3(pairFillArea * crestLength)} m³ for {crestLength} m),
          against {enteredFillArea.toFixed(1)} m³/m for the faces as entered (
          {pairFillArea >= enteredFillArea ? "+" : ""}
          {(((pairFillArea - enteredFillArea) / enteredFillArea) * 100).toFixed(0)} %).{" "}
          {recheckOk === null ? (
            "Rechecking the pair…"
          ) : recheckOk ? (
            <strong className="text-moss-700">Rechecked as a pair: every case meets its required FS.</strong>
          ) : (
            <strong className="text-alarm-700">
              Rechecked as a pair, a case falls short (the upstream slope moved the phreatic line): flatten that face
              one step and sweep again.
            </strong>
          )}
        </p>
      ) : null}
    </section>
  );
}
