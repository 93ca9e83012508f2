import { LAB_KIND_INFO, type LabTestKind } from "@/lib/materials/lab-kinds";
import { emptyLabRow, type LabOptions, type LabRow } from "@/lib/materials/lab-rows";
import type { TableProblem } from "@/lib/materials/problem-keys";

export interface LabRowsTableProps {
  kind: LabTestKind;
  options: LabOptions;
  rows: LabRow[];
  onChange: (rows: LabRow[]) => void;
  problems: readonly TableProblem[];
}

/**
 * Columns that matter for the chosen settings: UU rows need q, vane rows need su; falling-head
 * readings need the end head, constant-head readings the water collected.
 */
function visibleColumns(kind: LabTestKind, options: LabOptions) {
  return LAB_KIND_INFO[kind].columns.filter((c) => {
    if (kind === "undrained") return options.source === "uu" ? c.key !== "su" : c.key !== "deviatorStress";
    if (kind === "permeability")
      return options.permeabilityMethod === "falling-head" ? c.key !== "volume" : c.key !== "headEnd";
    return true;
  });
}

/** The editable table of test results, units in the headers; cells with a problem are marked. */
export function LabRowsTable({ kind, options, rows, onChange, problems }: LabRowsTableProps) {
  const columns = visibleColumns(kind, options);
  const single = LAB_KIND_INFO[kind].rowsKey === null;
  const bad = new Set(problems.filter((p) => p.row !== null).map((p) => `${p.row}:${p.column ?? ""}`));
  const edit = (i: number, key: string, value: string) =>
    onChange(rows.map((r, k) => (k === i ? { ...r, [key]: value } : r)));

  return (
    <div className="space-y-2">
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="lab-rows">
          <thead className="text-left text-xs text-ink-soft">
            <tr>
              <th className="w-8 pb-1">#</th>
              {columns.map((c) => (
                <th key={c.key} className="pb-1 pr-2 font-medium">
                  {c.label} {c.unit ? <span className="font-normal text-ink-faint">({c.unit})</span> : null}
                </th>
              ))}
              <th />
            </tr>
          </thead>
          <tbody>
            {rows.map((row, i) => (
              <tr key={i} className={bad.has(`${i + 1}:`) ? "bg-alarm-50" : ""}>
                <td className="py-0.5 text-xs text-ink-faint">{i + 1}</td>
                {columns.map((c) => (
                  <td key={c.key} className="py-0.5 pr-2">
                    <input
                      aria-label={`${c.label}, row ${i + 1}`}
                      className={`field py-1 ${c.numeric ? "text-right tabular-nums" : ""} ${bad.has(`${i + 1}:${c.key}`) ? "border-alarm-600 bg-alarm-50" : ""}`}
                      inputMode={c.numeric ? "decimal" : "text"}
                      value={row[c.key] ?? ""}
                      onChange={(e) => edit(i, c.key, e.target.value)}
                    />
                  </td>
                ))}
                <td className="py-0.5">
                  {!single ? (
                    <button
                      type="button"
                      className="text-xs text-ink-faint hover:text-alarm-700"
                      aria-label={`Remove row ${i + 1}`}
                      onClick={() => onChange(rows.filter((_, k) => k !== i))}
                    >
                      ✕
                    </button>
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {!single ? (
        <button type="button" className="btn-quiet" onClick={() => onChange([...rows, emptyLabRow(kind)])}>
          Add a row
        </button>
      ) : null}
    </div>
  );
}
