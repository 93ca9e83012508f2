import type { CsvProblem } from "@/lib/section-io";

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
          ? `${items.length} problem${items.length === 1 ? "" : "s"}: nothing will be saved until the file is fixed.`
          : `${items.length} note${items.length === 1 ? "" : "s"}:`}
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
