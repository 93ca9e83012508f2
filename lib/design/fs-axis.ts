/**
 * The FS axis of the sweep chart: a range that starts and ends on a tick, ticks on multiples of
 * a nice step, and labels with as many decimals as the step needs, so every label reads exactly
 * the value its tick sits at (a tick at 1.05 is never printed "1.1").
 */
import { niceStep, niceTicks, stepDecimals } from "../runs/nice-ticks";

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
  const step = niceStep((hi - lo) / count);
  const decimals = stepDecimals(step);
  const round = (v: number) => Number(v.toFixed(decimals));
  const first = round(Math.floor(lo / step + 1e-9) * step);
  const last = round(Math.ceil(hi / step - 1e-9) * step);
  // The span is a whole number of steps, so niceTicks picks this same step.
  const ticks = niceTicks(first, last, Math.round((last - first) / step));
  return { domain: [first, last], ticks, decimals };
}
