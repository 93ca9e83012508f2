/**
 * Ponded water against a vertical face of the ground (docs/engine.md §3 "Ponded water"): the
 * slice tops carry the water on sloping ground, and this adds the horizontal thrust on
 * the part of a vertical face that belongs to the slip mass, to the slice on its soil side.
 * Circles (slices.ts) and polylines (surfaces/slice-surface.ts) share it.
 */
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";

const EDGE_TOL = 1e-9;

/** The thrust on one face: toward +x in the sliding frame (kN/m) and its elevation (m). */
export interface FaceThrust {
  F: number;
  y: number;
}

/**
 * The strip boundary k whose vertical face borders the slice [xl, xr] of strip ks on the slice's soil
 * side (face on its left edge with soil on its right, or on its right edge with soil on its left); −1 if none.
 */
export function borderingFace(P: PreparedSection, ks: number, xl: number, xr: number): number {
  const T = P.table;
  if (ks > 0 && P.faceSoil[ks] === 1 && Math.abs(xl - T.xs[ks]) <= EDGE_TOL * (1 + Math.abs(xl))) return ks;
  if (ks + 1 < T.n && P.faceSoil[ks + 1] === -1 && Math.abs(xr - T.xs[ks + 1]) <= EDGE_TOL * (1 + Math.abs(xr)))
    return ks + 1;
  return -1;
}

/**
 * The water thrust on face k above the slip surface's elevation yBase there, in sliding direction dir;
 * writes it to out and returns false when the face is dry above the surface. Only for sections with
 * a water line (P.hasFaces is false otherwise: their water arrays hold no level).
 */
export function faceThrust(P: PreparedSection, k: number, yBase: number, dir: number, out: FaceThrust): boolean {
  const x = P.table.xs[k];
  // The water against the face stands on its open (lower) side.
  const open = P.faceSoil[k] === 1 ? k - 1 : k;
  const yw = P.waterA[open] + P.waterB[open] * x;
  const lo = Math.max(P.faceBot[k], yBase);
  const hi = Math.min(P.faceTop[k], yw);
  if (hi <= lo) return false;
  const pLo = P.gammaW * (yw - lo);
  const pHi = P.gammaW * (yw - hi);
  const F = ((pLo + pHi) / 2) * (hi - lo);
  // Water pushes into the soil: toward +x when the soil is on the right.
  out.F = dir * P.faceSoil[k] * F;
  out.y = lo + ((hi - lo) * (pLo + 2 * pHi)) / (3 * (pLo + pHi));
  return true;
}

const THRUST: FaceThrust = { F: 0, y: 0 };

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
  const k = borderingFace(P, ks, xl, xr);
  if (k < 0) return;
  const dx = P.table.xs[k] - xc;
  const ya = yc - Math.sqrt(Math.max(0, r * r - dx * dx));
  if (!faceThrust(P, k, ya, dir, THRUST)) return;
  S.Fw[i] += THRUST.F;
  S.Hn[i] += THRUST.F;
  S.dD[i] += (THRUST.F * (yc - THRUST.y)) / r;
}
