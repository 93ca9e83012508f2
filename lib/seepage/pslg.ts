/**
 * The planar straight-line graph the mesher triangulates: every region edge and drain split at
 * every vertex that lies on it (so shared and overlapping edges get the same nodes), cut into
 * pieces no longer than the mesh size, plus a triangular lattice of interior points in each
 * pervious region kept clear of the edges. Coordinates in m.
 */
import { crossing, segmentDistance } from "./geometry";
import type { Point } from "./types";

export interface PslgInput {
  polygons: Point[][];
  /** Which polygons get interior points (impenetrable ones need only their outline). */
  filled: boolean[];
  drains: Point[][];
  /** Elevations where the mesh should have a node on every edge that crosses them (pool levels). */
  levels: number[];
  h: number;
}

export interface Pslg {
  px: number[];
  py: number[];
  edges: [number, number][];
  tol: number;
}

interface Segment {
  a: Point;
  b: Point;
}

class PointSet {
  px: number[] = [];
  py: number[] = [];
  private keys = new Map<string, number>();
  constructor(private readonly snap: number) {}
  add(x: number, y: number): number {
    const key = `${Math.round(x / this.snap)},${Math.round(y / this.snap)}`;
    const found = this.keys.get(key);
    if (found !== undefined) return found;
    this.px.push(x);
    this.py.push(y);
    this.keys.set(key, this.px.length - 1);
    return this.px.length - 1;
  }
}

/** Bucket grid of short segments for "is anything within d of this point" queries. */
class SegmentGrid {
  private cells = new Map<string, number[]>();
  private segs: number[] = [];
  constructor(private readonly cell: number) {}
  insert(ax: number, ay: number, bx: number, by: number): void {
    const id = this.segs.length / 4;
    this.segs.push(ax, ay, bx, by);
    const i0 = Math.floor(Math.min(ax, bx) / this.cell);
    const i1 = Math.floor(Math.max(ax, bx) / this.cell);
    const j0 = Math.floor(Math.min(ay, by) / this.cell);
    const j1 = Math.floor(Math.max(ay, by) / this.cell);
    for (let i = i0; i <= i1; i++)
      for (let j = j0; j <= j1; j++) {
        const k = `${i},${j}`;
        const list = this.cells.get(k);
        if (list) list.push(id);
        else this.cells.set(k, [id]);
      }
  }
  /** True when some segment passes within d (≤ cell) of (x, y). */
  near(x: number, y: number, d: number): boolean {
    const ci = Math.floor(x / this.cell);
    const cj = Math.floor(y / this.cell);
    for (let i = ci - 1; i <= ci + 1; i++)
      for (let j = cj - 1; j <= cj + 1; j++) {
        const list = this.cells.get(`${i},${j}`);
        if (!list) continue;
        for (const id of list) {
          const s = this.segs;
          if (segmentDistance(x, y, s[4 * id], s[4 * id + 1], s[4 * id + 2], s[4 * id + 3]).d < d) return true;
        }
      }
    return false;
  }
}

/** Builds the graph; `scale` is the section's size, for the snapping tolerance. */
export function buildPslg(input: PslgInput, scale: number): Pslg {
  const tol = 1e-7 * scale;
  const { h } = input;
  const segments: Segment[] = [];
  for (const poly of input.polygons)
    for (let i = 0; i < poly.length; i++) segments.push({ a: poly[i], b: poly[(i + 1) % poly.length] });
  const drainSegments: Segment[] = [];
  for (const d of input.drains) for (let i = 1; i < d.length; i++) drainSegments.push({ a: d[i - 1], b: d[i] });

  const vertices: Point[] = [];
  for (const poly of input.polygons) vertices.push(...poly);
  for (const d of input.drains) vertices.push(...d);
  for (const s of segments)
    for (const level of input.levels) {
      const fa = s.a[1] - level;
      const fb = s.b[1] - level;
      if (fa * fb < 0) {
        const t = fa / (fa - fb);
        vertices.push([s.a[0] + t * (s.b[0] - s.a[0]), level]);
      }
    }
  for (let i = 0; i < drainSegments.length; i++) {
    const d = drainSegments[i];
    for (const s of [...segments, ...drainSegments.slice(i + 1)]) {
      const c = crossing(d.a, d.b, s.a, s.b);
      if (c) vertices.push(c);
    }
  }

  const points = new PointSet(tol);
  const grid = new SegmentGrid(h);
  const edgeKeys = new Set<string>();
  const edges: [number, number][] = [];
  for (const s of [...segments, ...drainSegments]) {
    for (const [a, b] of splitAtVertices(s, vertices, tol)) {
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      if (len <= tol) continue;
      const n = Math.max(1, Math.ceil(len / h - 1e-9));
      let prev = points.add(a[0], a[1]);
      for (let k = 1; k <= n; k++) {
        const t = k / n;
        const next = k === n ? points.add(b[0], b[1]) : points.add(a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1]));
        const key = prev < next ? `${prev},${next}` : `${next},${prev}`;
        if (prev !== next && !edgeKeys.has(key)) {
          edgeKeys.add(key);
          edges.push([prev, next]);
          grid.insert(points.px[prev], points.py[prev], points.px[next], points.py[next]);
        }
        prev = next;
      }
    }
  }
  addLattice(input, points, grid);
  return { px: points.px, py: points.py, edges, tol };
}

/** The pieces of a segment between the vertices that lie on it, in order from a to b. */
function splitAtVertices(s: Segment, vertices: readonly Point[], tol: number): [Point, Point][] {
  const xmin = Math.min(s.a[0], s.b[0]) - tol;
  const xmax = Math.max(s.a[0], s.b[0]) + tol;
  const ymin = Math.min(s.a[1], s.b[1]) - tol;
  const ymax = Math.max(s.a[1], s.b[1]) + tol;
  const ts: number[] = [0, 1];
  for (const v of vertices) {
    if (v[0] < xmin || v[0] > xmax || v[1] < ymin || v[1] > ymax) continue;
    const { d, t } = segmentDistance(v[0], v[1], s.a[0], s.a[1], s.b[0], s.b[1]);
    if (d < tol * 10 && t > 1e-9 && t < 1 - 1e-9) ts.push(t);
  }
  ts.sort((p, q) => p - q);
  const at = (t: number): Point => [s.a[0] + t * (s.b[0] - s.a[0]), s.a[1] + t * (s.b[1] - s.a[1])];
  const out: [Point, Point][] = [];
  for (let i = 1; i < ts.length; i++) if (ts[i] - ts[i - 1] > 1e-12) out.push([at(ts[i - 1]), at(ts[i])]);
  return out;
}

/** Equilateral lattice points inside each filled polygon, at least 0.45·h from every edge. */
function addLattice(input: PslgInput, points: PointSet, grid: SegmentGrid): void {
  const { h } = input;
  const dy = (h * Math.sqrt(3)) / 2;
  input.polygons.forEach((poly, r) => {
    if (!input.filled[r]) return;
    let x0 = Infinity;
    let x1 = -Infinity;
    let y0 = Infinity;
    let y1 = -Infinity;
    for (const [x, y] of poly) {
      x0 = Math.min(x0, x);
      x1 = Math.max(x1, x);
      y0 = Math.min(y0, y);
      y1 = Math.max(y1, y);
    }
    // A lattice anchored at the origin, so neighbouring regions share one pattern. Each row is
    // cut by the outline once (even–odd crossings), not tested point by point.
    for (let j = Math.ceil(y0 / dy); j * dy <= y1; j++) {
      const y = j * dy;
      const shift = (Math.abs(j) % 2) * 0.5 * h;
      const cuts: number[] = [];
      for (let i = 0, k = poly.length - 1; i < poly.length; k = i++) {
        const [xi, yi] = poly[i];
        const [xk, yk] = poly[k];
        if (yi > y !== yk > y) cuts.push(((xk - xi) * (y - yi)) / (yk - yi) + xi);
      }
      cuts.sort((a, b) => a - b);
      for (let c = 0; c + 1 < cuts.length; c += 2)
        for (let i = Math.ceil((cuts[c] - shift) / h); i * h + shift < cuts[c + 1]; i++) {
          const x = i * h + shift;
          if (x <= cuts[c] || grid.near(x, y, 0.45 * h)) continue;
          points.add(x, y);
        }
    }
  });
}
