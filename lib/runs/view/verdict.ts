/**
 * Pass or fail of a factor of safety against the required value. The comparison is made at
 * the precision shown (3 decimals), so the number a reader sees is the number judged: a
 * result never reads "1.500" beside a fail against 1.50.
 */

export type Verdict = "pass" | "fail" | "none";

/** Rounds an FS to the 3 decimals the result views print. */
export function roundFs(fs: number): number {
  return Math.round(fs * 1000) / 1000;
}

/** FS to 3 decimals, or an em dash when there is none. */
export function formatFs(fs: number | null | undefined): string {
  return fs === null || fs === undefined || !Number.isFinite(fs) ? "—" : fs.toFixed(3);
}

/** "pass" when FS ≥ required (at 3 decimals), "fail" below, "none" without an FS or a requirement. */
export function verdictOf(fs: number | null | undefined, required: number | null | undefined): Verdict {
  if (fs === null || fs === undefined || !Number.isFinite(fs)) return "none";
  if (required === null || required === undefined || !Number.isFinite(required)) return "none";
  return roundFs(fs) >= roundFs(required) ? "pass" : "fail";
}

/** Words for a verdict, never relying on colour. */
export function verdictWords(v: Verdict, required?: number | null): string {
  const req = required !== null && required !== undefined && Number.isFinite(required) ? required.toFixed(2) : "";
  if (v === "pass") return `meets the required ${req}`.trim();
  if (v === "fail") return `below the required ${req}`.trim();
  return "not judged";
}
