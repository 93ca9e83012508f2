/**
 * Axis ticks and scale-bar lengths on "nice" 1-2-5 steps (…, 0.5, 1, 2, 5, 10, …), so
 * labels read as round metres at any zoom.
 */

/** The smallest 1-2-5 step that is at least `raw` (raw > 0). */
export function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) throw new Error("raw step must be a positive number");
  const exp = Math.floor(Math.log10(raw));
  const base = 10 ** exp;
  for (const m of [1, 2, 5, 10]) {
    // A relative slack keeps 0.3 / 0.1 style float noise from skipping a step.
    if (m * base >= raw * (1 - 1e-9)) return m * base;
  }
  return 10 * base;
}

/** The largest 1-2-5 length not above `max` (max > 0), for a scale bar. */
export function niceLengthBelow(max: number): number {
  if (!(max > 0) || !Number.isFinite(max)) throw new Error("max length must be a positive number");
  const exp = Math.floor(Math.log10(max));
  const base = 10 ** exp;
  for (const m of [5, 2, 1]) {
    if (m * base <= max * (1 + 1e-9)) return m * base;
  }
  return base;
}

/** Decimal places that show a step exactly (0.25 needs 2, 5 needs 0). */
export function decimalsFor(step: number): number {
  let d = 0;
  while (d < 6 && Math.abs(Math.round(step * 10 ** d) - step * 10 ** d) > 1e-6) d++;
  return d;
}

/**
 * Tick values covering [min, max] with a 1-2-5 step chosen so ticks are at least
 * `minSpacing` apart in pixels, given `pixelsPerUnit`.
 */
export function axisTicks(
  min: number,
  max: number,
  pixelsPerUnit: number,
  minSpacing = 60,
): { step: number; values: number[] } {
  if (!(max >= min) || !(pixelsPerUnit > 0)) return { step: 1, values: [] };
  const step = niceStep(minSpacing / pixelsPerUnit);
  const first = Math.ceil(min / step - 1e-9);
  const last = Math.floor(max / step + 1e-9);
  const values: number[] = [];
  const d = decimalsFor(step);
  for (let k = first; k <= last && values.length < 1000; k++) values.push(Number((k * step).toFixed(d)));
  return { step, values };
}

/** A tick label, e.g. `12.5` or `-40`. */
export function formatTick(value: number, step: number): string {
  const text = value.toFixed(decimalsFor(step));
  return text === "-0" ? "0" : text;
}
