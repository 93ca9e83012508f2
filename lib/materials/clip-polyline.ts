/**
 * Cuts a polyline to a rectangle, so a fitted line or a reference curve ends where the plot's frame
 * does (Liang & Barsky, "A new concept and method for line clipping", ACM TOG 3(1), 1984).
 */
export interface ClipRect {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

type P = readonly [number, number];

/** The part of segment a–b inside the rectangle, or null. */
export function clipSegment(a: P, b: P, r: ClipRect): [[number, number], [number, number]] | null {
  const [xmin, xmax] = [Math.min(r.x0, r.x1), Math.max(r.x0, r.x1)];
  const [ymin, ymax] = [Math.min(r.y0, r.y1), Math.max(r.y0, r.y1)];
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  let t0 = 0;
  let t1 = 1;
  const edges: [number, number][] = [
    [-dx, a[0] - xmin],
    [dx, xmax - a[0]],
    [-dy, a[1] - ymin],
    [dy, ymax - a[1]],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return null;
  }
  return [
    [a[0] + t0 * dx, a[1] + t0 * dy],
    [a[0] + t1 * dx, a[1] + t1 * dy],
  ];
}

/** The pieces of a polyline inside the rectangle, each a polyline of its own. */
export function clipPolyline(points: readonly P[], r: ClipRect): [number, number][][] {
  const pieces: [number, number][][] = [];
  let current: [number, number][] | null = null;
  for (let i = 1; i < points.length; i++) {
    const seg = clipSegment(points[i - 1], points[i], r);
    if (!seg) {
      current = null;
      continue;
    }
    const last = current?.[current.length - 1];
    if (current && last && last[0] === seg[0][0] && last[1] === seg[0][1]) current.push(seg[1]);
    else {
      current = [seg[0], seg[1]];
      pieces.push(current);
    }
    // A segment that left the rectangle ends its piece.
    if (seg[1][0] !== points[i][0] || seg[1][1] !== points[i][1]) current = null;
  }
  return pieces;
}
