/**
 * Test reference: the engine file as it stood before the speed work (commit a03b372), unchanged
 * apart from its imports (see ./evaluate-circle.ts).
 *
 * Bishop's simplified method (Bishop 1955), docs/engine.md §4: vertical equilibrium of each
 * slice with the interslice shear neglected, moment equilibrium about the centre.
 *   mα = cos α + sin α·tan φ'/F,  Si = [c'·b + (V − u·b)·tan φ'] / mα,  F = ΣSi / D.
 * Where the base normal N' = (V − u·b − c'·b·tan α/F)/mα would be negative, Si = c'·l.
 * Iterated from the ordinary-method value until |ΔF| ≤ 1e-6·F (at most 60 passes), then a
 * bisection on [0.05, 50] as a fallback. mα ≤ 0 on any slice at the solution makes the
 * result invalid; min mα is reported for the warning below 0.2 (Whitman & Bailey 1967).
 * A mass with no strength at all (c' = 0, φ' = 0 on every slice) has FS = 0 exactly.
 */
import type { Scratch } from "@/lib/stability/scratch";
import * as status from "@/lib/stability/status";

const M_ALPHA = status.M_ALPHA;
const NOT_CONVERGED = status.NOT_CONVERGED;
const OK = status.OK;

const REL_TOL = 1e-6;
const MAX_PASSES = 60;

/** ΣSi at trial F over the slices in S; its derivative dΣSi/dF is left in `deriv[0]`. */
const deriv = new Float64Array(1);
function resisting(S: Scratch, F: number): number {
  let sum = 0;
  let dsum = 0;
  const n = S.n;
  const inv = 1 / F;
  for (let i = 0; i < n; i++) {
    const tp = S.tanPhi[i];
    const c = S.c[i];
    if (tp === 0) {
      sum += c * S.len[i];
      continue;
    }
    const b = S.bb[i];
    const cos = S.cosA[i];
    const t = S.sinA[i] * tp;
    const p = S.V[i] - S.u[i] * b;
    // N' < 0 ⇔ (V − u·b)·cos α − c'·b·sin α/F < 0 while mα > 0.
    if (p * cos - c * b * S.sinA[i] * inv < 0) sum += c * S.len[i];
    else {
      const m = cos + t * inv;
      const s = (c * b + p * tp) / m;
      sum += s;
      dsum += (s * t * inv * inv) / m;
    }
  }
  deriv[0] = dsum;
  return sum;
}

/**
 * Bishop factor of safety of the slices in S, starting from F0.
 * Solves F = ΣSi(F)/D by Newton steps on g(F) = F − ΣSi(F)/D (a plain fixed-point step
 * where Newton would misbehave) until |ΔF| ≤ 1e-6·F.
 * Sets S.fsB (NaN when invalid), S.reasonB, S.minMa (+ its x and α in degrees), S.negB and S.iterations.
 */
export function bishopFactor(S: Scratch, D: number, F0: number): number {
  if (noStrength(S)) return zeroStrength(S);
  let F = F0 > 0 && Number.isFinite(F0) ? F0 : 1;
  let done = false;
  let it = 0;
  const invD = 1 / D;
  for (; it < MAX_PASSES; it++) {
    const fixed = resisting(S, F) * invD;
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
    const f = bisect(S, D);
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

/** True when no slice has any strength (c' = 0 and tan φ' = 0 everywhere): then FS = 0 exactly. */
function noStrength(S: Scratch): boolean {
  for (let i = 0; i < S.n; i++) if (S.c[i] !== 0 || S.tanPhi[i] !== 0) return false;
  return true;
}

/** The result for a mass without strength: FS 0, mα = cos α (φ' = 0), every normal force as computed. */
function zeroStrength(S: Scratch): number {
  let minMa = Infinity;
  let at = 0;
  for (let i = 0; i < S.n; i++) {
    if (S.cosA[i] < minMa) {
      minMa = S.cosA[i];
      at = i;
    }
  }
  S.minMa = minMa;
  S.minMaX = (S.xL[at] + S.xR[at]) / 2;
  S.minMaAlpha = (Math.atan2(S.sinA[at], S.cosA[at]) * 180) / Math.PI;
  S.negB = 0;
  S.iterations = 0;
  S.fsB = 0;
  S.reasonB = OK;
  return 0;
}

/** Records mα and negative-normal counts at the solution F and checks mα > 0. */
function finish(S: Scratch, F: number): number {
  let minMa = Infinity;
  let at = 0;
  let neg = 0;
  for (let i = 0; i < S.n; i++) {
    const tp = S.tanPhi[i];
    const ma = S.cosA[i] + (S.sinA[i] * tp) / F;
    if (ma < minMa) {
      minMa = ma;
      at = i;
    }
    if (tp !== 0 && (S.V[i] - S.u[i] * S.bb[i]) * S.cosA[i] - (S.c[i] * S.bb[i] * S.sinA[i]) / F < 0) neg++;
  }
  S.minMa = minMa;
  S.minMaX = (S.xL[at] + S.xR[at]) / 2;
  S.minMaAlpha = (Math.atan2(S.sinA[at], S.cosA[at]) * 180) / Math.PI;
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
function bisect(S: Scratch, D: number): number {
  let lo = 0.05;
  for (let i = 0; i < S.n; i++) {
    const t = S.sinA[i] * S.tanPhi[i];
    if (t < 0) lo = Math.max(lo, (-t / S.cosA[i]) * (1 + 1e-9));
  }
  let hi = 50;
  if (lo >= hi) return NaN;
  const g = (F: number) => F - resisting(S, F) / D;
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
