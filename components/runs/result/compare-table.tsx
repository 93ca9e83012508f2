import { Caution } from "@/components/ui/caution";
import { formatFs, roundFs, verdictOf } from "@/lib/runs/view/verdict";
import { METHOD_NAME } from "@/lib/runs/view/warning-text";
import { VerdictMark } from "@/components/runs/result/verdict-mark";

/** One run in the comparison. */
export interface CompareRun {
  id: number | string;
  label: string;
  /** Second line under the label: section and version, load case, face. */
  detail?: string;
  /** The water condition the run analysed. */
  water?: string;
  requiredFs?: number | null;
  fs: { bishop?: number | null; fellenius?: number | null };
  /** Colour of the run's circle on the overlay canvas, repeated as a swatch. */
  colour?: string;
}

export interface CompareTableProps {
  runs: readonly CompareRun[];
}

const METHODS = ["bishop", "fellenius"] as const;

/** Lowest FS of a method over the runs (at 3 decimals), to mark the governing run. */
function lowestOf(runs: readonly CompareRun[], m: (typeof METHODS)[number]): number | null {
  const vals = runs
    .map((r) => r.fs[m])
    .filter((v): v is number => typeof v === "number" && Number.isFinite(v))
    .map(roundFs);
  return vals.length > 1 ? Math.min(...vals) : null;
}

/** FS per method of 2–4 runs side by side (one column per run), with the required FS and pass or fail. */
export function CompareTable({ runs }: CompareTableProps) {
  const methods = METHODS.filter((m) => runs.some((r) => r.fs[m] !== undefined));
  return (
    <section className="panel overflow-x-auto p-3" data-testid="compare-table">
      <table className="w-full text-sm">
        <caption className="mb-2 text-left text-xs font-medium uppercase tracking-wide text-ink-soft">
          Factor of safety by run
        </caption>
        <thead>
          <tr className="align-bottom">
            <th scope="col" className="px-2 py-1 text-left text-xs font-medium text-ink-soft">
              Run
            </th>
            {runs.map((r) => (
              <th key={r.id} scope="col" className="px-2 py-1 text-left font-semibold" data-run={r.id}>
                <span className="inline-flex items-center gap-1.5">
                  {r.colour ? (
                    <span
                      aria-hidden="true"
                      className="inline-block h-2.5 w-2.5 rounded-full"
                      style={{ background: r.colour }}
                    />
                  ) : null}
                  {r.label}
                </span>
                {r.detail ? <span className="block text-xs font-normal text-ink-faint">{r.detail}</span> : null}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {runs.some((r) => r.water) ? (
            <tr className="border-t border-rule align-top" data-testid="compare-row-water">
              <th scope="row" className="px-2 py-1.5 text-left font-normal text-ink-soft">
                Water
              </th>
              {runs.map((r) => (
                <td key={r.id} className="px-2 py-1.5 text-xs" data-run={r.id}>
                  {r.water ?? "—"}
                </td>
              ))}
            </tr>
          ) : null}
          <tr className="border-t border-rule">
            <th scope="row" className="px-2 py-1.5 text-left font-normal text-ink-soft">
              Required FS
            </th>
            {runs.map((r) => (
              <td key={r.id} className="px-2 py-1.5 tabular-nums">
                {r.requiredFs !== null && r.requiredFs !== undefined ? r.requiredFs.toFixed(2) : "—"}
              </td>
            ))}
          </tr>
          {methods.map((m) => {
            const low = lowestOf(runs, m);
            return (
              <tr key={m} className="border-t border-rule align-top" data-testid={`compare-row-${m}`}>
                <th scope="row" className="px-2 py-1.5 text-left font-normal">
                  {METHOD_NAME[m]}
                </th>
                {runs.map((r) => {
                  const fs = r.fs[m];
                  const governs = low !== null && typeof fs === "number" && roundFs(fs) === low;
                  return (
                    <td key={r.id} className="px-2 py-1.5" data-run={r.id}>
                      <span className="text-base font-semibold tabular-nums">{formatFs(fs)}</span>
                      {governs ? (
                        <span className="ml-1.5 rounded-sm border border-ink-faint px-1 text-[10px] uppercase tracking-wide text-ink-soft">
                          lowest
                        </span>
                      ) : null}
                      <span className="block text-xs">
                        <VerdictMark verdict={verdictOf(fs, r.requiredFs)} required={r.requiredFs} />
                      </span>
                    </td>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
      {runs.length > 4 ? (
        <p className="mt-2 text-xs text-ink-faint">Comparing more than four runs gets hard to read; consider fewer.</p>
      ) : null}
      <div className="mt-3">
        <Caution compact />
      </div>
    </section>
  );
}
