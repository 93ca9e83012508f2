/**
 * The slices the general limit-equilibrium solver (gle.ts) works on, and its outputs, in typed
 * arrays allocated once per evaluator; and the interslice function f(x) of docs/engine.md §11.
 */
import { SLICE_CAPACITY } from "../defaults";

/** Slices for the solver, and its outputs; allocated once per evaluator (no allocation per solve). */
export interface GleSlices {
  n: number;
  xl: Float64Array;
  xr: Float64Array;
  ym: Float64Array;
  sinA: Float64Array;
  cosA: Float64Array;
  len: Float64Array;
  V: Float64Array;
  /** Horizontal force on the slice, positive in the sliding direction, and its elevation. */
  H: Float64Array;
  yH: Float64Array;
  u: Float64Array;
  c: Float64Array;
  tp: Float64Array;
  /** Moment of V and H about the moment point, over the length scale (kN). */
  drive: Float64Array;
  /** Lever arms of the base shear and the base normal about the moment point, over the length scale. */
  armS: Float64Array;
  armN: Float64Array;
  /** Interslice function at the n + 1 boundaries. */
  f: Float64Array;
  // Outputs at the last march
  E: Float64Array;
  X: Float64Array;
  N: Float64Array;
  fs: number;
  lambda: number;
  iterations: number;
  /** Status code (docs: status.ts): OK, M_ALPHA or NOT_CONVERGED. */
  status: number;
  minMa: number;
  minMaAt: number;
}

export function createGleSlices(cap: number = SLICE_CAPACITY): GleSlices {
  const f = () => new Float64Array(cap);
  return {
    n: 0,
    xl: f(),
    xr: f(),
    ym: f(),
    sinA: f(),
    cosA: f(),
    len: f(),
    V: f(),
    H: f(),
    yH: f(),
    u: f(),
    c: f(),
    tp: f(),
    drive: f(),
    armS: f(),
    armN: f(),
    f: new Float64Array(cap + 1),
    E: new Float64Array(cap + 1),
    X: new Float64Array(cap + 1),
    N: f(),
    fs: NaN,
    lambda: NaN,
    iterations: 0,
    status: 0,
    minMa: NaN,
    minMaAt: -1,
  };
}

/** Fills G.f with the interslice function: 1 everywhere, or sin(π·(x − x0)/(xn − x0)). */
export function setIntersliceFunction(G: GleSlices, halfSine: boolean): void {
  const n = G.n;
  const x0 = G.xl[0];
  const w = G.xr[n - 1] - x0;
  for (let i = 0; i <= n; i++) {
    if (!halfSine) G.f[i] = 1;
    else {
      const x = i < n ? G.xl[i] : G.xr[n - 1];
      G.f[i] = i === 0 || i === n ? 0 : Math.sin((Math.PI * (x - x0)) / w);
    }
  }
}
