/**
 * Every axis, plot and legend scale of the app: linear scales and "nice" ticks (1, 2 or 5 × 10^k
 * steps, after Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990) from d3-scale and
 * d3-array, plus the pixel-spaced ticks of the zoomable canvases. Free of React so it is tested alone.
 */
import { ticks } from "d3-array";
import { scaleLinear } from "d3-scale";

export type Scale = (value: number) => number;

/** Maps a value linearly from `domain` to `range` (pixels); a zero-width domain maps to the range's middle. */
export function linearScale(domain: readonly [number, number], range: readonly [number, number]): Scale {
  const scale = scaleLinear().domain(domain).range(range);
  return (value) => scale(value);
}

/**
 * Ticks inside [lo, hi] (either order), about `count` of them, ascending, on multiples of a nice step.
 * d3 builds each tick from an integer multiple, so the values carry no float noise.
 */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return [];
  return ticks(Math.min(lo, hi), Math.max(lo, hi), count);
}

/**
 * A domain that holds every value, widened outward to nice steps, optionally reaching zero
 * (a strength envelope reads best with the origin in view).
 */
export function niceDomain(
  values: readonly number[],
  options: { includeZero?: boolean; count?: number } = {},
): [number, number] {
  const finite = values.filter(Number.isFinite);
  if (options.includeZero) finite.push(0);
  if (finite.length === 0) return [0, 1];
  let lo = Math.min(...finite);
  let hi = Math.max(...finite);
  if (lo === hi) {
    const pad = Math.abs(lo) > 0 ? Math.abs(lo) * 0.1 : 1;
    lo -= pad;
    hi += pad;
    if (options.includeZero && lo < 0 && Math.min(...finite) >= 0) lo = 0;
  }
  const [a, b] = scaleLinear()
    .domain([lo, hi])
    .nice(options.count ?? 5)
    .domain();
  return [a, b];
}

/** The smallest 1-2-5 step that is at least `raw` (raw > 0): ticks of a zoomable canvas never crowd. */
export function niceStepAtLeast(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) throw new Error("raw step must be a positive number");
  const base = 10 ** Math.floor(Math.log10(raw));
  // A relative slack keeps 0.3 / 0.1 style float noise from skipping a step.
  for (const m of [1, 2, 5, 10]) if (m * base >= raw * (1 - 1e-9)) return m * base;
  return 10 * base;
}

/** The largest 1-2-5 length not above `max` (max > 0), for a scale bar. */
export function niceLengthBelow(max: number): number {
  if (!(max > 0) || !Number.isFinite(max)) throw new Error("max length must be a positive number");
  const base = 10 ** Math.floor(Math.log10(max));
  for (const m of [5, 2, 1]) if (m * base <= max * (1 + 1e-9)) return m * base;
  return base;
}

/** Decimal places that show a step exactly (0.25 needs 2, 5 needs 0). */
export function decimalsFor(step: number): number {
  let d = 0;
  while (d < 6 && Math.abs(Math.round(step * 10 ** d) - step * 10 ** d) > 1e-6) d++;
  return d;
}

/**
 * Tick values covering [min, max] with a 1-2-5 step chosen so ticks are at least `minSpacing`
 * pixels apart, given `pixelsPerUnit` (the canvases' axes and grid).
 */
export function axisTicks(
  min: number,
  max: number,
  pixelsPerUnit: number,
  minSpacing = 60,
): { step: number; values: number[] } {
  if (!(max >= min) || !(pixelsPerUnit > 0)) return { step: 1, values: [] };
  const step = niceStepAtLeast(minSpacing / pixelsPerUnit);
  const first = Math.ceil(min / step - 1e-9);
  const last = Math.floor(max / step + 1e-9);
  const values: number[] = [];
  const d = decimalsFor(step);
  for (let k = first; k <= last && values.length < 1000; k++) values.push(Number((k * step).toFixed(d)));
  return { step, values };
}

/**
 * A tick label: with the axis step, exactly the decimals the step needs (`12.5`, `-40`); without it,
 * six significant digits so float noise never shows (0.30000000000000004 → "0.3").
 */
export function formatTick(value: number, step?: number): string {
  const text = step === undefined ? String(Number(value.toPrecision(6))) : value.toFixed(decimalsFor(step));
  return text === "-0" ? "0" : text;
}
