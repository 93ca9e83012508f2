/**
 * Problems in a table (a CSV file or a lab rows table) travel as `fields` of the API's error body,
 * keyed "row 3, column c" (or "row 3" for the whole row, or the column name alone for a setting),
 * so one shape of answer serves forms and tables alike.
 */

export interface TableProblem {
  /** 1-based row as the user numbers it, or null for a problem with the whole input. */
  row: number | null;
  /** Column (or option) name, or null for the whole row. */
  column: string | null;
  message: string;
}

export function problemKey(row: number | null, column: string | null): string {
  if (row === null) return column ?? "_";
  return column === null ? `row ${row}` : `row ${row}, column ${column}`;
}

/** Reads a key written by {@link problemKey}. */
export function parseProblemKey(key: string): { row: number | null; column: string | null } {
  const m = /^row (\d+)(?:, column (.+))?$/.exec(key);
  if (m) return { row: Number(m[1]), column: m[2] ?? null };
  return { row: null, column: key === "_" ? null : key };
}

/** Problems as API `fields`. */
export function problemsToFields(problems: readonly TableProblem[]): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const p of problems) (fields[problemKey(p.row, p.column)] ??= []).push(p.message);
  return fields;
}

/** API `fields` back into problems, for a client that shows them in its table. */
export function fieldsToProblems(fields: Record<string, string[]>): TableProblem[] {
  return Object.entries(fields).flatMap(([key, messages]) => {
    const { row, column } = parseProblemKey(key);
    return messages.map((message) => ({ row, column, message }));
  });
}
