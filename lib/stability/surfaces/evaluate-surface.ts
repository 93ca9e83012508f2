/**
 * A rigorous factor of safety of one polyline slip surface (docs/engine.md §12): slices from
 * slice-surface.ts handed to the general limit-equilibrium solver in its sliding frame, with a
 * moment point above the mass (the solution does not depend on it once both equilibria hold).
 */
import { LEVEL_TOL } from "../circle-direction";
import { createGleSlices, type GleSlices } from "../methods/gle";
import { morgensternPriceFactor } from "../methods/morgenstern-price";
import { spencerFactor } from "../methods/spencer";
import type { PreparedSection } from "../prepare";
import type { RigorousMethod } from "../schema";
import { NO_DRIVING, NOT_CONVERGED, OK } from "../status";
import { createSurfaceSlices, sliceSurface, type SurfaceSlices } from "./slice-surface";

/** Buffers of one surface evaluator. */
export interface SurfaceEvaluator {
  B: SurfaceSlices;
  G: GleSlices;
  /** Results of the last evaluation: F, λ, the direction used and a status code. */
  fs: number;
  lambda: number;
  dir: number;
  status: number;
}

export function createSurfaceEvaluator(): SurfaceEvaluator {
  return { B: createSurfaceSlices(), G: createGleSlices(), fs: NaN, lambda: NaN, dir: 1, status: OK };
}

/** Sliding direction of a surface: the analysis's, else toward its lower end; 0 when the ends are level. */
export function surfaceDirection(P: PreparedSection, py: ArrayLike<number>): number {
  if (P.direction !== 0) return P.direction;
  const a = py[0];
  const b = py[py.length - 1];
  if (Math.abs(a - b) <= LEVEL_TOL) return 0;
  return b < a ? 1 : -1;
}

/**
 * Copies the slices in B into G in the sliding frame (x' = dir·x, numbered from the upslope end).
 * @returns the driving force along the base, Σ(V·sin α + H·cos α) (kN/m)
 */
export function surfaceToGle(B: SurfaceSlices, G: GleSlices, dir: number): number {
  const n = B.n;
  G.n = n;
  const xA = B.xl[0];
  const xB = B.xr[n - 1];
  const L0 = xB - xA;
  let top = -Infinity;
  for (let i = 0; i < n; i++) top = Math.max(top, B.ym[i]);
  // A moment point above the middle of the mass, at about the mass's width above its highest base.
  const xo = (dir * (xA + xB)) / 2;
  const yo = top + L0 / 2;
  let driving = 0;
  for (let j = 0; j < n; j++) {
    const i = dir >= 0 ? j : n - 1 - j;
    const xl = dir >= 0 ? B.xl[i] : -B.xr[i];
    const xr = dir >= 0 ? B.xr[i] : -B.xl[i];
    const sl = dir * B.slope[i];
    const sec = Math.sqrt(1 + sl * sl);
    const sinA = -sl / sec;
    const cosA = 1 / sec;
    const b = xr - xl;
    const V = B.W[i] + B.Ww[i] + B.Q[i];
    const H = B.Fw[i] + B.Hs[i];
    const yH = H !== 0 ? (B.Fw[i] * B.yFw[i] + B.Hs[i] * B.yHs[i]) / H : B.ym[i];
    const xm = (xl + xr) / 2;
    const ym = B.ym[i];
    G.xl[j] = xl;
    G.xr[j] = xr;
    G.ym[j] = ym;
    G.sinA[j] = sinA;
    G.cosA[j] = cosA;
    G.len[j] = b * sec;
    G.V[j] = V;
    G.H[j] = H;
    G.yH[j] = yH;
    G.u[j] = B.u[i];
    G.c[j] = B.c[i];
    G.tp[j] = B.tp[i];
    G.armS[j] = -((xm - xo) * sinA + (ym - yo) * cosA) / L0;
    G.armN[j] = ((xm - xo) * cosA - (ym - yo) * sinA) / L0;
    // Moments of Bishop's sign: V at the slice's middle, H at its own height.
    G.drive[j] = ((xo - xm) * V + (yo - yH) * H) / L0;
    driving += V * sinA + H * cosA;
  }
  return driving;
}

/** A first guess of F: the ordinary method's force ratio along the base. */
function startFactor(G: GleSlices): number {
  let res = 0;
  let drv = 0;
  for (let i = 0; i < G.n; i++) {
    const Np = G.V[i] * G.cosA[i] - G.H[i] * G.sinA[i] - G.u[i] * G.len[i];
    res += G.c[i] * G.len[i] + Math.max(0, Np) * G.tp[i];
    drv += G.V[i] * G.sinA[i] + G.H[i] * G.cosA[i];
  }
  const f = res / drv;
  return f > 0 && Number.isFinite(f) ? f : 1;
}

/**
 * Solves `method` on one direction of the surface; leaves G at the solution.
 * @returns F (NaN with E.status set when there is none)
 */
function solveDirection(
  P: PreparedSection,
  E: SurfaceEvaluator,
  px: ArrayLike<number>,
  py: ArrayLike<number>,
  method: RigorousMethod,
  halfSine: boolean,
  dir: number,
  F0: number,
): number {
  const st = sliceSurface(P, E.B, px, py, dir);
  if (st !== OK) {
    E.status = st;
    return NaN;
  }
  const driving = surfaceToGle(E.B, E.G, dir);
  if (!(driving > 0)) {
    E.status = NO_DRIVING;
    return NaN;
  }
  const start = F0 > 0 ? F0 : startFactor(E.G);
  const f = method === "spencer" ? spencerFactor(E.G, start) : morgensternPriceFactor(E.G, start, halfSine);
  E.status = Number.isFinite(f) ? OK : E.G.status || NOT_CONVERGED;
  return f;
}

/**
 * The factor of `method` on surface (px, py): in its own sliding direction, or both ways when its
 * ends are level (the lower kept, and G left at that one). F0 > 0 is a starting guess.
 * Sets E.fs, E.lambda, E.dir and E.status; returns E.fs.
 */
export function evaluateSurface(
  P: PreparedSection,
  E: SurfaceEvaluator,
  px: ArrayLike<number>,
  py: ArrayLike<number>,
  method: RigorousMethod,
  halfSine: boolean,
  F0 = 0,
): number {
  const d0 = surfaceDirection(P, py);
  E.fs = NaN;
  E.lambda = NaN;
  if (d0 !== 0) {
    const f = solveDirection(P, E, px, py, method, halfSine, d0, F0);
    E.dir = d0;
    if (Number.isFinite(f)) {
      E.fs = f;
      E.lambda = E.G.lambda;
    }
    return E.fs;
  }
  const fr = solveDirection(P, E, px, py, method, halfSine, 1, F0);
  const stR = E.status;
  const fl = solveDirection(P, E, px, py, method, halfSine, -1, F0);
  const stL = E.status;
  if (!Number.isFinite(fr) && !Number.isFinite(fl)) {
    E.status = stR !== NO_DRIVING ? stR : stL;
    return NaN;
  }
  const right = Number.isFinite(fr) && !(fl < fr);
  // Leave G holding the kept direction's solution.
  if (right) solveDirection(P, E, px, py, method, halfSine, 1, fr);
  E.dir = right ? 1 : -1;
  E.fs = right ? fr : fl;
  E.lambda = E.G.lambda;
  E.status = OK;
  return E.fs;
}
