import Papa from "papaparse";

/**
 * Writing side: papaparse's unparse with a formula guard on text cells only. A text cell beginning
 * with = + - @ (or tab/CR) gets a leading apostrophe so a spreadsheet shows it as text instead of
 * running it (OWASP, "CSV Injection"); numbers are written as plain numbers, so −12.5 stays a number.
 * Text already beginning with apostrophes before such a character gets one more, so the reader's
 * single-apostrophe removal gives the original text back.
 */

export type CsvCell = string | number | null | undefined;

const FORMULA_START = /^'*[=+\-@\t\r]/;

/** Guards one text cell against formula execution. */
export function escapeText(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

/** Writes a CSV with the given header; text cells are guarded, numbers pass through, null is blank. */
export function writeCsv(fields: readonly string[], rows: readonly CsvCell[][]): string {
  const data = rows.map((row) =>
    row.map((cell) => (typeof cell === "string" ? escapeText(cell) : typeof cell === "number" ? cell : "")),
  );
  return Papa.unparse({ fields: [...fields], data }, { newline: "\r\n" });
}
