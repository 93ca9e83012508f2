/**
 * Scales and ticks for the small lab plots, kept free of React so they can be tested alone.
 * Tick steps are 1, 2 or 5 × 10^k, the usual "nice numbers" of chart axes (Heckbert, "Nice
 * numbers for graph labels", Graphics Gems, 1990).
 */

/** Maps a value linearly from `domain` to `range` (pixels); a zero-width domain maps to the range's middle. */
export function linearScale(
  domain: readonly [number, number],
  range: readonly [number, number],
): (value: number) => number {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0;
  if (span === 0) return () => (r0 + r1) / 2;
  return (value) => r0 + ((value - d0) / span) * (r1 - r0);
}

/** The nice step (1, 2 or 5 × 10^k) nearest to span/count. */
export function niceStep(span: number, count: number): number {
  if (!(span > 0) || !(count > 0)) return 1;
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const f = raw / power;
  const nice = f < 1.5 ? 1 : f < 3.5 ? 2 : f < 7.5 ? 5 : 10;
  return nice * power;
}

/** Ticks at multiples of a nice step between min and max inclusive (about `count` of them). */
export function niceTicks(min: number, max: number, count = 5): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max) || max < min) return [];
  if (max === min) return [min];
  const step = niceStep(max - min, count);
  const first = Math.ceil(min / step - 1e-9) * step;
  const ticks: number[] = [];
  for (let v = first; v <= max + step * 1e-9; v += step) ticks.push(Number(v.toPrecision(12)));
  return ticks;
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
  const step = niceStep(hi - lo, options.count ?? 5);
  return [Math.floor(lo / step + 1e-9) * step, Math.ceil(hi / step - 1e-9) * step];
}

/** Formats a tick label without float noise: 0.30000000000000004 → "0.3". */
export function formatTick(value: number): string {
  return String(Number(value.toPrecision(6)));
}
