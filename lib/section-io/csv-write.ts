import Papa from "papaparse";

/**
 * The one CSV writer of the app (section files, lab templates, slice tables, the runs export):
 * papaparse's unparse (RFC 4180 quoting) with its formula escaping. A text cell beginning with
 * = + - @ (or tab/CR) gets a leading apostrophe so a spreadsheet shows it as text instead of running
 * it (OWASP, "CSV Injection"). Numbers, and text that is just a number such as "-12.50", stay as they
 * are, so a negative value is still a number. Text already beginning with apostrophes before such a
 * character gets one more, so the reader's single-apostrophe removal (csv-read.ts) gives it back.
 *
 * Every file starts with a UTF-8 byte-order mark, so spreadsheets read γ, φ′ and N′ correctly, and
 * ends each line with CRLF; the readers accept a file with or without the mark.
 */

export type CsvCell = string | number | null | undefined;

export const CSV_BOM = "\uFEFF";

/** What papaparse escapes: a formula start (after any apostrophes), unless the whole cell is a plain number. */
const ESCAPED = /^(?![+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$)'*[=+\-@\t\r]/;

const UNPARSE = { newline: "\r\n", escapeFormulae: ESCAPED } as const;

/**
 * A CSV file: optional leading `#` comment lines (each one field, line breaks flattened), the header,
 * then the rows. Text cells are guarded, numbers pass through, null and undefined are blank.
 */
export function writeCsv(
  fields: readonly string[],
  rows: readonly (readonly CsvCell[])[],
  options: { comments?: readonly string[] } = {},
): string {
  const data = rows.map((row) => row.map((cell) => (typeof cell === "string" || typeof cell === "number" ? cell : "")));
  const comments = (options.comments ?? []).map((c) => [`# ${c.replace(/[\r\n]+/g, " ")}`]);
  const head = comments.length > 0 ? Papa.unparse(comments, UNPARSE) + "\r\n" : "";
  return CSV_BOM + head + Papa.unparse({ fields: [...fields], data }, UNPARSE) + "\r\n";
}
