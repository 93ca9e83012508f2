/**
 * Ponded water against a vertical face of the ground (docs/engine.md §3 "Ponded water"): the
 * slice tops carry the water on sloping ground, and this adds the horizontal thrust on
 * the part of a vertical face that belongs to the slip mass, to the slice on its soil side.
 */
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";

const EDGE_TOL = 1e-9;

/** Adds the face thrust (kN/m, with its moment about the centre) to slice i if it borders a wet face. */
export function addFaceThrust(
  P: PreparedSection,
  S: Scratch,
  i: number,
  ks: number,
  xl: number,
  xr: number,
  xc: number,
  yc: number,
  r: number,
  dir: number,
): void {
  const T = P.table;
  // Face on the slice's left edge with soil on its right, or on its right edge with soil on its left.
  let k = -1;
  if (ks > 0 && P.faceSoil[ks] === 1 && Math.abs(xl - T.xs[ks]) <= EDGE_TOL * (1 + Math.abs(xl))) k = ks;
  else if (ks + 1 < T.n && P.faceSoil[ks + 1] === -1 && Math.abs(xr - T.xs[ks + 1]) <= EDGE_TOL * (1 + Math.abs(xr)))
    k = ks + 1;
  if (k < 0) return;
  const x = T.xs[k];
  // The water against the face stands on its open (lower) side.
  const open = P.faceSoil[k] === 1 ? k - 1 : k;
  const yw = P.waterA[open] + P.waterB[open] * x;
  const dx = x - xc;
  const ya = yc - Math.sqrt(Math.max(0, r * r - dx * dx));
  const lo = Math.max(P.faceBot[k], ya);
  const hi = Math.min(P.faceTop[k], yw);
  if (hi <= lo) return;
  const pLo = P.gammaW * (yw - lo);
  const pHi = P.gammaW * (yw - hi);
  const F = ((pLo + pHi) / 2) * (hi - lo);
  const yF = lo + ((hi - lo) * (pLo + 2 * pHi)) / (3 * (pLo + pHi));
  // Water pushes into the soil: toward +x when the soil is on the right.
  const Fx = dir * P.faceSoil[k] * F;
  S.Fw[i] += Fx;
  S.Hn[i] += Fx;
  S.dD[i] += (Fx * (yc - yF)) / r;
}
