/**
 * Drawing geometry of slip circles: points along the lower arc between a slip mass's two
 * ends, and the slice boundaries from the arc up to the ground. Only the lower arc is a
 * slip surface (docs/engine.md §3), so every point returned lies at or below the centre.
 */
import type { Circle } from "@/lib/stability";

type Pt = readonly [number, number];

/** Elevation of the lower arc at x (m); clamped to the circle's sides outside |x − xc| ≤ r. */
export function arcY(c: Circle, x: number): number {
  const dx = Math.min(c.r, Math.abs(x - c.xc));
  return c.yc - Math.sqrt(Math.max(0, c.r * c.r - dx * dx));
}

/** Angle (radians, in [−π, 0]) of the lower-arc point at abscissa x. */
function lowerAngle(c: Circle, x: number): number {
  const u = Math.min(1, Math.max(-1, (x - c.xc) / c.r));
  return -Math.acos(u);
}

/**
 * Points along the lower arc from the abscissa of `from` to that of `to`, spaced at most
 * `maxStepDeg` degrees apart, both ends included.
 * @returns [x0, y0, x1, y1, …] in metres, ready for a polyline
 */
export function arcPoints(c: Circle, from: Pt, to: Pt, maxStepDeg = 2): number[] {
  if (!(c.r > 0)) return [];
  const a = lowerAngle(c, from[0]);
  const b = lowerAngle(c, to[0]);
  const n = Math.min(720, Math.max(2, Math.ceil(Math.abs(b - a) / ((maxStepDeg * Math.PI) / 180))));
  const out: number[] = [];
  for (let i = 0; i <= n; i++) {
    const t = a + ((b - a) * i) / n;
    out.push(c.xc + c.r * Math.cos(t), c.yc + c.r * Math.sin(t));
  }
  return out;
}

/** A slice's side: a vertical from the arc up to the top of the soil. */
export interface SliceSide {
  x: number;
  yBase: number;
  yTop: number;
}

/**
 * Slice sides of a slip mass: each slice's left side plus the last slice's right side.
 * @param bounds slice limits in order (xLeft, xRight), m
 * @param topAt ground elevation at x (m)
 */
export function sliceSides(
  c: Circle,
  bounds: ReadonlyArray<{ xLeft: number; xRight: number }>,
  topAt: (x: number) => number,
): SliceSide[] {
  if (bounds.length === 0) return [];
  const xs = bounds.map((s) => s.xLeft);
  xs.push(bounds[bounds.length - 1].xRight);
  return xs.map((x) => {
    const yBase = arcY(c, x);
    const top = topAt(x);
    return { x, yBase, yTop: Number.isFinite(top) ? Math.max(top, yBase) : yBase };
  });
}
