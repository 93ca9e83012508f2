/** The one wording for a database outage, on pages and in API answers alike. */
export const SERVICE_UNAVAILABLE = "The service is unavailable just now. Try again in a few minutes.";

// Driver and pool failures that mean "the database cannot be reached", not "the request was wrong".
const DOWN_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENOTFOUND",
  "EPIPE",
  "PROTOCOL_CONNECTION_LOST",
  "ER_CON_COUNT_ERROR",
  "ER_SERVER_SHUTDOWN",
]);

/** Whether an error says the database is out of reach (a 503), as opposed to a bug (a 500). */
export function isServiceDown(err: unknown, depth = 0): boolean {
  if (!(err instanceof Error) || depth > 3) return false;
  const code = (err as { code?: unknown }).code;
  if (typeof code === "string" && DOWN_CODES.has(code)) return true;
  if (err.name === "KnexTimeoutError") return true;
  const inner = (err as { errors?: unknown }).errors;
  if (Array.isArray(inner) && inner.some((e) => isServiceDown(e, depth + 1))) return true;
  return isServiceDown((err as { cause?: unknown }).cause, depth + 1);
}
