/**
 * One-at-a-time sensitivity of FS: each input moved down and up by a chosen amount with the
 * others at their stored values (the tornado diagram, largest swing first), FS along one input's
 * range, and where that line crosses the required FS (bisection on a bracketing pair).
 */
import type { InputParameter } from "./parameters";

/** How far each input moves: a fraction of its stored value, or one standard deviation. */
export type Variation = { kind: "percent"; percent: number } | { kind: "sd" };

/** The low and high values of an input for a variation, kept inside the input's range; null when it cannot move. */
export function variedValues(p: InputParameter, variation: Variation): { low: number; high: number } | null {
  let delta: number;
  if (variation.kind === "sd") {
    if (p.sd === undefined) return null;
    delta = p.sd;
  } else {
    delta = Math.abs(p.stored) * (variation.percent / 100);
  }
  if (!(delta > 0)) return null;
  return { low: Math.max(p.min, p.stored - delta), high: Math.min(p.max, p.stored + delta) };
}

export interface TornadoBar {
  key: string;
  label: string;
  low: number;
  high: number;
  fsLow: number | null;
  fsHigh: number | null;
  /** |FS(high) − FS(low)|; 0 when either end gave no FS. */
  swing: number;
}

/** Bars ordered by swing, largest first (ties by label, so the order is stable). */
export function tornadoOrder(bars: readonly TornadoBar[]): TornadoBar[] {
  return [...bars].sort((a, b) => b.swing - a.swing || a.label.localeCompare(b.label));
}

export function tornadoBar(
  p: InputParameter,
  range: { low: number; high: number },
  fsLow: number | null,
  fsHigh: number | null,
): TornadoBar {
  const swing = fsLow !== null && fsHigh !== null ? Math.abs(fsHigh - fsLow) : 0;
  return { key: p.key, label: p.label, low: range.low, high: range.high, fsLow, fsHigh, swing };
}

/** n evenly spaced values from min to max, both included. */
export function sweepValues(min: number, max: number, n: number): number[] {
  if (n < 2) return [min];
  return Array.from({ length: n }, (_, i) => (i === n - 1 ? max : min + ((max - min) * i) / (n - 1)));
}

/**
 * The first pair of neighbouring sweep points whose FS lie on either side of the target, or
 * null when the line never crosses it.
 */
export function bracketTarget(
  points: readonly { x: number; fs: number | null }[],
  target: number,
): { lo: number; hi: number } | null {
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (a.fs === null || b.fs === null) continue;
    if ((a.fs - target) * (b.fs - target) <= 0) return { lo: a.x, hi: b.x };
  }
  return null;
}

/**
 * The value of x in [lo, hi] where f(x) = target, by bisection (f continuous with f(lo) and
 * f(hi) on opposite sides of the target). Stops when the bracket is narrower than `tol`.
 */
export async function bisectTarget(
  f: (x: number) => Promise<number | null>,
  lo: number,
  hi: number,
  target: number,
  tol: number,
  maxSteps = 40,
): Promise<number | null> {
  let fLo = await f(lo);
  const fHi = await f(hi);
  if (fLo === null || fHi === null || (fLo - target) * (fHi - target) > 0) return null;
  if (fLo === target) return lo;
  if (fHi === target) return hi;
  let a = lo;
  let b = hi;
  for (let i = 0; i < maxSteps && Math.abs(b - a) > tol; i++) {
    const m = (a + b) / 2;
    const fm = await f(m);
    if (fm === null) return null;
    if ((fm - target) * (fLo - target) <= 0) b = m;
    else {
      a = m;
      fLo = fm;
    }
  }
  return (a + b) / 2;
}
