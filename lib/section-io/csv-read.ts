import Papa from "papaparse";

/**
 * Reading side shared by the section CSV parsers: BOM, comma or semicolon separators, blank lines,
 * trimmed cells, header lookup and strict decimal numbers, with every problem tied to the row and
 * column the user sees in a spreadsheet (the header is row 1 when the file starts with it).
 */

/** A problem (or warning) at a spreadsheet row; `column` is the header name, null for the whole row. */
export interface CsvProblem {
  row: number;
  column: string | null;
  /** Spreadsheet cell such as "C4", when the problem sits in one cell. */
  cell?: string;
  message: string;
}

/** One data row as read, cells trimmed, keyed by the expected column names. */
export interface CsvPreviewRow {
  row: number;
  cells: Record<string, string>;
}

export type CsvParseResult<V> =
  | { ok: true; value: V; preview: CsvPreviewRow[]; warnings: CsvProblem[] }
  | { ok: false; problems: CsvProblem[]; preview: CsvPreviewRow[]; warnings: CsvProblem[] };

export interface CsvTable {
  /** Row number of the header. */
  headerRow: number;
  /** Column index in the file for each expected column found. */
  columns: Map<string, number>;
  rows: CsvPreviewRow[];
}

/** Spreadsheet column letters: 0 → A, 25 → Z, 26 → AA. */
export function columnLetter(index: number): string {
  let s = "";
  for (let n = index + 1; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

/** Undoes the export's guard against spreadsheet formulas: one leading apostrophe before = + - @ (see csv-write.ts). */
export function unescapeText(value: string): string {
  return /^'+[=+\-@\t\r]/.test(value) ? value.slice(1) : value;
}

/**
 * Reads the table: finds the header (first non-blank row), maps the expected columns
 * (case-insensitive), and returns the non-blank data rows. Problems go to `problems`, warnings
 * (unknown columns) to `warnings`; returns null when there is nothing to read.
 */
export function readCsvTable(
  text: string,
  expected: readonly string[],
  required: readonly string[],
  problems: CsvProblem[],
  warnings: CsvProblem[],
): CsvTable | null {
  const clean = (text ?? "").replace(/^\uFEFF/, "");
  const headerText = `expected the header ${expected.join(",")}`;
  if (clean.trim() === "") {
    problems.push({ row: 1, column: null, message: `The file is empty: ${headerText}.` });
    return null;
  }
  const lines = clean.split(/\r\n|\n|\r/);
  const firstLine = lines.find((l) => l.trim() !== "") ?? "";
  // The header is plain text, so its separator is unambiguous; data cells may hold decimal commas.
  const delimiter = firstLine.includes(";") ? ";" : ",";
  const parsed = Papa.parse<string[]>(clean, { delimiter, skipEmptyLines: false });
  for (const e of parsed.errors) {
    problems.push({ row: (e.row ?? 0) + 1, column: null, message: `The file could not be read here: ${e.message}.` });
  }
  const records = parsed.data.map((cells, i) => ({ row: i + 1, cells: cells.map((c) => (c ?? "").trim()) }));
  const nonBlank = records.filter((r) => r.cells.some((c) => c !== ""));
  const header = nonBlank[0];

  const columns = new Map<string, number>();
  const byLower = new Map(expected.map((name) => [name.toLowerCase(), name]));
  header.cells.forEach((raw, index) => {
    if (raw === "") return;
    const name = byLower.get(raw.toLowerCase());
    const cell = `${columnLetter(index)}${header.row}`;
    if (!name)
      warnings.push({
        row: header.row,
        column: raw,
        cell,
        message: `Column '${raw}' is not used and was ignored (${headerText}).`,
      });
    else if (columns.has(name))
      problems.push({ row: header.row, column: name, cell, message: `Column '${name}' appears twice in the header.` });
    else columns.set(name, index);
  });
  const missing = required.filter((name) => !columns.has(name));
  const unknown = header.cells.filter((raw) => raw !== "" && !byLower.has(raw.toLowerCase()));
  // Name what stands where the column should be ("x,elev"), so the fix is plain.
  const instead = unknown.length ? ` The header has ${unknown.map((u) => `'${u}'`).join(", ")} instead.` : "";
  for (const name of missing)
    problems.push({
      row: header.row,
      column: name,
      message: `Column '${name}' is missing from the header: ${headerText}.${instead}`,
    });
  // Without a required column the rows cannot be read; listing every row's gap would only be noise.
  if (missing.length > 0) return null;

  const width = header.cells.length;
  const rows: CsvPreviewRow[] = nonBlank.slice(1).map((r) => {
    const extra = r.cells.slice(width).filter((c) => c !== "");
    if (extra.length > 0) {
      problems.push({
        row: r.row,
        column: null,
        message: `Row ${r.row} has ${width + extra.length} cells but the header has ${width}: is a decimal comma splitting a number? Write decimals with a point (12.5).`,
      });
    }
    const cells: Record<string, string> = {};
    for (const [name, index] of columns) cells[name] = r.cells[index] ?? "";
    return { row: r.row, cells };
  });
  if (rows.length === 0)
    problems.push({ row: header.row + 1, column: null, message: "The file has a header but no data rows." });
  return { headerRow: header.row, columns, rows };
}

const DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** Strict decimal: "12.5", "-3", "1e-7"; refuses "12,5", "1 200", "NaN", "Infinity". */
export function parseDecimal(raw: string): { ok: true; value: number } | { ok: false; message: string } {
  if (raw === "") return { ok: false, message: "A number is needed here." };
  if (DECIMAL.test(raw)) {
    const value = Number(raw);
    if (Number.isFinite(value)) return { ok: true, value };
    return { ok: false, message: `'${raw}' is too large.` };
  }
  if (/^[+-]?\d*,\d+$/.test(raw))
    return { ok: false, message: `'${raw}' uses a comma as the decimal mark: write ${raw.replace(",", ".")}.` };
  return { ok: false, message: `'${raw}' is not a number.` };
}

/** Reads cells of one row, recording problems with their row, column and cell. */
export class RowReader {
  constructor(
    private readonly table: CsvTable,
    private readonly row: CsvPreviewRow,
    private readonly problems: CsvProblem[],
  ) {}

  get rowNumber(): number {
    return this.row.row;
  }

  /** Trimmed text of a column, with the export's formula guard removed; "" when absent. */
  text(column: string): string {
    return unescapeText(this.row.cells[column] ?? "");
  }

  has(column: string): boolean {
    return (this.row.cells[column] ?? "") !== "";
  }

  /** The cell's number, or null (with a problem) when it is missing or not a decimal number. */
  number(column: string): number | null {
    const result = parseDecimal(this.row.cells[column] ?? "");
    if (result.ok) return result.value;
    this.problem(column, result.message);
    return null;
  }

  problem(column: string | null, message: string): void {
    this.problems.push(this.at(column, message));
  }

  at(column: string | null, message: string): CsvProblem {
    const index = column === null ? undefined : this.table.columns.get(column);
    const problem: CsvProblem = { row: this.row.row, column, message };
    if (index !== undefined) problem.cell = `${columnLetter(index)}${this.row.row}`;
    return problem;
  }
}

/** Wraps problems and a value into the parse result. */
export function finish<V>(
  value: V,
  preview: CsvPreviewRow[],
  problems: CsvProblem[],
  warnings: CsvProblem[],
): CsvParseResult<V> {
  if (problems.length > 0) {
    const sorted = [...problems].sort((a, b) => a.row - b.row);
    return { ok: false, problems: sorted, preview, warnings };
  }
  return { ok: true, value, preview, warnings };
}
