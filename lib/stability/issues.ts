/**
 * A validation problem or warning: a stable code, where it is in the document
 * (`regions[2].points[4]`), a message that says what is wrong and how to fix it, and,
 * when it has one, the location in metres so an editor can point at it.
 */
export interface Issue {
  code: string;
  path: string;
  message: string;
  at?: [number, number];
}

/** A warning attached to a result (search or circle): no path, just a code and text. */
export interface EngineWarning {
  code: string;
  message: string;
}

/** Formats a length in metres for messages, e.g. `12.30`. */
export function fmt(v: number): string {
  return Number.isFinite(v) ? v.toFixed(2) : String(v);
}

/** Formats a point in metres for messages, e.g. `(12.00, 4.50)`. */
export function fmtPoint(x: number, y: number): string {
  return `(${fmt(x)}, ${fmt(y)})`;
}

/** Builds an issue; `at` is kept only when both coordinates are finite. */
export function issue(code: string, path: string, message: string, at?: [number, number]): Issue {
  const out: Issue = { code, path, message };
  if (at && Number.isFinite(at[0]) && Number.isFinite(at[1])) out.at = [at[0], at[1]];
  return out;
}

/** Joins a zod-style path (`["regions", 2, "points"]`) into `regions[2].points`. */
export function joinPath(parts: ReadonlyArray<PropertyKey>): string {
  let out = "";
  for (const p of parts) {
    if (typeof p === "number") out += `[${p}]`;
    else out += out === "" ? String(p) : `.${String(p)}`;
  }
  return out;
}
