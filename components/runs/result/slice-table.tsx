"use client";

import { downloadText } from "@/lib/client/download";
import { useMemo, useState } from "react";
import type { SliceRow } from "@/lib/stability";
import { Caution } from "@/components/ui/caution";
import {
  formatCell,
  isStagedSlices,
  numberSlices,
  sliceColumns,
  sortSlices,
  type SliceColumnKey,
  type SortDirection,
} from "@/lib/runs/view/slice-columns";
import { sliceCsvFileName, sliceTableToCsv, type SliceCsvMeta } from "@/lib/runs/view/slice-csv";
import { METHOD_NAME } from "@/lib/runs/view/warning-text";

export interface SliceTableProps {
  rows: readonly SliceRow[];
  /** Method whose N′ and resisting terms are shown, and the run details for the CSV. */
  meta: SliceCsvMeta;
  /** Show the engineering caution under the table (default true). */
  caution?: boolean;
  /** Whether the table starts unfolded (default true); its heading folds and unfolds it. */
  defaultOpen?: boolean;
}

/** Bishop's mα below this is flagged in the table (after Whitman & Bailey 1967, as the engine does). */
const LOW_M_ALPHA = 0.2;

/** A byte-order mark lets spreadsheets read the CSV as UTF-8 (φ, α, γ in the headers). */
const download = (text: string, name: string) => downloadText(name, text, "text/csv");

/** The slices of a critical circle: sortable by any column, with units, and downloadable as CSV. */
export function SliceTable({ rows, meta, caution = true, defaultOpen = true }: SliceTableProps) {
  const method = meta.method;
  const staged = isStagedSlices(rows);
  const columns = useMemo(() => sliceColumns(method, staged), [method, staged]);
  const [sort, setSort] = useState<{ key: SliceColumnKey; dir: SortDirection } | null>(null);
  const numbered = useMemo(() => numberSlices(rows), [rows]);
  const shown = useMemo(() => {
    const col = sort && columns.find((c) => c.key === sort.key);
    return col && sort ? sortSlices(numbered, col, sort.dir, method) : numbered;
  }, [numbered, columns, sort, method]);

  const toggle = (key: SliceColumnKey) =>
    setSort((s) =>
      s && s.key === key ? { key, dir: s.dir === "ascending" ? "descending" : "ascending" } : { key, dir: "ascending" },
    );

  return (
    <details className="panel group p-3" data-testid="slice-table" open={defaultOpen}>
      <summary className="cursor-pointer list-none text-sm font-semibold marker:hidden">
        <span aria-hidden="true" className="mr-1 inline-block transition-transform group-open:rotate-90">
          ▸
        </span>
        Slices of the critical circle, {METHOD_NAME[method]}{" "}
        <span className="font-normal text-ink-faint">
          ({rows.length === 1 ? "1 slice" : `${rows.length} slices`}; forces per metre run)
        </span>
      </summary>
      <div className="my-2 flex flex-wrap items-center justify-end gap-2">
        <button
          type="button"
          className="btn-quiet"
          onClick={() => download(sliceTableToCsv(rows, meta), sliceCsvFileName(meta.title, method))}
          data-testid="slice-csv-download"
        >
          Download CSV
        </button>
      </div>
      <div className="max-h-[28rem] overflow-auto">
        <table className="w-full text-xs tabular-nums">
          <thead className="sticky top-0 bg-paper-sunk text-ink-soft">
            <tr>
              {columns.map((c) => {
                const state = sort?.key === c.key ? sort.dir : "none";
                return (
                  <th
                    key={c.key}
                    scope="col"
                    aria-sort={state}
                    className={`px-2 py-1.5 font-medium ${c.decimals === null ? "text-left" : "text-right"}`}
                  >
                    <button
                      type="button"
                      className="inline-flex items-center gap-0.5 hover:text-clay-600"
                      onClick={() => toggle(c.key)}
                    >
                      {c.label}
                      {c.unit ? <span className="font-normal text-ink-faint">&nbsp;({c.unit})</span> : null}
                      <span aria-hidden="true" className="w-2">
                        {state === "ascending" ? "▲" : state === "descending" ? "▼" : ""}
                      </span>
                    </button>
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {shown.map((s) => (
              <tr key={s.n} className="border-t border-rule">
                {columns.map((c) => {
                  const v = c.value(s, method);
                  const low = c.key === "mAlpha" && typeof v === "number" && v < LOW_M_ALPHA;
                  return (
                    <td
                      key={c.key}
                      className={[
                        "px-2 py-1",
                        c.decimals === null ? "whitespace-nowrap text-left" : "text-right",
                        low ? "font-semibold text-alarm-700" : "",
                      ].join(" ")}
                      title={low ? `mα below ${LOW_M_ALPHA}` : undefined}
                    >
                      {v === null ? "—" : formatCell(c, v)}
                      {low ? " !" : ""}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-2 text-xs text-ink-faint">
        Click a header to sort by it, again to reverse. The CSV holds the same columns. mα values marked “!” are below{" "}
        {LOW_M_ALPHA}.
      </p>
      {staged ? (
        <p className="mt-1 text-xs text-ink-faint" data-testid="staged-slice-note">
          Staged drawdown: c and φ are the strengths of the final stage. Where the undrained strength governs
          (“undrained (stage 2)”) they are total-stress values: c = τff from the stage-1 consolidation stress σ′fc, φ =
          0, no pore pressure. Where the drained strength is lower (“drained (stage 3)”), and on free-draining bases,
          they are c′ and φ′ with the pore pressure after drawdown.
        </p>
      ) : null}
      {caution ? (
        <div className="mt-2">
          <Caution compact />
        </div>
      ) : null}
    </details>
  );
}
