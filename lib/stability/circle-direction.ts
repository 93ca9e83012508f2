/**
 * Which way a slip mass slides (docs/engine.md §1 "Direction", §3 "Separate slip masses"):
 * fixed by the analysis, or toward the lower end of that mass's own slip surface (auto).
 * Each piece of a circle is judged on its own; a piece whose ends are level is tried both ways.
 */
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";

/** Two ends of a piece within this height (m) of each other are level. */
export const LEVEL_TOL = 1e-6;

/** Arc elevation (m) at x of the lower arc of circle (xc, yc, r). */
export function arcY(xc: number, yc: number, r: number, x: number): number {
  const d = x - xc;
  return yc - Math.sqrt(Math.max(0, r * r - d * d));
}

/**
 * Direction of mass m of the circle now in S: +1 toward +x, −1 toward −x, or 0 when the
 * analysis says auto and the mass's two ends are level (then both directions are tried).
 */
export function massDirection(P: PreparedSection, S: Scratch, xc: number, yc: number, r: number, m: number): number {
  if (P.direction !== 0) return P.direction;
  const yl = arcY(xc, yc, r, S.massA[m]);
  const yr = arcY(xc, yc, r, S.massB[m]);
  if (Math.abs(yl - yr) <= LEVEL_TOL) return 0;
  return yr < yl ? 1 : -1;
}

/**
 * True when a mass with driving term D (kN) and gross driving Σ|terms| is driven at all:
 * D must be positive beyond round-off and at least 1e-4 of the resisting term (FS ≤ 10⁴).
 * Below that the circle is all but balanced and its FS is a ratio of noise.
 */
export function isDriven(D: number, gross: number, resisting: number): boolean {
  return D > 1e-9 * gross && D > 1e-12 && D * 1e4 >= resisting;
}
