/**
 * Starting surfaces of the surfaces search (docs/engine.md §12 "Search"): the critical and lowest
 * circles as polylines; the same circles deepened and made composite where they meet impenetrable
 * material or a much stronger layer (they follow its top); and wedge-shaped surfaces that run along
 * the weakest layers under the slip mass. Every start is checked for admissibility by the search itself.
 */
import { arcY } from "../circle-direction";
import { groundAt } from "../ground";
import { KIND_RIGID, KIND_UNDRAINED } from "../load-cases";
import type { PreparedSection } from "../prepare";
import type { Circle } from "../results";
import type { XY } from "../rigorous-types";
import { findStrip } from "../strip-table";

/** Interior vertices of a circle turned into a polyline. */
export const CIRCLE_VERTICES = 11;

/** Entry and exit of circle c's mass that spans [xa, xb] (m): a polyline with its ends on the ground. */
export function circlePolyline(P: PreparedSection, c: Circle, xa: number, xb: number, lift = false): XY[] {
  const pts: XY[] = [[xa, groundAt(P.ground, xa)]];
  for (let i = 1; i <= CIRCLE_VERTICES; i++) {
    const x = xa + ((xb - xa) * i) / (CIRCLE_VERTICES + 1);
    let y = arcY(c.xc, c.yc, c.r, x);
    if (lift) y = Math.max(y, strongTop(P, x) + 1e-3);
    pts.push([x, Math.min(y, groundAt(P.ground, x) - 1e-3)]);
  }
  pts.push([xb, groundAt(P.ground, xb)]);
  return pts;
}

/** The highest top of impenetrable material at x (m), or −Infinity where there is none. */
export function rigidTop(P: PreparedSection, x: number): number {
  const T = P.table;
  const k = findStrip(T, x);
  for (let i = T.lineOff[k]; i < T.lineOff[k + 1] - 1; i++)
    if (P.mat.kind[T.layerMat[i]] === KIND_RIGID) return T.lineA[i] + T.lineB[i] * x;
  return -Infinity;
}

/**
 * A layer is "much stronger" than the soil on it when its shear strength at the vertical effective
 * stress of its top is at least this many times the soil's at the same stress (docs/engine.md §12
 * "Composite surfaces"): a starting-surface rule only, the optimiser may still move vertices into it.
 */
export const STRONGER_RATIO = 3;

/** Shear strength (kPa) of material m at elevation y under vertical effective stress s (kPa). */
function strengthAt(P: PreparedSection, m: number, y: number, s: number): number {
  const M = P.mat;
  if (M.kind[m] === KIND_UNDRAINED) return M.su[m] + M.suGradient[m] * Math.max(0, M.suDatum[m] - y);
  return M.c[m] + Math.max(0, s) * M.tanPhi[m];
}

/**
 * The highest top at x (m) of impenetrable material or of a layer much stronger than the soil on it
 * (STRONGER_RATIO), or −Infinity where there is none: a composite surface does not cut below it.
 */
export function strongTop(P: PreparedSection, x: number): number {
  const T = P.table;
  const M = P.mat;
  const k = findStrip(T, x);
  const yw = P.waterKind === 1 ? P.waterA[k] + P.waterB[k] * x : -Infinity;
  let sv = 0;
  for (let i = T.lineOff[k]; i < T.lineOff[k + 1] - 1; i++) {
    const top = T.lineA[i] + T.lineB[i] * x;
    const mi = T.layerMat[i];
    if (M.kind[mi] === KIND_RIGID) return top;
    if (i > T.lineOff[k]) {
      const s = sv - (yw > top ? P.gammaW * (yw - top) : 0);
      const above = strengthAt(P, T.layerMat[i - 1], top, s);
      if (above > 0 && strengthAt(P, mi, top, s) >= STRONGER_RATIO * above) return top;
    }
    const bot = T.lineA[i + 1] + T.lineB[i + 1] * x;
    const wet = Math.max(0, Math.min(top, yw) - bot);
    sv += M.gamma[mi] * (top - bot - wet) + M.gammaSat[mi] * wet;
  }
  return -Infinity;
}

/** Mid-depth (m) of the first layer of material `mat` at x, or NaN where it is absent. */
export function layerMid(P: PreparedSection, x: number, mat: number): number {
  const T = P.table;
  const k = findStrip(T, x);
  for (let i = T.lineOff[k]; i < T.lineOff[k + 1] - 1; i++)
    if (T.layerMat[i] === mat) {
      const top = T.lineA[i] + T.lineB[i] * x;
      const bot = T.lineA[i + 1] + T.lineB[i + 1] * x;
      return (top + bot) / 2;
    }
  return NaN;
}

/**
 * The weakest materials with any shear strength: ranked by tan φ' + c'/(γ·h), h the height of the
 * section (a rough strength at the depth of the slope); at most `count`.
 */
export function weakestMaterials(P: PreparedSection, count: number): number[] {
  const M = P.mat;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < P.ground.y.length; i++) {
    lo = Math.min(lo, P.ground.y[i]);
    hi = Math.max(hi, P.ground.y[i]);
  }
  const h = Math.max(1, hi - lo);
  const ids: { m: number; s: number }[] = [];
  for (let m = 0; m < M.ids.length; m++) {
    if (M.kind[m] === KIND_RIGID) continue;
    const g = M.gamma[m] > 0 ? M.gamma[m] : 18;
    const c = M.kind[m] === 1 ? M.su[m] : M.c[m];
    ids.push({ m, s: M.tanPhi[m] + c / (g * h) });
  }
  ids.sort((a, b) => a.s - b.s);
  return ids.slice(0, count).map((v) => v.m);
}

/**
 * Wedge surfaces through a weak layer under the mass [xa, xb] sliding in direction dir: from the
 * upslope end down at about 55° to the layer's mid-depth, along it, and up at about 30° to the ground.
 * `reach` (×) stretches the mass toward the toe.
 */
export function layerWedge(
  P: PreparedSection,
  mat: number,
  xa: number,
  xb: number,
  dir: number,
  reach: number,
): XY[] | null {
  const up = dir > 0 ? xa : xb;
  const toe = dir > 0 ? xb : xa;
  const far = toe + dir * (reach - 1) * Math.abs(xb - xa);
  const gUp = groundAt(P.ground, up);
  const y1 = layerMid(P, up, mat);
  if (!Number.isFinite(y1) || !(y1 < gUp)) return null;
  const x1 = up + (dir * (gUp - y1)) / Math.tan((55 * Math.PI) / 180);
  const gFar = groundAt(P.ground, far);
  const yFar = layerMid(P, far, mat);
  if (!Number.isFinite(yFar) || !(yFar < gFar)) return null;
  const x2 = far - (dir * (gFar - yFar)) / Math.tan((30 * Math.PI) / 180);
  if (!((x2 - x1) * dir > 0)) return null;
  const ya = layerMid(P, x1, mat);
  const yb = layerMid(P, x2, mat);
  if (!Number.isFinite(ya) || !Number.isFinite(yb)) return null;
  const pts: XY[] = [
    [up, gUp],
    [x1, ya],
    [x1 + (x2 - x1) / 3, layerMid(P, x1 + (x2 - x1) / 3, mat)],
    [x1 + (2 * (x2 - x1)) / 3, layerMid(P, x1 + (2 * (x2 - x1)) / 3, mat)],
    [x2, yb],
    [far, gFar],
  ];
  if (pts.some((p) => !Number.isFinite(p[1]))) return null;
  return dir > 0 ? pts : pts.reverse();
}
