/**
 * Where a circle meets the ground and which pieces of soil lie above its lower arc
 * (docs/engine.md §3 "Entry and exit"; docs/engine-io.md on separate slip masses). Allocation-free.
 */
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";
import * as status from "./status";
import * as strips from "./strip-table";

// Module-local copies: imported bindings are property reads on every use in the hot loop (a getter
// call for a function where modules are compiled to CommonJS, as under tsx).
const findStrip = strips.findStrip;
const NO_MASS = status.NO_MASS;
const OK = status.OK;
const OUT_OF_SECTION = status.OUT_OF_SECTION;
const UPPER_ARC = status.UPPER_ARC;
const TOO_MANY_BREAKS = status.TOO_MANY_BREAKS;

/**
 * Finds the slip masses of circle (xc, yc, r): intervals [massA, massB] (m) where the
 * ground lies above the arc. Fills S.massA/massB/nMass and returns a status code.
 */
export function findMasses(P: PreparedSection, S: Scratch, xc: number, yc: number, r: number): number {
  const gx = P.ground.x;
  const gy = P.ground.y;
  const roots = S.roots;
  const r2 = r * r;
  const upperTol = 1e-9 * r;
  let nr = 0;
  // The ground's x never decreases: only the segments under the circle's width can meet it.
  const left = xc - r;
  const right = xc + r;
  let first = 0;
  let upper = gx.length - 1;
  while (upper - first > 1) {
    const mid = (first + upper) >> 1;
    if (gx[mid] < left) first = mid;
    else upper = mid;
  }
  for (let i = first, n = gx.length - 1; i < n && gx[i] <= right; i++) {
    const x1 = gx[i];
    const y1 = gy[i];
    const dx = gx[i + 1] - x1;
    const dy = gy[i + 1] - y1;
    // Segment bounding box against the circle's box: most segments miss.
    if (x1 + dx < left || Math.min(y1, y1 + dy) > yc + r) continue;
    const fx = x1 - xc;
    const fy = y1 - yc;
    const a = dx * dx + dy * dy;
    const bh = fx * dx + fy * dy;
    const cq = fx * fx + fy * fy - r2;
    const disc = bh * bh - a * cq;
    if (disc < 0 || a === 0) continue;
    const sq = Math.sqrt(disc);
    const t1 = (-bh - sq) / a;
    const t2 = (-bh + sq) / a;
    if (t1 >= 0 && t1 <= 1) {
      if (y1 + t1 * dy > yc - upperTol) return UPPER_ARC;
      if (nr >= roots.length) return TOO_MANY_BREAKS;
      roots[nr++] = x1 + t1 * dx;
    }
    if (t2 >= 0 && t2 <= 1 && t2 !== t1) {
      if (y1 + t2 * dy > yc - upperTol) return UPPER_ARC;
      if (nr >= roots.length) return TOO_MANY_BREAKS;
      roots[nr++] = x1 + t2 * dx;
    }
  }
  // Insertion sort: the roots come almost in order, segment by segment.
  for (let i = 1; i < nr; i++) {
    const v = roots[i];
    let j = i - 1;
    while (j >= 0 && roots[j] > v) {
      roots[j + 1] = roots[j];
      j--;
    }
    roots[j + 1] = v;
  }
  const lo = Math.max(P.xmin, xc - r);
  const hi = Math.min(P.xmax, xc + r);
  const sideTol = 1e-9 * (P.xmax - P.xmin);
  const T = P.table;
  let nm = 0;
  let prev = lo;
  const minWidth = 1e-9 * r;
  for (let i = 0; i <= nr; i++) {
    let next = i < nr ? roots[i] : hi;
    if (next > hi) next = hi;
    if (next - prev > minWidth) {
      const xm = (prev + next) / 2;
      const k = findStrip(T, xm);
      const o = T.lineOff[k];
      const yg = T.lineA[o] + T.lineB[o] * xm;
      const ddx = xm - xc;
      const ya = yc - Math.sqrt(Math.max(0, r2 - ddx * ddx));
      if (yg > ya) {
        if (prev <= P.xmin + sideTol || next >= P.xmax - sideTol) return OUT_OF_SECTION;
        // Soil above the arc at the arc's horizontal extremity means ground above the centre.
        if ((i === 0 && prev === xc - r) || (i === nr && next === xc + r)) return UPPER_ARC;
        if (nm >= S.massA.length) return TOO_MANY_BREAKS;
        S.massA[nm] = prev;
        S.massB[nm] = next;
        nm++;
      }
    }
    if (next > prev) prev = next;
  }
  S.nMass = nm;
  return nm === 0 ? NO_MASS : OK;
}
