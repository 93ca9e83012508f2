/**
 * The Morgenstern–Price method (Morgenstern & Price 1965), docs/engine.md §11: X = λ·f(x)·E with
 * f a half-sine over the mass (default) or constant (which is Spencer's method); F and λ satisfy
 * force and moment equilibrium of the mass.
 */
import { setIntersliceFunction, solveGle, type GleSlices } from "./gle";
import { GLE_CODES } from "./spencer";

/** Morgenstern–Price F of the slices in G (NaN with G.status set when there is none), starting from F0. */
export function morgensternPriceFactor(G: GleSlices, F0: number, halfSine: boolean): number {
  setIntersliceFunction(G, halfSine);
  return solveGle(G, F0, 0, GLE_CODES);
}
