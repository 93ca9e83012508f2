import type { CircleFs, GridSearchSuccess } from "@/lib/stability";
import { Caution } from "@/components/ui/caution";
import { formatFs, verdictOf } from "@/lib/runs/view/verdict";
import { METHOD_NAME, describeWarnings, ordinaryFormText, rejectionList } from "@/lib/runs/view/warning-text";
import { VerdictMark } from "@/components/runs/result/verdict-mark";
import { StageFsTable } from "@/components/runs/result/stage-fs-table";
import { stagedFromResult, type StagedView } from "@/lib/runs/view/staged-view";
import { formatCount } from "@/lib/format";

export interface FsSummaryProps {
  /** The search, its warnings already gathered into one list (lib/runs/record/search-record.ts keptWarnings). */
  result: GridSearchSuccess;
  /** The FS the run must reach; without it no pass or fail is shown. */
  requiredFs?: number;
  /** Least mα on each method's critical circle, from its slice-by-slice report. */
  minMAlpha?: Partial<Record<"bishop" | "fellenius", number | null>>;
  /** A staged drawdown's stages; by default those the result carries. */
  staged?: StagedView | null;
}

const m2 = (v: number) => v.toFixed(2);
const pt = (p: readonly [number, number]) => `(${m2(p[0])}, ${m2(p[1])})`;

/** FS per method with pass or fail, the critical circles, the search counts, warnings and the caution. */
export function FsSummary({ result, requiredFs, minMAlpha, staged }: FsSummaryProps) {
  const stages = staged ?? stagedFromResult(result);
  const warnings = describeWarnings(result.warnings);
  const rejected = rejectionList(result.circles.rejected);
  const rejectedTotal = rejected.reduce((s, r) => s + r.count, 0);
  return (
    <section className="panel space-y-4 p-4 text-sm" data-testid="fs-summary" aria-label="Factor of safety summary">
      <table className="w-full text-left">
        <caption className="mb-2 text-left text-xs font-medium uppercase tracking-wide text-ink-soft">
          Factor of safety{requiredFs !== undefined ? `, required ${requiredFs.toFixed(2)}` : ""}
        </caption>
        <thead className="text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-3 font-medium">Method</th>
            <th className="py-1 pr-3 text-right font-medium">FS</th>
            <th className="py-1 font-medium">Against the required FS</th>
          </tr>
        </thead>
        <tbody>
          {result.methods.map((m) => {
            const r = result.results[m] ?? null;
            return (
              <tr key={m} className="border-t border-rule align-top" data-testid={`fs-row-${m}`}>
                <th scope="row" className="py-1.5 pr-3 font-normal">
                  {METHOD_NAME[m]}
                  {m === "fellenius" ? (
                    <span className="block text-xs text-ink-faint">{ordinaryFormText(result.ordinaryForm)}</span>
                  ) : null}
                </th>
                <td
                  className="py-1.5 pr-3 text-right text-base font-semibold tabular-nums"
                  data-testid={`fs-value-${m}`}
                >
                  {formatFs(r?.fs)}
                </td>
                <td className="py-1.5">
                  <VerdictMark verdict={verdictOf(r?.fs, requiredFs)} required={requiredFs} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>

      {stages ? <StageFsTable staged={stages} requiredFs={requiredFs} /> : null}

      <div className="grid gap-3 sm:grid-cols-2">
        {result.methods.map((m) => (
          <CircleFacts key={m} method={m} c={result.results[m] ?? null} minMAlpha={minMAlpha?.[m]} />
        ))}
      </div>

      <div data-testid="fs-summary-circles">
        <h3 className="label">Trial circles</h3>
        <p className="tabular-nums">
          {formatCount(result.circles.tried)} tried, {formatCount(result.circles.valid)} gave an FS
          {rejectedTotal > 0 ? `, ${formatCount(rejectedTotal)} set aside:` : "."}
        </p>
        {rejected.length > 0 ? (
          <ul className="mt-1 list-disc pl-5 text-ink-soft">
            {rejected.map((r) => (
              <li key={r.reason} data-reason={r.reason}>
                <span className="tabular-nums">{formatCount(r.count)}</span> {r.text}
              </li>
            ))}
          </ul>
        ) : null}
      </div>

      {warnings.length > 0 ? (
        <div data-testid="fs-summary-warnings">
          <h3 className="label">Points to check</h3>
          <ul className="space-y-2">
            {warnings.map((w, i) => (
              <li
                key={i}
                className={`border-l-2 pl-3 ${w.weight === "check" ? "border-clay-500" : "border-rule"}`}
                data-code={w.code}
              >
                <p className={w.weight === "check" ? "font-medium text-ink" : "text-ink"}>
                  {w.weight === "check" ? "Check: " : "Note: "}
                  {w.headline}
                </p>
                {w.action ? <p className="text-ink-soft">{w.action}</p> : null}
                {w.detail ? <p className="text-xs text-ink-faint">{w.detail}</p> : null}
              </li>
            ))}
          </ul>
        </div>
      ) : null}

      <Caution compact />
    </section>
  );
}

function CircleFacts({
  method,
  c,
  minMAlpha,
}: {
  method: "bishop" | "fellenius";
  c: CircleFs | null;
  minMAlpha?: number | null;
}) {
  return (
    <div className="rounded-md border border-rule p-3" data-testid={`critical-${method}`}>
      <h3 className="label">Critical circle, {METHOD_NAME[method]}</h3>
      {c ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 tabular-nums">
          <dt className="text-ink-soft">Centre</dt>
          <dd>{pt([c.circle.xc, c.circle.yc])} m</dd>
          <dt className="text-ink-soft">Radius</dt>
          <dd>{m2(c.circle.r)} m</dd>
          <dt className="text-ink-soft">Enters</dt>
          <dd>{pt(c.entry)} m</dd>
          <dt className="text-ink-soft">Exits</dt>
          <dd>{pt(c.exit)} m</dd>
          <dt className="text-ink-soft">Sliding</dt>
          <dd>toward {c.direction === "right" ? "+x (right)" : "−x (left)"}</dd>
          {method === "bishop" && minMAlpha !== undefined && minMAlpha !== null ? (
            <>
              <dt className="text-ink-soft">Least mα</dt>
              <dd>{minMAlpha.toFixed(3)}</dd>
            </>
          ) : null}
        </dl>
      ) : (
        <p className="text-ink-soft">No trial circle gave a factor of safety.</p>
      )}
    </div>
  );
}
