import { RowReader, finish, readCsvTable, type CsvParseResult, type CsvProblem } from "./csv-read";
import { writeCsv } from "./csv-write";
import type { Point } from "./section-types";

export const PHREATIC_COLUMNS = ["x", "y"] as const;

/**
 * Parses a phreatic line CSV: header `x,y`, one row per vertex with x strictly increasing
 * (docs/engine.md §1: piezometric lines have x increasing). Returns `water.phreatic` of docs/engine-io.md.
 */
export function parsePhreaticCsv(text: string): CsvParseResult<Point[]> {
  const problems: CsvProblem[] = [];
  const warnings: CsvProblem[] = [];
  const table = readCsvTable(text, PHREATIC_COLUMNS, PHREATIC_COLUMNS, problems, warnings);
  if (!table) return finish([], [], problems, warnings);

  const points: Point[] = [];
  let previous: { x: number; row: number } | null = null;
  for (const row of table.rows) {
    const r = new RowReader(table, row, problems);
    const x = r.number("x");
    const y = r.number("y");
    if (x === null || y === null) continue;
    if (previous && !(x > previous.x)) {
      r.problem(
        "x",
        `x = ${x} is not greater than x = ${previous.x} on row ${previous.row}: list the points left to right without repeats.`,
      );
      continue;
    }
    points.push([x, y]);
    previous = { x, row: r.rowNumber };
  }
  if (table.rows.length > 0 && table.rows.length < 2) {
    problems.push({ row: table.rows[0].row, column: null, message: "A phreatic line needs at least 2 points." });
  }
  return finish(points, table.rows, problems, warnings);
}

/** Writes a phreatic line as a CSV with header `x,y`. */
export function phreaticToCsv(points: readonly Point[]): string {
  return writeCsv(
    PHREATIC_COLUMNS,
    points.map(([x, y]) => [x, y]),
  );
}
