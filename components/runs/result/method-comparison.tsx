import type { GridSearchSuccess } from "@/lib/stability";
import type { RigorousRunPart } from "@/lib/runs/record/rigorous-part";
import { formatFs, verdictOf, verdictWords } from "@/lib/runs/view/verdict";
import { INTERSLICE_NAME, methodRows, type MethodCell } from "@/lib/runs/view/rigorous-text";
import type { SolutionChoice } from "@/lib/runs/view/surface-overlay";

export interface MethodComparisonProps {
  result: GridSearchSuccess;
  part?: RigorousRunPart;
  requiredFs?: number;
  choices: SolutionChoice[];
  /** The solution drawn on the canvas and listed in the forces table. */
  chosen: string | null;
  onChoose: (key: string) => void;
}

function Cell({ cell, requiredFs, testid }: { cell: MethodCell; requiredFs?: number; testid: string }) {
  if (cell === null) return <td className="py-1.5 pr-3 text-ink-faint">—</td>;
  if ("note" in cell)
    return (
      <td className="py-1.5 pr-3 italic text-ink-soft" data-testid={testid}>
        {cell.note}
      </td>
    );
  const v = verdictOf(cell.fs, requiredFs);
  return (
    <td className="py-1.5 pr-3 tabular-nums" data-testid={testid}>
      <span className="text-base font-semibold">{formatFs(cell.fs)}</span>
      {cell.lambda !== null ? <span className="ml-2 text-xs text-ink-soft">λ = {cell.lambda.toFixed(3)}</span> : null}
      {v !== "none" ? (
        <span className={`block text-xs ${v === "fail" ? "text-alarm-700" : "text-ink-soft"}`}>
          {verdictWords(v, requiredFs)}
        </span>
      ) : null}
    </td>
  );
}

/**
 * Every method of the run side by side: on the critical circle and on the drawn surface, with λ
 * for the methods that have one, then the warnings of each rigorous solution with their place.
 */
export function MethodComparison({ result, part, requiredFs, choices, chosen, onChoose }: MethodComparisonProps) {
  const rows = methodRows(result, part);
  const hasSurface = Boolean(part?.surface);
  const hasSearched = part?.search === "surfaces";
  const usesMp = rows.some((r) => r.method === "morgenstern-price");
  return (
    <section className="panel space-y-3 p-4 text-sm" data-testid="method-comparison" aria-label="Methods side by side">
      <table className="w-full text-left">
        <caption className="mb-2 text-left text-xs font-medium uppercase tracking-wide text-ink-soft">
          Methods side by side{requiredFs !== undefined ? `, required FS ${requiredFs.toFixed(2)}` : ""}
        </caption>
        <thead className="text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-3 font-medium">Method</th>
            <th className="py-1 pr-3 font-medium">Critical circle</th>
            {hasSearched ? <th className="py-1 pr-3 font-medium">Searched surface</th> : null}
            {hasSurface ? <th className="py-1 pr-3 font-medium">Drawn surface</th> : null}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.method} className="border-t border-rule align-top" data-testid={`method-row-${r.method}`}>
              <th scope="row" className="py-1.5 pr-3 font-normal">
                {r.name}
              </th>
              <Cell cell={r.circle} requiredFs={requiredFs} testid={`method-circle-${r.method}`} />
              {hasSearched ? (
                <Cell cell={r.searched} requiredFs={requiredFs} testid={`method-searched-${r.method}`} />
              ) : null}
              {hasSurface ? (
                <Cell cell={r.surface} requiredFs={requiredFs} testid={`method-surface-${r.method}`} />
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-ink-faint">
        Each method on its own critical circle.{" "}
        {hasSearched
          ? "The surfaces search started Spencer and Morgenstern–Price from their circles and from wedges along the weakest layers. "
          : ""}
        {usesMp && part ? `Morgenstern–Price with a ${INTERSLICE_NAME[part.interslice]}. ` : ""}
        Bishop&apos;s simplified and the ordinary method assume a circle, so they give no factor on a drawn surface.
      </p>
      {choices.length > 0 ? (
        <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Solution shown">
          <span className="text-xs text-ink-soft">Line of thrust and forces shown for</span>
          {choices.map((c) => (
            <button
              key={c.key}
              type="button"
              aria-pressed={chosen === c.key}
              onClick={() => onChoose(c.key)}
              className={`rounded-md border border-rule px-2 py-0.5 text-xs ${
                chosen === c.key ? "bg-ink text-paper" : "bg-paper-raised hover:bg-paper-sunk"
              }`}
            >
              {c.label}
            </button>
          ))}
        </div>
      ) : null}
      <RigorousWarnings choices={choices} />
    </section>
  );
}

function RigorousWarnings({ choices }: { choices: SolutionChoice[] }) {
  const lines = choices.flatMap((c) => c.lines.map((l) => ({ ...l, who: c.label })));
  if (lines.length === 0) return null;
  return (
    <div data-testid="rigorous-warnings">
      <h3 className="label">Where the solutions need a look</h3>
      <ul className="space-y-2">
        {lines.map((l, i) => (
          <li key={i} className="border-l-2 border-clay-500 pl-3" data-code={l.code}>
            <p className="font-medium text-ink">
              {l.who}: {l.headline}
              {l.place ? `, ${l.place}` : ""}.
            </p>
            <p className="text-xs text-ink-faint">{l.detail}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
