/**
 * The FS axis of the sweep chart: a range that starts and ends on a tick, ticks on multiples of
 * a nice step, and labels with as many decimals as the step needs, so every label reads exactly
 * the value its tick sits at (a tick at 1.05 is never printed "1.1").
 */
import { decimalsFor, niceTicks } from "@/lib/scales";

export interface FsAxis {
  domain: [number, number];
  ticks: number[];
  decimals: number;
}

/** An axis covering every value (FS and required FS), about `count` intervals. */
export function fsAxis(values: readonly number[], count = 6): FsAxis {
  const finite = values.filter(Number.isFinite);
  if (finite.length === 0) return { domain: [0, 2], ticks: [0, 0.5, 1, 1.5, 2], decimals: 1 };
  let lo = Math.min(...finite);
  let hi = Math.max(...finite);
  // A little room above and below so markers do not sit on the frame.
  const pad = Math.max((hi - lo) * 0.05, 0.02);
  lo -= pad;
  hi += pad;
  const inner = niceTicks(lo, hi, count);
  const step = inner.length > 1 ? inner[1] - inner[0] : Math.max(hi - lo, 0.1);
  const decimals = decimalsFor(Number(step.toPrecision(6)));
  const round = (v: number) => Number(v.toFixed(decimals));
  const first = round(Math.floor(lo / step + 1e-9) * step);
  const last = round(Math.ceil(hi / step - 1e-9) * step);
  const n = Math.round((last - first) / step);
  const ticks = Array.from({ length: n + 1 }, (_, k) => round(first + k * step));
  return { domain: [first, last], ticks, decimals };
}
