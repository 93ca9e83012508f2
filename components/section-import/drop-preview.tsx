import type { ParsedDrop } from "./parse-drop";
import { countOf } from "@/lib/format";

/** One dropped file: its problems by row and column, then the first rows as read. */
export function DropPreview({ drop }: { drop: ParsedDrop }) {
  const rows = drop.preview.slice(0, 8);
  return (
    <div className="rounded-md border border-rule" data-testid="drop-preview">
      <div className="flex items-center justify-between border-b border-rule bg-paper-sunk px-3 py-1.5 text-sm">
        <span className="font-medium">{drop.fileName}</span>
        <span className={drop.apply ? "text-moss-700" : "text-alarm-700"}>
          {drop.apply ? `✓ ${drop.summary}` : `✕ ${countOf(drop.problems.length, "problem")}`}
        </span>
      </div>
      {drop.problems.length > 0 ? (
        <ul className="max-h-40 overflow-auto px-3 py-2 text-xs text-alarm-700" data-testid="import-problems">
          {drop.problems.map((p, i) => (
            <li key={i}>
              {p.row > 0 ? `Row ${p.row}` : "File"}
              {p.column ? `, column ${p.column}` : ""}
              {p.cell ? ` (${p.cell})` : ""}: {p.message}
            </li>
          ))}
        </ul>
      ) : null}
      {drop.warnings.length > 0 ? (
        <ul className="px-3 py-1 text-xs text-clay-700">
          {drop.warnings.map((p, i) => (
            <li key={i}>
              Row {p.row}
              {p.column ? `, ${p.column}` : ""}: {p.message}
            </li>
          ))}
        </ul>
      ) : null}
      {rows.length > 0 && drop.columns.length > 0 ? (
        <table className="w-full text-xs">
          <thead className="text-left text-ink-faint">
            <tr>
              <th className="px-2">row</th>
              {drop.columns.map((c) => (
                <th key={c} className="px-2">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.row} className="border-t border-rule">
                <td className="px-2 text-ink-faint">{r.row}</td>
                {drop.columns.map((c) => (
                  <td key={c} className="px-2 tabular-nums">
                    {r.cells[c] ?? ""}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {drop.preview.length > rows.length ? (
        <p className="px-3 py-1 text-xs text-ink-faint">… and {drop.preview.length - rows.length} more rows</p>
      ) : null}
    </div>
  );
}
