/**
 * Bishop's simplified method (Bishop 1955), docs/engine.md §4: vertical equilibrium of each
 * slice with the interslice shear neglected, moment equilibrium about the centre.
 *   mα = cos α + sin α·tan φ'/F,  Si = [c'·b + (V − u·b)·tan φ'] / mα,  F = ΣSi / D.
 * Where the base normal N' = (V − u·b − c'·b·tan α/F)/mα would be negative, Si = c'·l.
 * Iterated from the ordinary-method value until |ΔF| ≤ 1e-6·F (at most 60 passes), then a
 * bisection on [0.05, 50] as a fallback. mα ≤ 0 on any slice at the solution makes the
 * result invalid; min mα is reported for the warning below 0.2 (Whitman & Bailey 1967).
 * A mass with no strength at all (c' = 0, φ' = 0 on every slice) has FS = 0 exactly.
 *
 * Speed (docs/engine.md §5): the slice terms that do not depend on F are written once per mass,
 * as the slices are cut, into the scratch's Bishop table (frictional slices only; a base without
 * friction adds the constant c'·l), so each pass of the iteration reads five numbers a slice and
 * divides once.
 */
import type { BishopTable, Scratch } from "../scratch";
import * as status from "../status";

const M_ALPHA = status.M_ALPHA;
const NOT_CONVERGED = status.NOT_CONVERGED;
const OK = status.OK;

const REL_TOL = 1e-6;
const MAX_PASSES = 60;

/** Starts an empty Bishop table for the slices about to be cut or re-gathered. */
export function clearBishop(T: BishopTable): void {
  T.n = 0;
  T.cohesive = 0;
  T.strength = false;
  T.flatCos = Infinity;
  T.flatSin = NaN;
  T.flatX = NaN;
  T.flatAt = -1;
}

/**
 * Adds slice i (base midpoint x = xm) to the Bishop table: a base without friction adds its
 * constant c'·l, and is remembered when its mα = cos α is the lowest so far; a frictional one
 * adds a row with the numerator c'·b + (V − u·b)·tan φ', sin α·tan φ', cos α, sin α, the two
 * parts of the N' sign test (V − u·b)·cos α and c'·b·sin α, and c'·l. b is the base's
 * horizontal width.
 */
export function addBishopRow(
  T: BishopTable,
  i: number,
  c: number,
  tp: number,
  b: number,
  cos: number,
  sin: number,
  V: number,
  u: number,
  len: number,
  xm: number,
): void {
  if (tp === 0) {
    if (c !== 0) T.strength = true;
    T.cohesive += c * len;
    if (cos < T.flatCos) {
      T.flatCos = cos;
      T.flatSin = sin;
      T.flatX = xm;
      T.flatAt = i;
    }
    return;
  }
  T.strength = true;
  const k = T.n;
  const p = V - u * b;
  T.idx[k] = i;
  T.x[k] = xm;
  T.sin[k] = sin;
  T.num[k] = c * b + p * tp;
  T.t[k] = sin * tp;
  T.cos[k] = cos;
  T.pCos[k] = p * cos;
  T.cbSin[k] = c * b * sin;
  T.cl[k] = c * len;
  T.n = k + 1;
}

/**
 * Refills the Bishop table from the slices in S, for callers that change the slices' strengths
 * or pore pressures after cutting them (the staged drawdown's later stages).
 */
export function gatherBishop(S: Scratch): void {
  const T = S.bishop;
  clearBishop(T);
  for (let i = 0; i < S.n; i++)
    addBishopRow(T, i, S.c[i], S.tanPhi[i], S.bb[i], S.cosA[i], S.sinA[i], S.V[i], S.u[i], S.len[i], S.xm[i]);
}

/** ΣSi at trial F from the Bishop table plus the cohesive constant; dΣSi/dF is left in `deriv[0]`. */
const deriv = new Float64Array(1);
function resisting(S: Scratch, cohesive: number, F: number): number {
  const T = S.bishop;
  const num = T.num;
  const tt = T.t;
  const cs = T.cos;
  const pCos = T.pCos;
  const cbSin = T.cbSin;
  const cl = T.cl;
  const n = T.n;
  const inv = 1 / F;
  let sum = cohesive;
  let dsum = 0;
  for (let k = 0; k < n; k++) {
    // N' < 0 ⇔ (V − u·b)·cos α − c'·b·sin α/F < 0 while mα > 0.
    if (pCos[k] - cbSin[k] * inv < 0) sum += cl[k];
    else {
      const t = tt[k];
      const im = 1 / (cs[k] + t * inv);
      const s = num[k] * im;
      sum += s;
      dsum += s * t * im;
    }
  }
  deriv[0] = dsum * inv * inv;
  return sum;
}

/**
 * Bishop factor of safety of the slices in S, starting from F0.
 * Solves F = ΣSi(F)/D by Newton steps on g(F) = F − ΣSi(F)/D (a plain fixed-point step
 * where Newton would misbehave) until |ΔF| ≤ 1e-6·F.
 * Reads the Bishop table the slice loop fills (gatherBishop refills it after a change of strengths).
 * Sets S.fsB (NaN when invalid), S.reasonB, S.minMa (+ its x and α in degrees), S.negB and S.iterations.
 */
export function bishopFactor(S: Scratch, D: number, F0: number): number {
  if (!S.bishop.strength) return zeroStrength(S);
  const cohesive = S.bishop.cohesive;
  let F = F0 > 0 && Number.isFinite(F0) ? F0 : 1;
  let done = false;
  let it = 0;
  const invD = 1 / D;
  for (; it < MAX_PASSES; it++) {
    const fixed = resisting(S, cohesive, F) * invD;
    const slope = 1 - deriv[0] * invD;
    let Fn = slope > 0.2 ? F - (F - fixed) / slope : fixed;
    if (!(Fn > 0)) Fn = fixed;
    if (!(Fn > 0) || !Number.isFinite(Fn)) break;
    if (Math.abs(Fn - F) <= REL_TOL * Fn) {
      F = Fn;
      done = true;
      it++;
      break;
    }
    F = Fn;
  }
  if (!done) {
    const f = bisect(S, cohesive, D);
    if (!(f > 0)) {
      S.fsB = NaN;
      S.reasonB = NOT_CONVERGED;
      S.iterations = it;
      return NaN;
    }
    F = f;
  }
  S.iterations = it;
  return finish(S, F);
}

/** The result for a mass without strength: FS 0, mα = cos α (φ' = 0), every normal force as computed. */
function zeroStrength(S: Scratch): number {
  const T = S.bishop;
  S.minMa = T.flatCos;
  S.minMaX = T.flatX;
  S.minMaAlpha = (Math.atan2(T.flatSin, T.flatCos) * 180) / Math.PI;
  S.negB = 0;
  S.iterations = 0;
  S.fsB = 0;
  S.reasonB = OK;
  return 0;
}

/**
 * Records mα and negative-normal counts at the solution F and checks mα > 0. Among equal
 * lowest mα the first slice is reported, as a left-to-right scan would find it.
 */
function finish(S: Scratch, F: number): number {
  const T = S.bishop;
  const inv = 1 / F;
  const cs = T.cos;
  const tt = T.t;
  const idx = T.idx;
  const pCos = T.pCos;
  const cbSin = T.cbSin;
  const n = T.n;
  let minMa = T.flatCos;
  let at = T.flatAt;
  let x = T.flatX;
  let sin = T.flatSin;
  let cos = T.flatCos;
  let neg = 0;
  for (let k = 0; k < n; k++) {
    const ma = cs[k] + tt[k] * inv;
    if (ma < minMa || (ma === minMa && idx[k] < at)) {
      minMa = ma;
      at = idx[k];
      x = T.x[k];
      sin = T.sin[k];
      cos = cs[k];
    }
    if (pCos[k] - cbSin[k] * inv < 0) neg++;
  }
  S.minMa = minMa;
  S.minMaX = x;
  S.minMaAlpha = (Math.atan2(sin, cos) * 180) / Math.PI;
  S.negB = neg;
  if (!(minMa > 0)) {
    S.fsB = NaN;
    S.reasonB = M_ALPHA;
    return NaN;
  }
  S.fsB = F;
  S.reasonB = OK;
  return F;
}

/** Fallback: bisection of g(F) = F − ΣSi(F)/D on the interval where every mα > 0. */
function bisect(S: Scratch, cohesive: number, D: number): number {
  const T = S.bishop;
  let lo = 0.05;
  for (let k = 0; k < T.n; k++) {
    const t = T.t[k];
    if (t < 0) lo = Math.max(lo, (-t / T.cos[k]) * (1 + 1e-9));
  }
  let hi = 50;
  if (lo >= hi) return NaN;
  const g = (F: number) => F - resisting(S, cohesive, F) / D;
  let glo = g(lo);
  const ghi = g(hi);
  if (!(glo * ghi <= 0)) return NaN;
  for (let it = 0; it < 200 && hi - lo > 1e-12 * hi; it++) {
    const mid = (lo + hi) / 2;
    const gm = g(mid);
    if (gm * glo <= 0) hi = mid;
    else {
      lo = mid;
      glo = gm;
    }
  }
  return (lo + hi) / 2;
}
