/**
 * The strip table (docs/engine.md §5): the section cut into vertical strips at every vertex x,
 * so that inside a strip every region boundary is one straight line. Each strip lists its
 * boundary lines from the ground down to the base, with the material between them, so a
 * soil column is a binary search plus a short loop. Building it also finds overlaps,
 * voids (holes, overhangs) and uncovered x ranges.
 */
import { fmtPoint, issue, type Issue } from "./issues";
import { uniqueSorted } from "./geometry";

/** One region ring as the builder needs it: points (m), material index, region index. */
export interface RingInput {
  points: ReadonlyArray<readonly [number, number]>;
  material: number;
  region: number;
}

/** Strips between xs[k] and xs[k+1]; lines y = lineA + lineB·x, top (ground) first. */
export interface StripTable {
  n: number;
  xs: Float64Array;
  /** Lines of strip k are lineOff[k] … lineOff[k+1] − 1 (layers + 1 lines). */
  lineOff: Int32Array;
  lineA: Float64Array;
  lineB: Float64Array;
  /** Material of the layer just below line i (unused for a strip's last line). */
  layerMat: Int32Array;
  /** 1 when the arc crossing line i changes the base material or leaves the section. */
  lineBreak: Uint8Array;
}

/** Vertical tolerance for contact between regions (docs/engine.md §1: 1 mm). */
export const CONTACT_TOL = 1e-3;
/** Two vertex x within this (m) are one strip boundary. */
export const X_MERGE_TOL = 1e-6;

interface Interval {
  ta: number;
  tb: number;
  ba: number;
  bb: number;
  material: number;
  region: number;
}

/** One strip's layers before the table is flattened: top lines (ground first), materials, the base line. */
interface StripLayers {
  topA: number[];
  topB: number[];
  mats: number[];
  baseA: number;
  baseB: number;
}

/**
 * Builds the strip table from region rings plus extra break abscissae (water, loads).
 * Near-linear in the number of vertices: each edge is put in the strips it spans (found by
 * binary search), and each strip sorts only its own few edges. Neighbouring strips whose
 * layers continue unchanged across a vertex (collinear points) become one strip, unless an
 * extra break asks for the boundary.
 * @returns the table (null when the regions leave an x range uncovered) and every problem found.
 */
export function buildStripTable(
  rings: ReadonlyArray<RingInput>,
  extraBreaks: ReadonlyArray<number> = [],
): { table: StripTable | null; issues: Issue[] } {
  const issues: Issue[] = [];
  const seen = new Set<string>();
  let xmin = Infinity;
  let xmax = -Infinity;
  const xsAll: number[] = [];
  for (const r of rings)
    for (const p of r.points) {
      xsAll.push(p[0]);
      xmin = Math.min(xmin, p[0]);
      xmax = Math.max(xmax, p[0]);
    }
  const extra: number[] = [];
  for (const x of extraBreaks) if (x > xmin && x < xmax) extra.push(x);
  const xs = uniqueSorted(xsAll.concat(extra), X_MERGE_TOL);
  const keep = protectedBoundaries(xs, uniqueSorted(extra, X_MERGE_TOL));
  const buckets = bucketEdges(rings, xs);
  const strips: (StripLayers | null)[] = [];
  let covered = true;
  for (let k = 0; k + 1 < xs.length; k++) {
    const x0 = xs[k];
    const x1 = xs[k + 1];
    const ivs = stripIntervals(rings, buckets[k], x0, x1);
    if (ivs.length === 0) {
      covered = false;
      issues.push(
        issue(
          "regions-not-covering",
          "regions",
          `No region covers x = ${x0.toFixed(2)} to ${x1.toFixed(2)} m: the regions must form one section without side gaps.`,
          [(x0 + x1) / 2, 0],
        ),
      );
      strips.push(null);
      continue;
    }
    checkContacts(ivs, x0, x1, issues, seen);
    // Merge neighbouring layers of one material: fewer lines, same column.
    const layers: StripLayers = { topA: [], topB: [], mats: [], baseA: 0, baseB: 0 };
    for (let i = 0; i < ivs.length; i++) {
      if (i > 0 && ivs[i].material === layers.mats[layers.mats.length - 1]) continue;
      layers.topA.push(ivs[i].ta);
      layers.topB.push(ivs[i].tb);
      layers.mats.push(ivs[i].material);
    }
    const last = ivs[ivs.length - 1];
    layers.baseA = last.ba;
    layers.baseB = last.bb;
    strips.push(layers);
  }
  if (!covered) return { table: null, issues };
  return { table: flatten(xs, strips as StripLayers[], keep), issues };
}

/** Marks the strip boundaries an extra break asks for (index k: boundary xs[k]). */
function protectedBoundaries(xs: number[], extra: number[]): Uint8Array {
  const keep = new Uint8Array(xs.length);
  let j = 0;
  for (let k = 0; k < xs.length; k++) {
    while (j < extra.length && extra[j] < xs[k] - X_MERGE_TOL) j++;
    if (j < extra.length && Math.abs(extra[j] - xs[k]) <= X_MERGE_TOL) keep[k] = 1;
  }
  return keep;
}

/** True when strip b's layers continue strip a's unchanged across their shared boundary. */
function sameLayers(a: StripLayers, b: StripLayers): boolean {
  if (a.mats.length !== b.mats.length) return false;
  const same = (a1: number, b1: number, a2: number, b2: number) =>
    Math.abs(b1 - b2) <= 1e-12 * (1 + Math.abs(b1)) && Math.abs(a1 - a2) <= 1e-9 * (1 + Math.abs(a1));
  for (let i = 0; i < a.mats.length; i++) {
    if (a.mats[i] !== b.mats[i] || !same(a.topA[i], a.topB[i], b.topA[i], b.topB[i])) return false;
  }
  return same(a.baseA, a.baseB, b.baseA, b.baseB);
}

/** The flat typed-array table, with strips that continue each other unchanged joined. */
function flatten(xs: number[], strips: StripLayers[], keep: Uint8Array): StripTable {
  const outXs: number[] = [xs[0]];
  const lineA: number[] = [];
  const lineB: number[] = [];
  const layerMat: number[] = [];
  const lineBreak: number[] = [];
  const lineOff: number[] = [0];
  let prev: StripLayers | null = null;
  for (let k = 0; k < strips.length; k++) {
    const s = strips[k];
    if (prev !== null && keep[k] === 0 && sameLayers(prev, s)) {
      outXs[outXs.length - 1] = xs[k + 1];
      continue;
    }
    outXs.push(xs[k + 1]);
    for (let i = 0; i < s.mats.length; i++) {
      lineA.push(s.topA[i]);
      lineB.push(s.topB[i]);
      layerMat.push(s.mats[i]);
      lineBreak.push(i === 0 ? 0 : 1);
    }
    lineA.push(s.baseA);
    lineB.push(s.baseB);
    layerMat.push(-1);
    lineBreak.push(1);
    lineOff.push(lineA.length);
    prev = s;
  }
  return {
    n: outXs.length - 1,
    xs: Float64Array.from(outXs),
    lineOff: Int32Array.from(lineOff),
    lineA: Float64Array.from(lineA),
    lineB: Float64Array.from(lineB),
    layerMat: Int32Array.from(layerMat),
    lineBreak: Uint8Array.from(lineBreak),
  };
}

/** An edge of a ring as a line y = a + b·x over its x range. */
interface EdgeLine {
  a: number;
  b: number;
  ring: number;
}

/** For each strip, the non-vertical ring edges that span it. */
function bucketEdges(rings: ReadonlyArray<RingInput>, xs: number[]): EdgeLine[][] {
  const buckets: EdgeLine[][] = [];
  for (let k = 0; k + 1 < xs.length; k++) buckets.push([]);
  rings.forEach((r, ri) => {
    const pts = r.points;
    for (let i = 0; i < pts.length; i++) {
      const p = pts[i];
      const q = pts[(i + 1) % pts.length];
      const lo = Math.min(p[0], q[0]);
      const hi = Math.max(p[0], q[0]);
      if (hi - lo <= X_MERGE_TOL) continue;
      const b = (q[1] - p[1]) / (q[0] - p[0]);
      const e: EdgeLine = { a: p[1] - b * p[0], b, ring: ri };
      // The strips whose midpoints the edge spans: strips are bounded by the merged vertex x, so
      // an edge covers a strip wholly or not at all, and the midpoint decides without a tolerance
      // (a face a micrometre off vertical makes a strip of its own, not a gap in its neighbours).
      for (let k = Math.max(0, lowerBound(xs, lo) - 1); k + 1 < xs.length && xs[k] < hi; k++) {
        const xm = (xs[k] + xs[k + 1]) / 2;
        if (xm > lo && xm < hi) buckets[k].push(e);
      }
    }
  });
  return buckets;
}

/** First index i with xs[i] ≥ x (xs.length if none). */
function lowerBound(xs: number[], x: number): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Solid intervals of every ring across one strip, sorted from the top down. */
function stripIntervals(rings: ReadonlyArray<RingInput>, edges: EdgeLine[], x0: number, x1: number): Interval[] {
  const xm = (x0 + x1) / 2;
  // Edges of one ring together, each ring's from the top down: they pair into solid intervals.
  const sorted = edges
    .map((e) => ({ e, y: e.a + e.b * xm }))
    .sort((u, v) => (u.e.ring !== v.e.ring ? u.e.ring - v.e.ring : v.y - u.y));
  const out: Interval[] = [];
  let i = 0;
  while (i < sorted.length) {
    let j = i;
    while (j < sorted.length && sorted[j].e.ring === sorted[i].e.ring) j++;
    const ring = rings[sorted[i].e.ring];
    for (let t = i; t + 1 < j; t += 2) {
      out.push({
        ta: sorted[t].e.a,
        tb: sorted[t].e.b,
        ba: sorted[t + 1].e.a,
        bb: sorted[t + 1].e.b,
        material: ring.material,
        region: ring.region,
      });
    }
    i = j;
  }
  out.sort((u, v) => v.ta + v.tb * xm - (u.ta + u.tb * xm));
  return out;
}

/** Reports overlaps and voids between vertically neighbouring intervals of one strip. */
function checkContacts(ivs: Interval[], x0: number, x1: number, issues: Issue[], seen: Set<string>): void {
  for (let i = 0; i + 1 < ivs.length; i++) {
    const up = ivs[i];
    const dn = ivs[i + 1];
    // The difference of two lines is linear, so its ends bound it over the strip.
    const d0 = dn.ta + dn.tb * x0 - (up.ba + up.bb * x0);
    const d1 = dn.ta + dn.tb * x1 - (up.ba + up.bb * x1);
    const worst = Math.abs(d0) >= Math.abs(d1) ? 0 : 1;
    const d = worst === 0 ? d0 : d1;
    if (Math.abs(d) <= CONTACT_TOL) continue;
    const x = worst === 0 ? x0 : x1;
    const y = up.ba + up.bb * x;
    const a = Math.min(up.region, dn.region);
    const b = Math.max(up.region, dn.region);
    if (d > 0) {
      const key = `o${a}-${b}`;
      if (seen.has(key)) continue;
      seen.add(key);
      const msg =
        a === b
          ? `regions[${a}] overlaps itself near ${fmtPoint(x, y)}. Redraw it as one simple polygon.`
          : `regions[${a}] and regions[${b}] overlap near ${fmtPoint(x, y)}. Move the shared boundary so each point of the section belongs to one region.`;
      issues.push(issue("regions-overlap", `regions[${b}]`, msg, [x, y]));
    } else {
      const key = `g${a}-${b}`;
      if (seen.has(key)) continue;
      seen.add(key);
      issues.push(
        issue(
          "regions-void",
          `regions[${dn.region}]`,
          `Void below the ground at ${fmtPoint(x, y)} between regions[${up.region}] and regions[${dn.region}]. Regions must fill the section from the ground down to its base: no holes or overhangs.`,
          [x, y],
        ),
      );
    }
  }
}

/** Index of the strip holding x (the right-hand one when x is a boundary), clamped. */
export function findStrip(t: StripTable, x: number): number {
  const xs = t.xs;
  let lo = 0;
  let hi = t.n;
  if (x <= xs[0]) return 0;
  if (x >= xs[hi]) return hi - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Ground elevation (m) at x inside strip k, from the strip's top line. */
export function groundInStrip(t: StripTable, k: number, x: number): number {
  const i = t.lineOff[k];
  return t.lineA[i] + t.lineB[i] * x;
}

/** Base elevation (m) of the section at x inside strip k. */
export function bottomInStrip(t: StripTable, k: number, x: number): number {
  const i = t.lineOff[k + 1] - 1;
  return t.lineA[i] + t.lineB[i] * x;
}
