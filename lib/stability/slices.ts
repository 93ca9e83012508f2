/**
 * Cuts one slip mass into slices and computes each slice's loads and base strength
 * (docs/engine.md §3 "Slice boundaries" and "Per slice"). Writes into the scratch arrays;
 * allocation-free. Sliding is toward +x when dir = +1 and toward −x when dir = −1: the
 * geometry stays in document coordinates and only the signs of sin α and of the
 * horizontal water forces change, which is the same as mirroring the section.
 */
import * as defaults from "./defaults";
import * as cases from "./load-cases";
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";
import * as status from "./status";
import { findStrip } from "./strip-table";
import { addFaceThrust } from "./vertical-faces";
import { fieldPressure } from "./water-field";

// Module-local copies: imported bindings are property reads on every use in the hot loop.
const MERGE_FRACTION = defaults.MERGE_FRACTION;
const SLICE_CAPACITY = defaults.SLICE_CAPACITY;
const KIND_RIGID = cases.KIND_RIGID;
const KIND_UNDRAINED = cases.KIND_UNDRAINED;
const OK = status.OK;
const OUT_OF_SECTION = status.OUT_OF_SECTION;
const RIGID = status.RIGID;
const RIGID_NO_WEIGHT = status.RIGID_NO_WEIGHT;
const SHALLOW = status.SHALLOW;
const TOO_MANY_BREAKS = status.TOO_MANY_BREAKS;

/**
 * Streaming state of the break merge: [the last break seen, a vertex waiting on its right
 * neighbour (NaN when none), 1 if that vertex is clear of its left neighbour].
 */
const merge = new Float64Array(3);

/**
 * Collects the slice boundaries of mass [xA, xB] into S.kept (docs/engine.md §3). Hard
 * breaks (the ends, arc crossings of material boundaries and water lines, ground corners)
 * are all kept, merged only when closer than max(0.1 mm, 1e-7·R). Any other vertex of the ground
 * or of a layer is kept only when both its neighbours lie at least MERGE_FRACTION of a
 * nominal slice width away; otherwise the slices run across it. The rule looks at both
 * neighbours, so it is the same read left to right or right to left (mirror invariance),
 * and a survey of thousands of vertices cuts about as many slices as its outline.
 * @returns how many breaks are kept (−1 if a buffer would overflow)
 */
function collectBreaks(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  xA: number,
  xB: number,
): number {
  const T = P.table;
  const brk = S.brk;
  const kept = S.kept;
  const cap = kept.length - 2;
  const r2 = r * r;
  const line = P.waterKind === 1;
  const extraA = P.extraWaterA;
  const extraB = P.extraWaterB;
  const sharp = P.sharp;
  const tolHard = 1e-7 * r > 1e-4 ? 1e-7 * r : 1e-4;
  const tolSoft = (MERGE_FRACTION * (xB - xA)) / P.slices;
  let nk = 0;
  kept[nk++] = xA;
  merge[0] = xA;
  merge[1] = NaN;
  let k = findStrip(T, xA);
  for (;;) {
    const x0 = T.xs[k] > xA ? T.xs[k] : xA;
    const x1 = T.xs[k + 1] < xB ? T.xs[k + 1] : xB;
    let nb = 0;
    const o = T.lineOff[k];
    const e = T.lineOff[k + 1];
    const last = extraA === null ? e : e + 1;
    // Arc crossings with material boundaries, the base, the water line and the other stage's line.
    for (let i = o; i <= last; i++) {
      let a: number;
      let b: number;
      if (i < e) {
        if (T.lineBreak[i] === 0) continue;
        a = T.lineA[i];
        b = T.lineB[i];
      } else if (i === e) {
        if (!line) continue;
        a = P.waterA[k];
        b = P.waterB[k];
      } else {
        a = extraA![k];
        b = extraB![k];
      }
      const qa = 1 + b * b;
      const qb = b * (a - yc) - xc;
      const qc = xc * xc + (a - yc) * (a - yc) - r2;
      const disc = qb * qb - qa * qc;
      if (disc <= 0) continue;
      const sq = Math.sqrt(disc);
      for (let s = -1; s <= 1; s += 2) {
        const x = (-qb + s * sq) / qa;
        if (x > x0 && x < x1 && a + b * x < yc) {
          if (nb >= brk.length) return -1;
          brk[nb++] = x;
        }
      }
    }
    for (let i = 1; i < nb; i++) {
      const v = brk[i];
      let j = i - 1;
      while (j >= 0 && brk[j] > v) {
        brk[j + 1] = brk[j];
        j--;
      }
      brk[j + 1] = v;
    }
    for (let i = 0; i < nb; i++) {
      nk = offerBreak(kept, nk, cap, brk[i], true, tolHard, tolSoft);
      if (nk < 0) return -1;
    }
    if (x1 >= xB || k + 1 >= T.n) break;
    // The strip's right end: a vertex, hard where the ground steps or turns sharply (a toe, a crest, a face).
    nk = offerBreak(kept, nk, cap, x1, sharp[k + 1] !== 0, tolHard, tolSoft);
    if (nk < 0) return -1;
    k++;
  }
  nk = offerBreak(kept, nk, cap, xB, true, tolHard, tolSoft);
  // The mass's far end closes the last slice; a hard break too close to it gives way.
  if (nk > 0 && kept[nk - 1] !== xB) {
    if (nk > 1) kept[nk - 1] = xB;
    else kept[nk++] = xB;
  }
  return nk;
}

/** Offers the next break (x increasing) to the merge; returns the new kept count (−1 on overflow). */
function offerBreak(
  kept: Float64Array,
  nk: number,
  cap: number,
  x: number,
  hard: boolean,
  tolHard: number,
  tolSoft: number,
): number {
  const pending = merge[1];
  if (pending === pending) {
    // A vertex stays only when clear of both neighbours.
    if (merge[2] === 1 && x - pending >= tolSoft) {
      if (nk >= cap) return -1;
      kept[nk++] = pending;
    }
    merge[1] = NaN;
  }
  if (hard) {
    if (x - kept[nk - 1] >= tolHard) {
      if (nk >= cap) return -1;
      kept[nk++] = x;
    }
  } else {
    merge[1] = x;
    merge[2] = x - merge[0] >= tolSoft ? 1 : 0;
  }
  merge[0] = x;
  return nk;
}

/**
 * Builds the slices of mass [xA, xB] of circle (xc, yc, r) sliding in direction dir.
 * @returns a status code; on OK, S.n slices are filled and S.depth is the mass thickness (m).
 */
export function buildSlices(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  xA: number,
  xB: number,
  dir: number,
): number {
  const nk = collectBreaks(P, S, xc, yc, r, xA, xB);
  if (nk < 0) return TOO_MANY_BREAKS;
  const kept = S.kept;
  const bmax = (xB - xA) / P.slices;
  let total = 0;
  for (let i = 1; i < nk; i++) total += Math.max(1, Math.ceil((kept[i] - kept[i - 1]) / bmax - 1e-9));
  if (total > SLICE_CAPACITY) return TOO_MANY_BREAKS;
  const T = P.table;
  const M = P.mat;
  const r2 = r * r;
  const gw = P.gammaW;
  const line = P.waterKind === 1;
  const ruMode = P.waterKind === 2;
  const kh = P.kh;
  // Locals for the arrays read per slice: fewer property loads in the loop.
  const xs = T.xs;
  const lineA = T.lineA;
  const lineB = T.lineB;
  const lineOff = T.lineOff;
  const layerMat = T.layerMat;
  const waterA = P.waterA;
  const waterB = P.waterB;
  const uField = P.uField;
  const nStrips = T.n;
  // The strip under each slice midpoint, advanced as the slices go right.
  let ks = findStrip(T, kept[0]);
  let n = 0;
  let depth = 0;
  let weightless = -1;
  // The arc at the left side of the next slice (offset d from the centre, half-height √(R² − d²)),
  // carried over from slice to slice.
  let dPrev = kept[0] - xc;
  let sPrev = Math.sqrt(Math.max(0, r2 - dPrev * dPrev));
  for (let i = 1; i < nk; i++) {
    const p = kept[i - 1];
    const q = kept[i];
    const m = Math.max(1, Math.ceil((q - p) / bmax - 1e-9));
    const w = (q - p) / m;
    for (let j = 0; j < m; j++) {
      const xl = p + j * w;
      const xr = j === m - 1 ? q : p + (j + 1) * w;
      const b = xr - xl;
      const xm = (xl + xr) / 2;
      const ddx = xm - xc;
      const sm = Math.sqrt(r2 - ddx * ddx);
      const ym = yc - sm;
      const dNext = xr - xc;
      const sNext = Math.sqrt(Math.max(0, r2 - dNext * dNext));
      // The angle the slice's arc subtends, from its sine and cosine (no asin per boundary):
      // a short series for the usual thin slice, atan2 for a wide one.
      const sinD = (dNext * sPrev - dPrev * sNext) / r2;
      let dTheta: number;
      if (sinD < 0.1) {
        const z2 = sinD * sinD;
        dTheta = sinD * (1 + z2 * (1 / 6 + z2 * (3 / 40 + z2 * (5 / 112 + z2 * (35 / 1152)))));
      } else dTheta = Math.atan2(sinD, (sNext * sPrev + dNext * dPrev) / r2);
      // Exact arc length R·Δθ, and the area between the arc and its midpoint height (≤ 0):
      // ∫√(R² − d²) dd over the slice is ½(d·√(R² − d²))|ends + ½R²·Δθ.
      const arcLen = r * dTheta;
      const areaCorr = 0.5 * (dNext * sNext - dPrev * sPrev) + 0.5 * r2 * dTheta - b * sm;
      while (ks + 1 < nStrips && xs[ks + 1] <= xm) ks++;
      const o = lineOff[ks];
      const e = lineOff[ks + 1] - 1;
      if (ym < lineA[e] + lineB[e] * xm - 1e-6) return OUT_OF_SECTION;
      const yg = lineA[o] + lineB[o] * xm;
      if (yg - ym > depth) depth = yg - ym;
      const yw = line ? waterA[ks] + waterB[ks] * xm : -Infinity;
      let wsum = 0;
      let wy = 0;
      let gBase = 0;
      let baseMat = layerMat[e - 1];
      for (let li = o; li < e; li++) {
        const top = lineA[li] + lineB[li] * xm;
        if (top <= ym) {
          baseMat = li > o ? layerMat[li - 1] : layerMat[o];
          break;
        }
        const bot = lineA[li + 1] + lineB[li + 1] * xm;
        const mi = layerMat[li];
        const last = bot <= ym + 1e-9;
        const lowBot = last ? ym : bot;
        const h = top - lowBot;
        if (h > 0) {
          const g = M.gamma[mi];
          if (g < 0) {
            // The arc in impenetrable material governs; a block above the arc is carried as
            // weight, which it cannot be without γ (reported once the whole mass is sliced).
            if (last) return RIGID;
            weightless = mi;
            continue;
          }
          let hb = 0;
          if (yw > lowBot) hb = yw - lowBot < h ? yw - lowBot : h;
          const ha = h - hb;
          const gs = M.gammaSat[mi];
          wsum += g * ha + gs * hb;
          gBase = hb > 0 ? gs : g;
          if (kh !== 0) wy += g * ha * (top - ha / 2) + gs * hb * (lowBot + hb / 2);
        }
        if (last) {
          baseMat = mi;
          break;
        }
      }
      const kind = M.kind[baseMat];
      if (kind === KIND_RIGID) return RIGID;
      // The weight uses the exact area above the arc; the base angle is the midpoint's.
      const W = wsum * b + gBase * areaCorr;
      const sinA = (dir * (xc - xm)) / r;
      const cosA = sm / r;
      dPrev = dNext;
      sPrev = sNext;
      // u is the base's mean pore pressure over its width: the exact area above the arc enters
      // it as it enters W, so that u·b is the water's true vertical thrust on the base.
      let u = 0;
      if (uField !== null) u = fieldPressure(uField, xm, ym, (gw * areaCorr) / b);
      else if (line) u = yw > ym ? gw * (yw - ym + areaCorr / b) * P.waterCos2[ks] : 0;
      else if (ruMode) u = (P.ru * W) / b;
      let Ww = 0;
      let Fw = 0;
      let dH = 0;
      if (line) {
        const ygL = lineA[o] + lineB[o] * xl;
        const ygR = lineA[o] + lineB[o] * xr;
        const dL = waterA[ks] + waterB[ks] * xl - ygL;
        const dR = waterA[ks] + waterB[ks] * xr - ygR;
        const dl = dL > 0 ? dL : 0;
        const dr = dR > 0 ? dR : 0;
        if (dl + dr > 0) {
          Ww = (gw * b * (dl + dr)) / 2;
          // Thrust toward +x where the ground rises to the right; sign flips with dir.
          Fw = (dir * gw * (dl + dr) * (ygR - ygL)) / 2;
          const yF = ygL + ((ygR - ygL) * (dl + 2 * dr)) / (3 * (dl + dr));
          dH += Fw * (yc - yF);
        }
      }
      const Q = P.q[ks] * b;
      const V = W + Ww + Q;
      let Hs = 0;
      if (kh !== 0 && wsum > 0) {
        Hs = kh * W;
        dH += Hs * (yc - wy / wsum);
      }
      let c: number;
      let tp: number;
      let uEff = u;
      if (kind === KIND_UNDRAINED) {
        const dz = M.suDatum[baseMat] - ym;
        c = M.su[baseMat] + (dz > 0 ? M.suGradient[baseMat] * dz : 0);
        tp = 0;
        uEff = 0;
      } else {
        c = M.c[baseMat];
        tp = M.tanPhi[baseMat];
      }
      S.xL[n] = xl;
      S.xR[n] = xr;
      S.ym[n] = ym;
      S.b[n] = b;
      S.sinA[n] = sinA;
      S.cosA[n] = cosA;
      S.len[n] = arcLen;
      S.bb[n] = arcLen * cosA;
      S.W[n] = W;
      S.Ww[n] = Ww;
      S.Q[n] = Q;
      S.V[n] = V;
      S.Fw[n] = Fw;
      S.Hs[n] = Hs;
      S.u[n] = uEff;
      S.uRaw[n] = u;
      S.c[n] = c;
      S.tanPhi[n] = tp;
      S.mat[n] = baseMat;
      S.Hn[n] = Fw + Hs;
      S.dD[n] = V * sinA + dH / r;
      if (P.hasFaces) addFaceThrust(P, S, n, ks, xl, xr, xc, yc, r, dir);
      n++;
    }
  }
  if (weightless >= 0) {
    S.rigidMat = weightless;
    return RIGID_NO_WEIGHT;
  }
  S.n = n;
  S.depth = depth;
  if (P.minDepth > 0 && depth < P.minDepth) return SHALLOW;
  return OK;
}
