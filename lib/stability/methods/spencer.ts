/**
 * Spencer's method (Spencer 1967), docs/engine.md §11: every interslice force is inclined at the
 * same angle θ, X = λ·E with λ = tan θ; F and λ satisfy force and moment equilibrium of the mass.
 */
import * as status from "../status";
import { setIntersliceFunction, solveGle, type GleCodes, type GleSlices } from "./gle";

export const GLE_CODES: GleCodes = { ok: status.OK, notConverged: status.NOT_CONVERGED, mAlpha: status.M_ALPHA };

/** Spencer's F of the slices in G (NaN with G.status set when there is none), starting from F0. */
export function spencerFactor(G: GleSlices, F0: number): number {
  setIntersliceFunction(G, false);
  return solveGle(G, F0, 0, GLE_CODES);
}
