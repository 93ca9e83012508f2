/** Whether a write failed on a unique key, e.g. a name equal to another under the column's collation. */
export function isDuplicateEntry(err: unknown): boolean {
  return typeof err === "object" && err !== null && (err as { code?: string }).code === "ER_DUP_ENTRY";
}
