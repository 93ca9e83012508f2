/**
 * General limit equilibrium of a set of slices (docs/engine.md §11): the factor of safety F and
 * the interslice scale λ for which both the horizontal force balance and the moment balance of
 * the whole mass hold, with interslice shear X = λ·f(x)·E. Spencer (1967) is f = 1,
 * Morgenstern & Price (1965) any f; the equations are those of the Fredlund & Krahn (1977)
 * general formulation, marched slice by slice as Zhu, Lee & Jiang (2005) do.
 *
 * Frame: the slices are stored in a local frame where the mass slides toward +x (x' = dir·x),
 * numbered from the upslope end. On the left face of slice i the upslope mass pushes with E_i
 * (toward +x) and drags down with X_i; on its right face the reactions act. Per slice:
 *   vertical:   N·cos α + S·sin α = V + X_i − X_{i+1}
 *   horizontal: E_{i+1} = E_i + H + N·sin α − S·cos α
 *   strength:   S = [c'·l + (N − u·l)·tan φ']/F
 * which solve, for known E_i, X_i, to E_{i+1}·(mα + λ·f_{i+1}·k) = (E_i + H − A·cos α)·mα + k·R
 * with mα = cos α + sin α·tan φ'/F, k = sin α − tan φ'·cos α/F, A = (c'·l − u·l·tan φ')/F and
 * R = V + X_i − A·sin α. The mass is in force balance when E_n = 0 and in moment balance when
 * Σ S·armS − Σ N·armN = Σ drive about a fixed point (all three scaled by a length; on a circle the
 * centre and the radius, so that at λ = 0 the moment equation is Bishop's simplified method).
 */
import type { GleSlices } from "./gle-slices";

export { createGleSlices, setIntersliceFunction, type GleSlices } from "./gle-slices";

/** Residuals of the last march: [E_n (kN), moment imbalance (kN)]; NaN when the march broke down. */
const res = new Float64Array(2);

/**
 * Marches the slices at (F, λ), filling E, X and the total base normals N; leaves the force and
 * moment residuals in `res`. Returns false when a slice's equations are singular.
 */
export function march(G: GleSlices, F: number, lam: number): boolean {
  const n = G.n;
  const inv = 1 / F;
  let E = 0;
  let X = 0;
  let M = 0;
  G.E[0] = 0;
  G.X[0] = 0;
  for (let i = 0; i < n; i++) {
    const s = G.sinA[i];
    const co = G.cosA[i];
    const t = G.tp[i];
    const l = G.len[i];
    const ma = co + s * t * inv;
    if (!(ma > 1e-9)) return false;
    const A = (G.c[i] - G.u[i] * t) * l * inv;
    const k = s - t * co * inv;
    const R = G.V[i] + X - A * s;
    const fi = lam * G.f[i + 1];
    const den = ma + k * fi;
    if (Math.abs(den) < 1e-12) return false;
    const En = ((E + G.H[i] - A * co) * ma + k * R) / den;
    const N = (R - fi * En) / ma;
    const S = A + N * t * inv;
    M += S * G.armS[i] - N * G.armN[i] - G.drive[i];
    G.N[i] = N;
    E = En;
    X = fi * En;
    G.E[i + 1] = E;
    G.X[i + 1] = X;
  }
  res[0] = E;
  res[1] = M;
  return Number.isFinite(E) && Number.isFinite(M);
}

/** ∂(E_n, M)/∂(F, λ) of the last marchWithDerivatives: [∂E/∂F, ∂E/∂λ, ∂M/∂F, ∂M/∂λ]. */
const jac = new Float64Array(4);

/**
 * march() carrying the derivatives of every quantity with respect to F and λ (forward mode), so
 * one pass gives the residuals and their Jacobian for Newton's method.
 */
export function marchWithDerivatives(G: GleSlices, F: number, lam: number): boolean {
  const n = G.n;
  const inv = 1 / F;
  const inv2 = inv * inv;
  let E = 0;
  let EF = 0;
  let EL = 0;
  let X = 0;
  let XF = 0;
  let XL = 0;
  let M = 0;
  let MF = 0;
  let ML = 0;
  for (let i = 0; i < n; i++) {
    const s = G.sinA[i];
    const co = G.cosA[i];
    const t = G.tp[i];
    const l = G.len[i];
    const ma = co + s * t * inv;
    if (!(ma > 1e-9)) return false;
    const maF = -s * t * inv2;
    const a0 = (G.c[i] - G.u[i] * t) * l;
    const A = a0 * inv;
    const AF = -a0 * inv2;
    const k = s - t * co * inv;
    const kF = t * co * inv2;
    const R = G.V[i] + X - A * s;
    const RF = XF - AF * s;
    const RL = XL;
    const f = G.f[i + 1];
    const fi = lam * f;
    const den = ma + k * fi;
    if (Math.abs(den) < 1e-12) return false;
    const denF = maF + kF * fi;
    const denL = k * f;
    const q = E + G.H[i] - A * co;
    const num = q * ma + k * R;
    const numF = (EF - AF * co) * ma + q * maF + kF * R + k * RF;
    const numL = EL * ma + k * RL;
    const En = num / den;
    const EnF = (numF - En * denF) / den;
    const EnL = (numL - En * denL) / den;
    const N = (R - fi * En) / ma;
    const NF = (RF - fi * EnF - N * maF) / ma;
    const NL = (RL - f * En - fi * EnL) / ma;
    const S = A + N * t * inv;
    const SF = AF + NF * t * inv - N * t * inv2;
    const SL = NL * t * inv;
    const aS = G.armS[i];
    const aN = G.armN[i];
    M += S * aS - N * aN - G.drive[i];
    MF += SF * aS - NF * aN;
    ML += SL * aS - NL * aN;
    G.N[i] = N;
    E = En;
    EF = EnF;
    EL = EnL;
    X = fi * En;
    XF = fi * EnF;
    XL = f * En + fi * EnL;
    G.E[i + 1] = E;
    G.X[i + 1] = X;
  }
  res[0] = E;
  res[1] = M;
  jac[0] = EF;
  jac[1] = EL;
  jac[2] = MF;
  jac[3] = ML;
  return Number.isFinite(E) && Number.isFinite(M) && jac.every(Number.isFinite);
}

/** The smallest F at which every mα stays positive (F above it keeps the march defined). */
export function lowestF(G: GleSlices): number {
  let lo = 1e-3;
  for (let i = 0; i < G.n; i++) {
    const t = G.sinA[i] * G.tp[i];
    if (t < 0) lo = Math.max(lo, (-t / G.cosA[i]) * (1 + 1e-6));
  }
  return lo;
}

/** Force and moment scales of the slices, so the residuals are compared relative to the loads. */
function scales(G: GleSlices): [number, number] {
  let sf = 1e-12;
  let sm = 1e-12;
  for (let i = 0; i < G.n; i++) {
    sf += Math.abs(G.V[i]) + Math.abs(G.H[i]);
    sm += Math.abs(G.drive[i]);
  }
  return [sf, sm];
}

/** 0: force equation E_n = 0; 1: moment equation. */
export type Equation = 0 | 1;

/**
 * The F that satisfies one equation at fixed λ (F_f(λ) or F_m(λ)): the first sign change of the
 * residual on a geometric scan from the lowest admissible F up to 100, then bisection with the
 * secant (Illinois) step. NaN when there is none.
 */
export function factorAt(G: GleSlices, lam: number, eq: Equation): number {
  const lo = lowestF(G);
  let a = lo;
  let ra = march(G, a, lam) ? res[eq] : NaN;
  for (let b = Math.max(lo * 1.25, 0.02); b <= 100; b *= 1.25) {
    const rb = march(G, b, lam) ? res[eq] : NaN;
    if (Number.isFinite(ra) && Number.isFinite(rb) && ra * rb <= 0) return refineRoot(G, lam, eq, a, b, ra, rb);
    a = b;
    ra = rb;
  }
  return NaN;
}

/** The root of one equation in F on [a, b] (residuals ra, rb of opposite sign): regula falsi, Illinois variant. */
function refineRoot(G: GleSlices, lam: number, eq: Equation, a: number, b: number, ra: number, rb: number): number {
  let side = 0;
  for (let it = 0; it < 200 && b - a > 1e-13 * b; it++) {
    let x = (a * rb - b * ra) / (rb - ra);
    if (!(x > a && x < b)) x = (a + b) / 2;
    const rx = march(G, x, lam) ? res[eq] : NaN;
    if (!Number.isFinite(rx)) return NaN;
    if (rx === 0) return x;
    if (rx * ra < 0) {
      b = x;
      rb = rx;
      if (side === -1) ra /= 2;
      side = -1;
    } else {
      a = x;
      ra = rx;
      if (side === 1) rb /= 2;
      side = 1;
    }
  }
  return (a + b) / 2;
}

const TOL = 1e-7;
/** Solutions with some mα at or below this are refused (reported as mα not positive). */
export const MIN_M_ALPHA = 0.01;
const MAX_NEWTON = 40;

/**
 * Solves F and λ on the slices in G from the start (F0, λ0): Newton's method on both residuals
 * (the Jacobian carried through the march, steps limited to 30 % of F and 0.3 in λ), and, when it fails, a
 * scan of λ for a change of sign of F_m(λ) − F_f(λ) refined by bisection. Sets G.fs, G.lambda,
 * G.iterations and G.status (OK, NOT_CONVERGED, or M_ALPHA when some mα ≤ 0 at the solution);
 * the arrays hold the forces at the solution.
 */
export function solveGle(G: GleSlices, F0: number, lam0: number, codes: GleCodes): number {
  G.fs = NaN;
  G.lambda = NaN;
  G.iterations = 0;
  if (noStrength(G)) return finish(G, 0, 0, codes);
  const [sf, sm] = scales(G);
  const lo = lowestF(G);
  let F = F0 > lo && Number.isFinite(F0) ? F0 : Math.max(1, lo * 1.5);
  let lam = Number.isFinite(lam0) ? lam0 : 0;
  for (let it = 0; it < MAX_NEWTON; it++) {
    G.iterations = it + 1;
    if (!marchWithDerivatives(G, F, lam)) break;
    const r0 = res[0] / sf;
    const r1 = res[1] / sm;
    const a00 = jac[0] / sf;
    const a01 = jac[1] / sf;
    const a10 = jac[2] / sm;
    const a11 = jac[3] / sm;
    const det = a00 * a11 - a01 * a10;
    if (!(Math.abs(det) > 1e-300)) break;
    let dF = -(a11 * r0 - a01 * r1) / det;
    let dL = -(-a10 * r0 + a00 * r1) / det;
    const damp = Math.min(1, (0.3 * F) / (Math.abs(dF) + 1e-300), 0.3 / (Math.abs(dL) + 1e-300));
    dF *= damp;
    dL *= damp;
    let Fn = F + dF;
    if (Fn <= lo) Fn = (F + lo) / 2;
    const done = Math.abs(Fn - F) <= TOL * Fn * 1e-2 && Math.abs(dL) <= TOL * 1e-2 && damp === 1;
    F = Fn;
    lam += dL;
    if (done || (Math.abs(r0) < 1e-12 && Math.abs(r1) < 1e-12)) {
      if (march(G, F, lam) && Math.abs(res[0] / sf) < 1e-8 && Math.abs(res[1] / sm) < 1e-8)
        return finish(G, F, lam, codes);
      break;
    }
  }
  return bracketLambda(G, sf, sm, codes);
}

/** Status codes the caller uses (kept out of this module so it imports only its own kind). */
export interface GleCodes {
  ok: number;
  notConverged: number;
  mAlpha: number;
}

/** Fallback: λ where F_m(λ) = F_f(λ), by a scan over λ ∈ [−1.5, 2] and bisection. */
function bracketLambda(G: GleSlices, sf: number, sm: number, codes: GleCodes): number {
  const g = (lam: number): number => {
    G.iterations++;
    const fm = factorAt(G, lam, 1);
    const ff = factorAt(G, lam, 0);
    return fm - ff;
  };
  let a = -1.5;
  let ga = g(a);
  for (let b = -1.4; b <= 2.0001; b += 0.1) {
    const gb = g(b);
    if (Number.isFinite(ga) && Number.isFinite(gb) && ga * gb <= 0) {
      let lo = a;
      let hi = b;
      let glo = ga;
      for (let it = 0; it < 60 && hi - lo > 1e-10; it++) {
        const mid = (lo + hi) / 2;
        const gm = g(mid);
        if (!Number.isFinite(gm)) break;
        if (gm * glo <= 0) hi = mid;
        else {
          lo = mid;
          glo = gm;
        }
      }
      const lam = (lo + hi) / 2;
      const F = factorAt(G, lam, 1);
      if (F > 0 && march(G, F, lam) && Math.abs(res[0] / sf) < 1e-6 && Math.abs(res[1] / sm) < 1e-6)
        return finish(G, F, lam, codes);
    }
    a = b;
    ga = gb;
  }
  G.status = codes.notConverged;
  return NaN;
}

function noStrength(G: GleSlices): boolean {
  for (let i = 0; i < G.n; i++) if (G.c[i] !== 0 || G.tp[i] !== 0) return false;
  return true;
}

/** Records the solution, its smallest mα, and rejects it when some mα ≤ 0. */
function finish(G: GleSlices, F: number, lam: number, codes: GleCodes): number {
  let minMa = Infinity;
  let at = -1;
  for (let i = 0; i < G.n; i++) {
    const ma = F > 0 ? G.cosA[i] + (G.sinA[i] * G.tp[i]) / F : G.cosA[i];
    if (ma < minMa) {
      minMa = ma;
      at = i;
    }
  }
  G.minMa = minMa;
  G.minMaAt = at;
  if (F > 0) march(G, F, lam);
  // mα at (numerically) zero means an unbounded base normal force: a spurious root, not a solution.
  if (!(minMa > MIN_M_ALPHA)) {
    G.status = codes.mAlpha;
    return NaN;
  }
  G.fs = F;
  G.lambda = lam;
  G.status = codes.ok;
  return F;
}
