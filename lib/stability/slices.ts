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
import * as bishop from "./methods/bishop";
import * as ordinary from "./methods/ordinary";
import * as breaks from "./slice-breaks";
import * as strips from "./strip-table";
import * as faces from "./vertical-faces";
import * as field from "./water-field";

// Module-local copies: imported bindings are property reads on every use in the hot loop, and where
// modules are compiled to CommonJS (tsx, so npm run bench) each read of an imported function calls a
// getter that the JIT does not inline. None of these modules imports this one, so the copies are set.
const addBishopRow = bishop.addBishopRow;
const clearBishop = bishop.clearBishop;
const rawNormal = ordinary.rawNormal;
const collectBreaks = breaks.collectBreaks;
const findStrip = strips.findStrip;
const addFaceThrust = faces.addFaceThrust;
const fieldPressure = field.fieldPressure;
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
 * Builds the slices of mass [xA, xB] of circle (xc, yc, r) sliding in direction dir, and as it
 * goes the mass's driving term S.D (with S.gross), the ordinary method's resisting term S.resO
 * (S.negO) and the Bishop table, so that a search never reads the slices back. With `keep` every
 * per-slice array of S is written too, for a report or a staged drawdown that reads them.
 * @returns a status code; on OK, S.n slices are counted and S.depth is the mass thickness (m).
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
  keep: boolean,
): number {
  const nk = collectBreaks(P, S, xc, yc, r, xA, xB);
  if (nk < 0) return TOO_MANY_BREAKS;
  const kept = S.kept;
  const bmax = (xB - xA) / P.slices;
  const parts = S.parts;
  let total = 0;
  for (let i = 1; i < nk; i++) {
    const m = Math.max(1, Math.ceil((kept[i] - kept[i - 1]) / bmax - 1e-9));
    parts[i] = m;
    total += m;
  }
  if (total > SLICE_CAPACITY) return TOO_MANY_BREAKS;
  const T = P.table;
  const M = P.mat;
  const r2 = r * r;
  const invR = 1 / r;
  const invR2 = 1 / r2;
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
  const waterCos2 = P.waterCos2;
  const surcharge = P.q;
  const ru = P.ru;
  const gammaOf = M.gamma;
  const gammaSatOf = M.gammaSat;
  const kindOf = M.kind;
  const cOf = M.c;
  const tanPhiOf = M.tanPhi;
  const nStrips = T.n;
  // The strip under each slice midpoint, advanced as the slices go right.
  let ks = findStrip(T, kept[0]);
  let n = 0;
  let depth = 0;
  let weightless = -1;
  const hasFaces = P.hasFaces;
  const eff = P.ordinaryForm === 1;
  const BT = S.bishop;
  clearBishop(BT);
  let D = 0;
  let gross = 0;
  let resO = 0;
  let negO = 0;
  // The arc at the left side of the next slice (offset d from the centre, half-height √(R² − d²)),
  // carried over from slice to slice.
  let dPrev = kept[0] - xc;
  let sPrev = Math.sqrt(Math.max(0, r2 - dPrev * dPrev));
  for (let i = 1; i < nk; i++) {
    const p = kept[i - 1];
    const q = kept[i];
    const m = parts[i];
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
      const sinD = (dNext * sPrev - dPrev * sNext) * invR2;
      let dTheta: number;
      // Both series stop where the next term is below 3e-12 of the angle.
      if (sinD < 0.02) {
        const z2 = sinD * sinD;
        dTheta = sinD * (1 + z2 * (1 / 6 + z2 * (3 / 40)));
      } else if (sinD < 0.1) {
        const z2 = sinD * sinD;
        dTheta = sinD * (1 + z2 * (1 / 6 + z2 * (3 / 40 + z2 * (5 / 112 + z2 * (35 / 1152)))));
      } else dTheta = Math.atan2(sinD, (sNext * sPrev + dNext * dPrev) * invR2);
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
      let bot = 0;
      let baseMat = layerMat[e - 1];
      // Each layer's top is the bottom of the one above: one line evaluated per layer.
      let top = yg;
      for (let li = o; li < e; li++, top = bot) {
        if (top <= ym) {
          baseMat = li > o ? layerMat[li - 1] : layerMat[o];
          break;
        }
        bot = lineA[li + 1] + lineB[li + 1] * xm;
        const mi = layerMat[li];
        const last = bot <= ym + 1e-9;
        const lowBot = last ? ym : bot;
        const h = top - lowBot;
        if (h > 0) {
          const g = gammaOf[mi];
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
          const gs = gammaSatOf[mi];
          wsum += g * ha + gs * hb;
          gBase = hb > 0 ? gs : g;
          if (kh !== 0) wy += g * ha * (top - ha / 2) + gs * hb * (lowBot + hb / 2);
        }
        if (last) {
          baseMat = mi;
          break;
        }
      }
      const kind = kindOf[baseMat];
      if (kind === KIND_RIGID) return RIGID;
      // The weight uses the exact area above the arc; the base angle is the midpoint's.
      const W = wsum * b + gBase * areaCorr;
      const sinA = dir * (xc - xm) * invR;
      const cosA = sm * invR;
      dPrev = dNext;
      sPrev = sNext;
      // u is the base's mean pore pressure over its width: the exact area above the arc enters
      // it as it enters W, so that u·b is the water's true vertical thrust on the base.
      let u = 0;
      if (uField !== null) u = fieldPressure(uField, xm, ym, (gw * areaCorr) / b);
      else if (line) u = yw > ym ? gw * (yw - ym + areaCorr / b) * waterCos2[ks] : 0;
      else if (ruMode) u = (ru * W) / b;
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
      const Q = surcharge[ks] * b;
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
        c = cOf[baseMat];
        tp = tanPhiOf[baseMat];
      }
      const bb = arcLen * cosA;
      let Hn = Fw + Hs;
      let dd = V * sinA + dH * invR;
      if (keep) {
        S.xL[n] = xl;
        S.xR[n] = xr;
        S.xm[n] = xm;
        S.ym[n] = ym;
        S.b[n] = b;
        S.W[n] = W;
        S.Ww[n] = Ww;
        S.Q[n] = Q;
        S.sinA[n] = sinA;
        S.cosA[n] = cosA;
        S.len[n] = arcLen;
        S.bb[n] = bb;
        S.V[n] = V;
        S.Hs[n] = Hs;
        S.u[n] = uEff;
        S.uRaw[n] = u;
        S.c[n] = c;
        S.tanPhi[n] = tp;
        S.mat[n] = baseMat;
      }
      if (hasFaces) {
        S.Fw[n] = Fw;
        S.Hn[n] = Hn;
        S.dD[n] = dd;
        addFaceThrust(P, S, n, ks, xl, xr, xc, yc, r, dir);
        Hn = S.Hn[n];
        dd = S.dD[n];
      } else if (keep) {
        S.Fw[n] = Fw;
        S.Hn[n] = Hn;
        S.dD[n] = dd;
      }
      // The mass's driving term and both methods' F-free sums, gathered while the slice is at hand.
      D += dd;
      gross += dd < 0 ? -dd : dd;
      if (tp === 0) resO += c * arcLen;
      else {
        const Np = rawNormal(V, cosA, sinA, Hn, Hs, uEff, arcLen, bb, eff);
        if (Np > 0) resO += c * arcLen + Np * tp;
        else {
          resO += c * arcLen;
          negO++;
        }
      }
      addBishopRow(BT, n, c, tp, bb, cosA, sinA, V, uEff, arcLen, xm);
      n++;
    }
  }
  if (weightless >= 0) {
    S.rigidMat = weightless;
    return RIGID_NO_WEIGHT;
  }
  S.n = n;
  S.depth = depth;
  S.D = D;
  S.gross = gross;
  S.resO = resO;
  S.negO = negO;
  if (P.minDepth > 0 && depth < P.minDepth) return SHALLOW;
  return OK;
}
