"use client";

import { lineToText, type FormValues, type PhreaticOutcome, type PipingAtExits } from "@/lib/design";
import { FieldError } from "@/components/ui/form-message";
import { formatScientific } from "@/lib/format";

const SECONDS_PER_DAY = 86400;
const sci = (v: number) => formatScientific(v, 2);

function Row({ term, value, from }: { term: string; value: string; from: string }) {
  return (
    <tr className="border-t border-rule">
      <th scope="row" className="py-1 pr-3 text-left font-normal">
        {term}
      </th>
      <td className="py-1 pr-3 text-right tabular-nums">{value}</td>
      <td className="py-1 text-xs text-ink-soft">{from}</td>
    </tr>
  );
}

/** Piping where the line shows water leaving the fill: the face above the drain and the toe. */
function PipingAtExitsView({ piping }: { piping: PipingAtExits }) {
  const tone =
    piping.verdict === "not-adequate"
      ? "border-alarm-600 text-alarm-700"
      : piping.verdict === "adequate"
        ? "border-clay-500"
        : "border-rule";
  const headline =
    piping.verdict === "no-unprotected-exit"
      ? "Piping: no unprotected exit on this line"
      : piping.verdict === "adequate"
        ? "Piping at the face exit: factor met"
        : "Piping at the face exit: factor not met";
  return (
    <div className={`mt-2 border-l-2 pl-3 text-sm ${tone}`} data-testid="piping-exits" data-verdict={piping.verdict}>
      <p className="font-medium">
        {piping.verdict === "not-adequate" ? "✕ " : piping.verdict === "adequate" ? "✓ " : ""}
        {headline}
      </p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5 text-ink-soft">
        {piping.findings.map((f) => (
          <li key={f}>{f}</li>
        ))}
      </ul>
      <p className="mt-1 text-xs text-ink-faint">
        Critical gradient i_cr = (γsat − γw)/γw = {piping.criticalGradient.toFixed(3)}; required factor{" "}
        {piping.required.toFixed(1)}. Gradients inside the fill need a seepage solution (flow net).
      </p>
    </div>
  );
}

/** Seepage and piping of one pool with every value they came from, or why the method does not apply. */
function PoolSeepage({ outcome, crestLength }: { outcome: PhreaticOutcome; crestLength: number }) {
  const s = outcome.seepage;
  const title = `${outcome.pool === "normal" ? "Normal" : "Flood"} pool at ${outcome.poolLevel.toFixed(2)} m`;
  if (outcome.source === "hand-drawn") {
    return (
      <div>
        <h4 className="text-sm font-semibold">{title}</h4>
        <p className="text-sm text-ink-soft">
          Phreatic line drawn by hand: the seepage quantity is not computed from it; use a flow net.
        </p>
        {outcome.piping ? <PipingAtExitsView piping={outcome.piping} /> : null}
      </div>
    );
  }
  if (outcome.source === "seepage-solution" && outcome.solution) {
    const fe = outcome.solution;
    const least = fe.leastPipingFactor;
    return (
      <div data-testid={`seepage-fe-${outcome.pool}`}>
        <h4 className="text-sm font-semibold">{title}</h4>
        <p className="text-sm text-ink-soft">
          Phreatic surface and pore pressures from the finite-element seepage solution (the basic parabola does not
          apply to a zoned fill or a pervious foundation); a drawdown starts from this surface.
        </p>
        <table className="mt-1 w-full text-sm">
          <tbody>
            <Row term="Seepage q per metre" value={`${sci(fe.q)} m³/s/m`} from="through the section (qIn ≈ qOut)" />
            <Row
              term={`Seepage for ${crestLength} m of dam`}
              value={`${sci(fe.q * crestLength)} m³/s`}
              from="q × crest length (upper bound: the section is the highest)"
            />
            <Row term="Mesh" value={`${fe.nodes} nodes`} from={`elements of about ${fe.meshSize.toPrecision(2)} m`} />
            {least ? (
              <Row
                term="Least factor against piping"
                value={(least.pipingFactor ?? 0).toFixed(1)}
                from={`i_cr / i_exit at (${least.x.toFixed(1)}, ${least.y.toFixed(1)}) m, ${least.material}`}
              />
            ) : null}
          </tbody>
        </table>
        {outcome.piping ? <PipingAtExitsView piping={outcome.piping} /> : null}
        {outcome.limits.map((l) => (
          <p key={l.code} className="mt-1 text-xs text-ink-soft">
            {l.message}
          </p>
        ))}
      </div>
    );
  }
  if (!s || !s.ok) {
    return (
      <div data-testid={`seepage-limits-${outcome.pool}`}>
        <h4 className="text-sm font-semibold">{title}</h4>
        <p className="text-sm font-medium text-alarm-700">
          Outside the limits of the Kozeny–Casagrande construction: no line was drawn.
        </p>
        <ul className="mt-1 list-disc pl-5 text-sm">
          {outcome.limits
            .filter((l) => l.severity === "error")
            .map((l) => (
              <li key={l.code}>
                <code className="text-xs">{l.code}</code> {l.message}
              </li>
            ))}
        </ul>
        {outcome.piping ? <PipingAtExitsView piping={outcome.piping} /> : null}
      </div>
    );
  }
  const c = s.construction;
  const q = s.flow.perMetre;
  return (
    <div data-testid={`seepage-${outcome.pool}`}>
      <h4 className="text-sm font-semibold">{title}</h4>
      <table className="mt-1 w-full text-sm">
        <thead className="sr-only">
          <tr>
            <th>Quantity</th>
            <th>Value</th>
            <th>From</th>
          </tr>
        </thead>
        <tbody>
          <Row term="Head h" value={`${c.h.toFixed(2)} m`} from="pool − foundation top (impervious base)" />
          <Row
            term="Wetted face projection m"
            value={`${c.m.toFixed(2)} m`}
            from="upstream toe to where the pool meets the face"
          />
          <Row
            term="Distance d"
            value={`${c.d.toFixed(2)} m`}
            from={
              "drain start − point 0.3·m upstream of the pool's edge" + (c.parabola.xScale !== 1 ? ", × √(kv/kh)" : "")
            }
          />
          <Row term="y0" value={`${c.y0.toFixed(3)} m`} from="√(h² + d²) − d (Kozeny's basic parabola)" />
          <Row
            term="Seepage q per metre"
            value={`${sci(q)} m³/s/m`}
            from={`√(kh·kv)·y0 = ${(q * SECONDS_PER_DAY).toFixed(4)} m³/day per metre`}
          />
          <Row
            term={`Seepage for ${crestLength} m of dam`}
            value={`${sci(q * crestLength)} m³/s`}
            from={
              `q × crest length = ${(q * crestLength * SECONDS_PER_DAY).toFixed(2)} m³/day ` +
              "(upper bound: the section is the highest)"
            }
          />
        </tbody>
      </table>
      {outcome.piping ? <PipingAtExitsView piping={outcome.piping} /> : null}
      {s.limits
        // The drain entry's i = 1 is not an exit; PipingAtExitsView says what is assessed instead.
        .filter((l) => l.severity === "warning" && l.code !== "W_SEEP_EXIT_INTO_FILTER")
        .map((l) => (
          <p key={l.code} className="mt-1 text-xs text-ink-soft">
            {l.message}
          </p>
        ))}
    </div>
  );
}

export interface SeepagePanelProps {
  normal: PhreaticOutcome;
  flood: PhreaticOutcome;
  crestLength: number;
  values: FormValues;
  errors: Record<string, string[]>;
  onChange: (key: string, value: string) => void;
}

/** Seepage, piping and the hand-drawn line editor for both pools. */
export function SeepagePanel({ normal, flood, crestLength, values, errors, onChange }: SeepagePanelProps) {
  return (
    <section className="panel space-y-4 p-4" aria-labelledby="seepage-heading">
      <h3 id="seepage-heading" className="text-base font-semibold">
        Phreatic line, seepage and piping
      </h3>
      <div className="grid gap-4 lg:grid-cols-2">
        <PoolSeepage outcome={normal} crestLength={crestLength} />
        <PoolSeepage outcome={flood} crestLength={crestLength} />
      </div>
      <details
        className="text-sm"
        open={Boolean(values["handLines.normal"] || values["handLines.flood"]) || normal.source === "none"}
      >
        <summary className="cursor-pointer font-medium">Edit the line by hand</summary>
        <p className="mt-1 text-xs text-ink-soft">
          One point per line as “x, y” in metres, left to right. A hand-drawn line replaces the construction for that
          pool and stays as drawn when the sweep changes the faces. Clear the box to go back to the construction.
        </p>
        <div className="mt-2 grid gap-3 lg:grid-cols-2">
          {(
            [
              ["normal", normal],
              ["flood", flood],
            ] as const
          ).map(([pool, outcome]) => (
            <div key={pool}>
              <label className="label" htmlFor={`hand-${pool}`}>
                {pool === "normal" ? "Normal" : "Flood"} pool line
              </label>
              <textarea
                id={`hand-${pool}`}
                rows={6}
                className="field font-mono text-xs"
                value={values[`handLines.${pool}`] ?? ""}
                placeholder={outcome.line ? lineToText(outcome.line.slice(0, 4)) + "\n…" : "0, 16\n24, 16\n…"}
                onChange={(e) => onChange(`handLines.${pool}`, e.target.value)}
              />
              {!values[`handLines.${pool}`] && outcome.line ? (
                <button
                  type="button"
                  className="btn-quiet mt-1 text-xs"
                  onClick={() => onChange(`handLines.${pool}`, lineToText(outcome.line))}
                >
                  Start from the constructed line
                </button>
              ) : null}
              <FieldError
                messages={Object.entries(errors)
                  .filter(([k]) => k.startsWith(`handLines.${pool}`))
                  .flatMap(([, v]) => v)}
              />
            </div>
          ))}
        </div>
      </details>
    </section>
  );
}
