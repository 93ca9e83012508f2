import { columnLetter, parseDecimal, readCsvTable, writeCsv, type CsvProblem } from "@/lib/section-io";
import { LAB_KIND_INFO, type LabTestKind } from "./lab-kinds";
import type { LabRow } from "./lab-rows";

/**
 * Test results as CSV, one file per kind: the header is the kind's column keys (e.g.
 * `specimen,normalStress,shearStress`), units as in the table headers (kPa, m, %, Mg/m³).
 * Reading fills the editable table; the numbers are checked again when the set is derived.
 */

/** Invented example rows for each kind's template. */
const EXAMPLES: Record<LabTestKind, (string | number)[][]> = {
  "direct-shear": [
    ["DS-1", 50, 36],
    ["DS-2", 100, 59],
    ["DS-3", 200, 108],
  ],
  "triaxial-cu": [
    ["CU-1", 250, 114, 200],
    ["CU-2", 320, 194, 220],
    ["CU-3", 450, 361, 250],
  ],
  undrained: [
    ["V-1", 1.0, "", "", 31],
    ["V-2", 2.5, "", "", 36],
    ["V-3", 4.0, "", "", 42],
  ],
  compaction: [
    ["P-1", 13, 1.58, ""],
    ["P-2", 15, 1.63, ""],
    ["P-3", 17, 1.66, ""],
    ["P-4", 19, 1.64, ""],
    ["P-5", 21, 1.59, ""],
  ],
  atterberg: [["AL-1", 42, 20, 18]],
  permeability: [
    ["FH-1", 1000, 350, 10800, ""],
    ["FH-2", 1000, 420, 9000, ""],
    ["FH-3", 900, 330, 10800, ""],
  ],
};

const keysOf = (kind: LabTestKind) => LAB_KIND_INFO[kind].columns.map((c) => c.key);

/** A template file for `kind`: the header and a few invented rows. */
export function labCsvTemplate(kind: LabTestKind): string {
  return writeCsv(keysOf(kind), EXAMPLES[kind]);
}

export type LabCsvOutcome =
  { ok: true; rows: LabRow[]; warnings: CsvProblem[] } | { ok: false; problems: CsvProblem[]; warnings: CsvProblem[] };

/** Reads a CSV of test results into table rows; every bad cell is listed with its row and column. */
export function parseLabCsv(kind: LabTestKind, text: string): LabCsvOutcome {
  const info = LAB_KIND_INFO[kind];
  const problems: CsvProblem[] = [];
  const warnings: CsvProblem[] = [];
  const firstNumeric = info.columns.find((c) => c.numeric)!.key;
  const table = readCsvTable(text, keysOf(kind), [firstNumeric], problems, warnings);
  if (!table) return { ok: false, problems, warnings };
  if (info.rowsKey === null && table.rows.length > 1) {
    problems.push({
      row: table.rows[1].row,
      column: null,
      message: "An Atterberg set holds one sample: put each sample in a set of its own.",
    });
  }
  const rows = table.rows.map((r) => {
    const row: LabRow = {};
    for (const col of info.columns) {
      const text = r.cells[col.key] ?? "";
      row[col.key] = text;
      if (!col.numeric || text === "") continue;
      const n = parseDecimal(text);
      if (!n.ok) {
        const index = table.columns.get(col.key);
        problems.push({
          row: r.row,
          column: col.key,
          cell: index === undefined ? undefined : `${columnLetter(index)}${r.row}`,
          message: n.message,
        });
      }
    }
    return row;
  });
  problems.sort((a, b) => a.row - b.row);
  return problems.length > 0 ? { ok: false, problems, warnings } : { ok: true, rows, warnings };
}
