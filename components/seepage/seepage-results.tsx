import type { SeepageSolution } from "@/lib/seepage";
import { PIPING_FACTOR_RULE } from "@/lib/seepage";
import { formatValue } from "@/lib/materials/parameter-form";
import { Caution } from "@/components/ui/caution";
import { FlowNetCaption, sci } from "./flow-net-view";

const at = (p: readonly [number, number]) => `(${formatValue(p[0], 1)}, ${formatValue(p[1], 1)})`;

/** q per metre and along the crest, the hand check, the exits with their piping factors, warnings and cautions. */
export function SeepageResults({ solution, elapsedMs }: { solution: SeepageSolution; elapsedMs: number }) {
  return (
    <section className="space-y-3" data-testid="seepage-results">
      <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
        <dt className="text-ink-soft">Seepage per metre of section q</dt>
        <dd className="tabular-nums" data-testid="seepage-q">
          {sci(solution.q)} m³/s/m
        </dd>
        <dt className="text-ink-soft">Along the crest</dt>
        <dd className="tabular-nums" data-testid="seepage-q-total">
          {solution.qTotal !== null
            ? `${sci(solution.qTotal)} m³/s (${formatValue(solution.qTotal * 86400, 1)} m³/day)`
            : "give a crest length to see it"}
        </dd>
        <dt className="text-ink-soft">Flow in, flow out</dt>
        <dd className="tabular-nums">
          {sci(solution.qIn)}, {sci(solution.qOut)} m³/s/m
        </dd>
        <dt className="text-ink-soft">Solve</dt>
        <dd className="tabular-nums">
          {solution.mesh.nodes} nodes, {solution.mesh.elements} elements, {solution.iterations.freeSurface} free-surface
          rounds{solution.iterations.converged ? "" : " (not settled)"}, {Math.round(elapsedMs)} ms
        </dd>
      </dl>
      <p className="text-sm text-ink-soft">
        <FlowNetCaption solution={solution} checkOnly />
      </p>
      <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
        <table className="w-full text-sm" data-testid="exit-gradients">
          <caption className="px-3 py-2 text-left text-xs text-ink-soft">
            Where water leaves the section: the largest gradient on each stretch, i_cr = (γsat − γw)/γw, and the factor
            against piping F = i_cr/i (about {PIPING_FACTOR_RULE} or more is common practice for earth embankments, not
            a code value).
          </caption>
          <thead className="bg-paper-sunk text-left text-xs text-ink-soft">
            <tr>
              <th className="px-3 py-2 font-medium">Stretch</th>
              <th className="px-3 py-2 font-medium">At</th>
              <th className="px-3 py-2 font-medium">Material</th>
              <th className="px-3 py-2 text-right font-medium">i exit</th>
              <th className="px-3 py-2 text-right font-medium">i_cr</th>
              <th className="px-3 py-2 text-right font-medium">F piping</th>
            </tr>
          </thead>
          <tbody>
            {solution.exitGradients.length === 0 ? (
              <tr>
                <td colSpan={6} className="px-3 py-2 text-ink-soft">
                  No water leaves through the ground or the sides: all of it goes to drains or pools.
                </td>
              </tr>
            ) : null}
            {solution.exitGradients.map((g, i) => {
              const low = g.pipingFactor !== null && g.pipingFactor < PIPING_FACTOR_RULE;
              return (
                <tr key={i} className="border-t border-rule" data-low={low ? "yes" : "no"}>
                  <td className="px-3 py-1.5 tabular-nums">
                    {at(g.from)} to {at(g.to)}
                  </td>
                  <td className="px-3 py-1.5 tabular-nums">{at([g.x, g.y])}</td>
                  <td className="px-3 py-1.5">{g.material}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums" data-testid="exit-i">
                    {formatValue(g.i, 3)}
                  </td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{formatValue(g.iCritical, 2)}</td>
                  <td className={`px-3 py-1.5 text-right tabular-nums ${low ? "font-semibold text-alarm-700" : ""}`}>
                    {g.pipingFactor === null ? "no γsat" : formatValue(g.pipingFactor, 2)}
                    {low ? " — below 3" : ""}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {solution.warnings.length > 0 ? (
        <ul className="list-disc pl-5 text-sm text-clay-700" data-testid="seepage-warnings">
          {solution.warnings.map((w, i) => (
            <li key={i}>{w.message}</li>
          ))}
        </ul>
      ) : null}
      <ul className="list-disc pl-5 text-xs text-ink-soft">
        {solution.cautions.map((c, i) => (
          <li key={i}>{c}</li>
        ))}
      </ul>
      <Caution />
    </section>
  );
}
