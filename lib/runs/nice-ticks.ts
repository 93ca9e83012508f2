/**
 * "Nice" tick values (1, 2 or 5 × 10^k steps) for the axes and the FS legend, after
 * Heckbert, "Nice numbers for graph labels", Graphics Gems (1990).
 */

/** A step of 1, 2 or 5 × 10^k close to `raw`. */
export function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  const f = m < 1.5 ? 1 : m < 3 ? 2 : m < 7 ? 5 : 10;
  return f * p;
}

/**
 * Ticks inside [lo, hi], about `count` of them, on multiples of a nice step.
 * @returns ascending values, each rounded to the step's decimals
 */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return [];
  if (hi < lo) [lo, hi] = [hi, lo];
  if (hi === lo) return [lo];
  const step = niceStep((hi - lo) / Math.max(1, count));
  const digits = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const out: number[] = [];
  // Stepping by index, not by repeated addition, keeps the values free of drift.
  for (let i = Math.ceil(lo / step - 1e-9); i * step <= hi + step * 1e-9; i++)
    out.push(Number((i * step).toFixed(digits)));
  return out;
}

/** Decimals that show a tick step without trailing noise. */
export function stepDecimals(step: number): number {
  return step > 0 && Number.isFinite(step) ? Math.max(0, -Math.floor(Math.log10(step) + 1e-9)) : 0;
}
