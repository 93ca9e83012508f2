/**
 * The ground surface as the editor draws it: the upper boundary of all regions together.
 * It is worked out directly from the edges so it can be drawn while the geometry is still
 * half-finished or invalid (the engine's own version needs a valid section).
 */
import type { Point, Region } from "@/lib/stability";

interface Edge {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

function sloped(regions: readonly Region[]): Edge[] {
  const edges: Edge[] = [];
  for (const r of regions) {
    const n = r.points.length;
    for (let i = 0; i < n; i++) {
      const a = r.points[i];
      const b = r.points[(i + 1) % n];
      if (a[0] === b[0]) continue;
      edges.push(a[0] < b[0] ? { x1: a[0], y1: a[1], x2: b[0], y2: b[1] } : { x1: b[0], y1: b[1], x2: a[0], y2: a[1] });
    }
  }
  return edges;
}

function yOn(e: Edge, x: number): number {
  return e.y1 + ((e.y2 - e.y1) * (x - e.x1)) / (e.x2 - e.x1);
}

/** x where two edges cross strictly inside their common span, if they do. */
function crossingX(a: Edge, b: Edge): number | null {
  const lo = Math.max(a.x1, b.x1);
  const hi = Math.min(a.x2, b.x2);
  if (!(hi > lo)) return null;
  const d0 = yOn(a, lo) - yOn(b, lo);
  const d1 = yOn(a, hi) - yOn(b, hi);
  if (d0 * d1 >= 0) return null;
  return lo + ((hi - lo) * d0) / (d0 - d1);
}

/** Highest edge elevation at x, from edges reaching left of x (side -1) or right of it (+1). */
function topAt(edges: readonly Edge[], x: number, side: -1 | 1): number | null {
  let best: number | null = null;
  for (const e of edges) {
    const spans = side < 0 ? e.x1 < x && x <= e.x2 : e.x1 <= x && x < e.x2;
    if (!spans) continue;
    const y = yOn(e, x);
    if (best === null || y > best) best = y;
  }
  return best;
}

function dropCollinear(pts: Point[]): Point[] {
  const out: Point[] = [];
  for (const p of pts) {
    const n = out.length;
    if (n > 0 && out[n - 1][0] === p[0] && out[n - 1][1] === p[1]) continue;
    if (n >= 2) {
      const [a, b] = [out[n - 2], out[n - 1]];
      const cross = (b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]);
      const forward = (b[0] - a[0]) * (p[0] - b[0]) + (b[1] - a[1]) * (p[1] - b[1]) > 0;
      if (Math.abs(cross) <= 1e-9 * Math.max(1, Math.hypot(p[0] - a[0], p[1] - a[1])) && forward) out.pop();
    }
    out.push(p);
  }
  return out;
}

/**
 * The ground surface polyline (m), x non-decreasing; a vertical face shows as two points
 * with the same x. Empty when there are no regions. Overhangs are read as their top.
 */
export function groundSurface(regions: readonly Region[]): Point[] {
  const edges = sloped(regions);
  if (edges.length === 0) return [];
  const xs = new Set<number>();
  for (const e of edges) {
    xs.add(e.x1);
    xs.add(e.x2);
  }
  // The envelope can change edge between vertices where two edges cross.
  for (let i = 0; i < edges.length; i++) {
    for (let j = i + 1; j < edges.length; j++) {
      const x = crossingX(edges[i], edges[j]);
      if (x !== null) xs.add(x);
    }
  }
  const pts: Point[] = [];
  for (const x of [...xs].sort((a, b) => a - b)) {
    const left = topAt(edges, x, -1);
    const right = topAt(edges, x, 1);
    if (left !== null) pts.push([x, left]);
    if (right !== null && (left === null || Math.abs(right - left) > 1e-12)) pts.push([x, right]);
  }
  return dropCollinear(pts);
}

/** Ground elevation at x (m) by interpolation; on a vertical face the higher point. */
export function groundAt(ground: readonly Point[], x: number): number | null {
  const n = ground.length;
  if (n === 0 || x < ground[0][0] || x > ground[n - 1][0]) return null;
  let best: number | null = null;
  for (let i = 0; i < n; i++) {
    const a = ground[i];
    if (a[0] === x && (best === null || a[1] > best)) best = a[1];
    const b = ground[i + 1];
    if (b && a[0] < x && x < b[0]) {
      const y = a[1] + ((b[1] - a[1]) * (x - a[0])) / (b[0] - a[0]);
      if (best === null || y > best) best = y;
    }
  }
  return best;
}
