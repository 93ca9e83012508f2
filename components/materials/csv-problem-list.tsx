import type { CsvProblem } from "@/lib/section-io";
import { countOf } from "@/lib/format";

/** Problems (or warnings) of a file, each with its row and column as a spreadsheet shows them. */
export function CsvProblemList({ items, kind }: { items: readonly CsvProblem[]; kind: "problem" | "warning" }) {
  if (items.length === 0) return null;
  const cls =
    kind === "problem" ? "border-alarm-600 bg-alarm-50 text-alarm-700" : "border-clay-500 bg-clay-50 text-clay-700";
  return (
    <div
      className={`rounded-md border px-3 py-2 text-sm ${cls}`}
      data-testid={kind === "problem" ? "csv-problems" : "csv-warnings"}
    >
      <p className="font-medium">
        {kind === "problem"
          ? `${countOf(items.length, "problem")}: nothing will be saved until the file is fixed.`
          : `${countOf(items.length, "note")}:`}
      </p>
      <ul className="mt-1 space-y-0.5">
        {items.map((p, i) => (
          <li key={i}>
            <span className="font-mono text-xs">
              row {p.row}
              {p.column ? `, column ${p.column}` : ""}
              {p.cell ? ` (${p.cell})` : ""}
            </span>
            : {p.message}
          </li>
        ))}
      </ul>
    </div>
  );
}
