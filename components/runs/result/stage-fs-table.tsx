import { formatFs, verdictOf } from "@/lib/runs/view/verdict";
import { METHOD_NAME } from "@/lib/runs/view/warning-text";
import { VARIANT_TEXT, stageCells, type StageCell, type StagedView } from "@/lib/runs/view/staged-view";
import { VerdictMark } from "@/components/runs/result/verdict-mark";

type Method = "bishop" | "fellenius";

/** Each stage's factor of safety of a staged rapid drawdown, per method; the final row is the run's FS. */
export function StageFsTable({ staged, requiredFs }: { staged: StagedView; requiredFs?: number }) {
  const methods = (["bishop", "fellenius"] as const).filter((m) => staged.stages[m] !== undefined);
  const cells: Partial<Record<Method, StageCell[] | null>> = {};
  for (const m of methods) {
    const f = staged.stages[m];
    cells[m] = f ? stageCells(f, staged.variant) : null;
  }
  const rows = stageCells({ fs1: null, fs2: null, fs3: null, final: null, switchedSlices: 0 }, staged.variant);
  return (
    <div data-testid="stage-fs">
      <h3 className="label">Staged drawdown, {VARIANT_TEXT[staged.variant]}</h3>
      <table className="w-full text-left">
        <thead className="text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-3 font-medium">Stage</th>
            {methods.map((m) => (
              <th key={m} className="py-1 pr-3 text-right font-medium">
                {METHOD_NAME[m]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => (
            <tr
              key={row.stage}
              className={`border-t border-rule align-top ${row.stage === "final" ? "font-semibold" : ""}`}
              data-stage={row.stage}
            >
              <th scope="row" className="py-1 pr-3 font-normal">
                {row.label}
              </th>
              {methods.map((m) => {
                const c = cells[m]?.[i];
                return (
                  <td key={m} className="py-1 pr-3 text-right tabular-nums" data-testid={`stage-${row.stage}-${m}`}>
                    {!c ? (
                      <span className="text-ink-faint">not available</span>
                    ) : c.fs === null ? (
                      <span className="text-xs font-normal text-ink-faint">— {c.missing}</span>
                    ) : (
                      <>
                        {formatFs(c.fs)}
                        {c.note ? <span className="block text-xs font-normal text-ink-faint">{c.note}</span> : null}
                      </>
                    )}
                    {c && row.stage === "final" && requiredFs !== undefined ? (
                      <span className="block text-xs font-normal">
                        <VerdictMark verdict={verdictOf(c.fs, requiredFs)} required={requiredFs} />
                      </span>
                    ) : null}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-faint">
        Stage 1 gives the consolidation stresses on each slice base; the undrained strengths of stage 2 follow from
        them. The FS of the run is the final stage&apos;s.
      </p>
    </div>
  );
}
