/**
 * Which way a circle's slip mass slides (ENGINE.md §1 "Direction"): fixed by the analysis,
 * or toward the lower end of the slip surface (auto).
 */
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";

/** Arc elevation (m) at x of the lower arc of circle (xc, yc, r). */
export function arcY(xc: number, yc: number, r: number, x: number): number {
  const d = x - xc;
  return yc - Math.sqrt(Math.max(0, r * r - d * d));
}

/** +1 toward +x, −1 toward −x, 0 when auto and both ends of the slip surface are level. */
export function chooseDirection(P: PreparedSection, S: Scratch, xc: number, yc: number, r: number): number {
  if (P.direction !== 0) return P.direction;
  const yl = arcY(xc, yc, r, S.massA[0]);
  const yr = arcY(xc, yc, r, S.massB[S.nMass - 1]);
  if (Math.abs(yl - yr) <= 1e-6) return 0;
  return yr < yl ? 1 : -1;
}
