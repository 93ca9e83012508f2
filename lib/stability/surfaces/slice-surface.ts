/**
 * Cuts the soil above a polyline slip surface into slices and computes each slice's loads and base
 * strength from the section's strip table (docs/engine.md §12 "Slices of a polyline surface"): the
 * same strips, layers, water surface, surcharges and seismic coefficient the circles use. Slices
 * break at the surface's vertices, at every strip boundary (ground and region vertices, water and
 * load breaks) and where the surface crosses a material boundary or the water surface, then are
 * split to the nominal width (mass width / analysis.slices). Ponded water pushes on the vertical steps
 * of the ground as it does for circles (vertical-faces.ts). Inside one slice the ground, the base
 * and each layer line are straight, so the midpoint column times the width is the exact area.
 */
import { SLICE_CAPACITY } from "../defaults";
import { fieldPressure } from "../water-field";
import { KIND_RIGID, KIND_UNDRAINED } from "../load-cases";
import type { PreparedSection } from "../prepare";
import { findStrip } from "../strip-table";
import { OK, OUT_OF_SECTION, RIGID, RIGID_NO_WEIGHT, TOO_MANY_BREAKS } from "../status";
import { borderingFace, faceThrust, type FaceThrust } from "../vertical-faces";

const FACE: FaceThrust = { F: 0, y: 0 };

/** Surface status codes beyond status.ts: the surface comes out above the ground between its ends. */
export const ABOVE_GROUND = 101;

/** Slices of one polyline mass in document order (x increasing); loads kN/m, kPa, m. */
export interface SurfaceSlices {
  n: number;
  xl: Float64Array;
  xr: Float64Array;
  ym: Float64Array;
  /** Base slope dy/dx (document frame). */
  slope: Float64Array;
  W: Float64Array;
  Ww: Float64Array;
  Q: Float64Array;
  Fw: Float64Array;
  /** Ponded-water thrust toward +x and its elevation; seismic force (toward the sliding side) and its elevation. */
  yFw: Float64Array;
  Hs: Float64Array;
  yHs: Float64Array;
  u: Float64Array;
  uRaw: Float64Array;
  c: Float64Array;
  tp: Float64Array;
  mat: Int32Array;
  /** Breaks buffer. */
  brk: Float64Array;
  /** Material of the weightless impenetrable block that rejected the surface. */
  rigidMat: number;
  /** Where a refusal happened (m). */
  atX: number;
  atY: number;
}

export function createSurfaceSlices(cap: number = SLICE_CAPACITY): SurfaceSlices {
  const f = () => new Float64Array(cap);
  return {
    n: 0,
    xl: f(),
    xr: f(),
    ym: f(),
    slope: f(),
    W: f(),
    Ww: f(),
    Q: f(),
    Fw: f(),
    yFw: f(),
    Hs: f(),
    yHs: f(),
    u: f(),
    uRaw: f(),
    c: f(),
    tp: f(),
    mat: new Int32Array(cap),
    brk: new Float64Array(4 * cap),
    rigidMat: -1,
    atX: NaN,
    atY: NaN,
  };
}

/** Elevation of polyline (px, py) at x and the index of its segment (px increasing). */
function segmentAt(px: ArrayLike<number>, x: number, from: number): number {
  let s = from;
  while (s + 2 < px.length && px[s + 1] <= x) s++;
  return s;
}

/**
 * Collects and sorts the slice boundaries of the surface into B.brk; returns how many (−1 on overflow).
 */
function collectBreaks(P: PreparedSection, B: SurfaceSlices, px: ArrayLike<number>, py: ArrayLike<number>): number {
  const T = P.table;
  const brk = B.brk;
  const cap = brk.length;
  const xA = px[0];
  const xB = px[px.length - 1];
  let nb = 0;
  const push = (x: number): boolean => {
    if (!(x > xA && x < xB)) return true;
    if (nb >= cap) return false;
    brk[nb++] = x;
    return true;
  };
  for (let i = 1; i + 1 < px.length; i++) if (!push(px[i])) return -1;
  const k0 = findStrip(T, xA);
  const line = P.waterKind === 1;
  for (let k = k0; k < T.n && T.xs[k] < xB; k++) {
    if (k > k0 && !push(T.xs[k])) return -1;
    const x0 = Math.max(T.xs[k], xA);
    const x1 = Math.min(T.xs[k + 1], xB);
    // Crossings of each surface segment inside this strip with the strip's lines and the water surface.
    let s = segmentAt(px, x0, 0);
    for (; s + 1 < px.length && px[s] < x1; s++) {
      const sa = Math.max(px[s], x0);
      const sb = Math.min(px[s + 1], x1);
      if (!(sb > sa)) continue;
      const m = (py[s + 1] - py[s]) / (px[s + 1] - px[s]);
      const c0 = py[s] - m * px[s];
      const o = T.lineOff[k];
      const e = T.lineOff[k + 1];
      for (let i = o; i <= e; i++) {
        let a: number;
        let b: number;
        if (i < e) {
          if (T.lineBreak[i] === 0 && i !== o) continue;
          a = T.lineA[i];
          b = T.lineB[i];
        } else {
          if (!line) continue;
          a = P.waterA[k];
          b = P.waterB[k];
        }
        if (b === m) continue;
        const x = (c0 - a) / (b - m);
        if (x > sa && x < sb && !push(x)) return -1;
      }
    }
  }
  brk.subarray(0, nb).sort();
  return nb;
}

/**
 * Slices the mass above surface (px, py) (x strictly increasing, ends on the ground). `dir` is the
 * sliding direction (+1 toward +x): it sets the sign of the horizontal forces.
 * @returns OK, or OUT_OF_SECTION, RIGID, RIGID_NO_WEIGHT, TOO_MANY_BREAKS, ABOVE_GROUND (B.atX/atY say where)
 */
export function sliceSurface(
  P: PreparedSection,
  B: SurfaceSlices,
  px: ArrayLike<number>,
  py: ArrayLike<number>,
  dir: number,
): number {
  const nb = collectBreaks(P, B, px, py);
  if (nb < 0) return TOO_MANY_BREAKS;
  const xA = px[0];
  const xB = px[px.length - 1];
  const bmax = (xB - xA) / P.slices;
  const tol = 1e-7 * (xB - xA);
  const cap = B.xl.length;
  let n = 0;
  let prev = xA;
  let seg = 0;
  for (let i = 0; i <= nb; i++) {
    const q = i < nb ? B.brk[i] : xB;
    if (q - prev <= tol && i < nb) continue;
    const m = Math.max(1, Math.ceil((q - prev) / bmax - 1e-9));
    const w = (q - prev) / m;
    for (let j = 0; j < m; j++) {
      if (n >= cap) return TOO_MANY_BREAKS;
      const xl = prev + j * w;
      const xr = j === m - 1 ? q : prev + (j + 1) * w;
      const xm = (xl + xr) / 2;
      seg = segmentAt(px, xm, seg);
      const slope = (py[seg + 1] - py[seg]) / (px[seg + 1] - px[seg]);
      const ym = py[seg] + slope * (xm - px[seg]);
      const st = column(P, B, n, xl, xr, xm, ym, slope, dir);
      if (st !== OK) {
        B.atX = xm;
        B.atY = ym;
        return st;
      }
      B.xl[n] = xl;
      B.xr[n] = xr;
      B.ym[n] = ym;
      B.slope[n] = slope;
      n++;
    }
    prev = q;
  }
  B.n = n;
  return OK;
}

/** Loads and base strength of slice n (xl..xr, base midpoint (xm, ym)); returns a status code. */
function column(
  P: PreparedSection,
  B: SurfaceSlices,
  n: number,
  xl: number,
  xr: number,
  xm: number,
  ym: number,
  slope: number,
  dir: number,
): number {
  const T = P.table;
  const M = P.mat;
  const ks = findStrip(T, xm);
  const o = T.lineOff[ks];
  const e = T.lineOff[ks + 1] - 1;
  const b = xr - xl;
  if (ym < T.lineA[e] + T.lineB[e] * xm - 1e-6) return OUT_OF_SECTION;
  const yg = T.lineA[o] + T.lineB[o] * xm;
  if (ym > yg + 1e-6) return ABOVE_GROUND;
  const line = P.waterKind === 1;
  const yw = line ? P.waterA[ks] + P.waterB[ks] * xm : -Infinity;
  let wsum = 0;
  let wy = 0;
  let baseMat = T.layerMat[Math.max(o, e - 1)];
  let weightless = -1;
  for (let li = o; li < e; li++) {
    const top = T.lineA[li] + T.lineB[li] * xm;
    if (top <= ym) break;
    const bot = T.lineA[li + 1] + T.lineB[li + 1] * xm;
    const mi = T.layerMat[li];
    const last = bot <= ym + 1e-9;
    const lowBot = last ? ym : bot;
    const h = top - lowBot;
    if (h > 0) {
      const g = M.gamma[mi];
      if (g < 0) {
        if (last) return RIGID;
        weightless = mi;
        continue;
      }
      let hb = 0;
      if (yw > lowBot) hb = yw - lowBot < h ? yw - lowBot : h;
      const ha = h - hb;
      const gs = M.gammaSat[mi];
      wsum += g * ha + gs * hb;
      wy += g * ha * (top - ha / 2) + gs * hb * (lowBot + hb / 2);
    }
    if (last) {
      baseMat = mi;
      break;
    }
  }
  if (weightless >= 0) {
    B.rigidMat = weightless;
    return RIGID_NO_WEIGHT;
  }
  if (M.kind[baseMat] === KIND_RIGID) return RIGID;
  const W = wsum * b;
  let u = 0;
  // A straight base has no arc segment above its chord, so the field needs no area term.
  if (P.uField !== null) u = fieldPressure(P.uField, xm, ym, 0);
  else if (line) u = yw > ym ? P.gammaW * (yw - ym) * P.waterCos2[ks] : 0;
  else if (P.waterKind === 2) u = (P.ru * W) / b;
  let Ww = 0;
  let Fw = 0;
  let yF = ym;
  if (line) {
    const ygL = T.lineA[o] + T.lineB[o] * xl;
    const ygR = T.lineA[o] + T.lineB[o] * xr;
    const dl = Math.max(0, P.waterA[ks] + P.waterB[ks] * xl - ygL);
    const dr = Math.max(0, P.waterA[ks] + P.waterB[ks] * xr - ygR);
    if (dl + dr > 0) {
      Ww = (P.gammaW * b * (dl + dr)) / 2;
      Fw = (dir * P.gammaW * (dl + dr) * (ygR - ygL)) / 2;
      yF = ygL + ((ygR - ygL) * (dl + 2 * dr)) / (3 * (dl + dr));
    }
    // Water against a vertical step of the ground on the slice's soil side, above the surface there.
    const kf = P.hasFaces ? borderingFace(P, ks, xl, xr) : -1;
    if (kf >= 0 && faceThrust(P, kf, ym + slope * (T.xs[kf] - xm), dir, FACE)) {
      const moment = Fw * yF + FACE.F * FACE.y;
      Fw += FACE.F;
      yF = Fw !== 0 ? moment / Fw : FACE.y;
    }
  }
  let c: number;
  let tp: number;
  let uEff = u;
  if (M.kind[baseMat] === KIND_UNDRAINED) {
    const dz = M.suDatum[baseMat] - ym;
    c = M.su[baseMat] + (dz > 0 ? M.suGradient[baseMat] * dz : 0);
    tp = 0;
    uEff = 0;
  } else {
    c = M.c[baseMat];
    tp = M.tanPhi[baseMat];
  }
  B.W[n] = W;
  B.Ww[n] = Ww;
  B.Q[n] = P.q[ks] * b;
  B.Fw[n] = Fw;
  B.yFw[n] = yF;
  B.Hs[n] = P.kh * W;
  B.yHs[n] = wsum > 0 ? wy / wsum : ym;
  B.u[n] = uEff;
  B.uRaw[n] = u;
  B.c[n] = c;
  B.tp[n] = tp;
  B.mat[n] = baseMat;
  return OK;
}
