/**
 * The ground surface: the top of the union of the regions, read off the strip table.
 * Vertical faces appear as two points with the same x; overhangs cannot occur because
 * the strip table rejects voids below the ground.
 */
import type { StripTable } from "./strip-table";

/** Ground polyline, x non-decreasing (m). */
export interface GroundLine {
  x: Float64Array;
  y: Float64Array;
}

/** Derives the ground polyline from the strip table, dropping collinear interior points. */
export function deriveGround(t: StripTable): GroundLine {
  const xs: number[] = [];
  const ys: number[] = [];
  const top = (k: number, x: number) => t.lineA[t.lineOff[k]] + t.lineB[t.lineOff[k]] * x;
  xs.push(t.xs[0]);
  ys.push(top(0, t.xs[0]));
  for (let k = 1; k < t.n; k++) {
    const x = t.xs[k];
    const yl = top(k - 1, x);
    const yr = top(k, x);
    xs.push(x);
    ys.push(yl);
    if (Math.abs(yl - yr) > 1e-9) {
      xs.push(x);
      ys.push(yr);
    }
  }
  xs.push(t.xs[t.n]);
  ys.push(top(t.n - 1, t.xs[t.n]));
  return simplify(xs, ys);
}

/** Removes points lying on the straight line between their neighbours. */
function simplify(xs: number[], ys: number[]): GroundLine {
  const ox: number[] = [xs[0]];
  const oy: number[] = [ys[0]];
  for (let i = 1; i + 1 < xs.length; i++) {
    const ax = ox[ox.length - 1];
    const ay = oy[oy.length - 1];
    const cross = (xs[i] - ax) * (ys[i + 1] - ay) - (ys[i] - ay) * (xs[i + 1] - ax);
    const scale = Math.hypot(xs[i + 1] - ax, ys[i + 1] - ay) * Math.hypot(xs[i] - ax, ys[i] - ay);
    const forward = (xs[i] - ax) * (xs[i + 1] - xs[i]) + (ys[i] - ay) * (ys[i + 1] - ys[i]) > 0;
    if (Math.abs(cross) <= 1e-12 * scale && forward) continue;
    ox.push(xs[i]);
    oy.push(ys[i]);
  }
  ox.push(xs[xs.length - 1]);
  oy.push(ys[ys.length - 1]);
  return { x: Float64Array.from(ox), y: Float64Array.from(oy) };
}

/** Ground elevation at x by interpolation; on a vertical face, the upper point is returned. */
export function groundAt(g: GroundLine, x: number): number {
  const n = g.x.length;
  if (x <= g.x[0]) return g.y[0];
  if (x >= g.x[n - 1]) return g.y[n - 1];
  let best = -Infinity;
  for (let i = 0; i + 1 < n; i++) {
    const x1 = g.x[i];
    const x2 = g.x[i + 1];
    if (x < x1 || x > x2) continue;
    const y = x2 === x1 ? Math.max(g.y[i], g.y[i + 1]) : g.y[i] + ((g.y[i + 1] - g.y[i]) * (x - x1)) / (x2 - x1);
    if (y > best) best = y;
  }
  return best;
}
