/**
 * Correction of field vane strength for plasticity (Bjerrum, L. 1972, "Embankments on soft
 * ground", Proc. ASCE Specialty Conference on Performance of Earth and Earth-Supported
 * Structures, Purdue, vol. 2, pp. 1–54): design su = μ · su(vane), with μ falling as the
 * plasticity index PI rises, from back-analysed embankment failures on soft clay.
 *
 * Bjerrum gave μ as a curve. The line used here, μ = 1.7 − 0.54·log10(PI), is the fit to that
 * curve commonly quoted after Azzouz, Baligh & Ladd (1983); both the fit and its range of PI
 * are written from memory and have not been re-read against the papers. The curve was drawn
 * for normally to lightly overconsolidated clays; it is not meant for other soils.
 */

/** Lowest and highest PI (%) for which the fit is used (the range of the curve, from memory). */
export const BJERRUM_PI_RANGE = [5, 120] as const;

/** Bjerrum's μ at plasticity index `pi` (%); NaN outside BJERRUM_PI_RANGE. */
export function bjerrumMu(pi: number): number {
  if (!(pi >= BJERRUM_PI_RANGE[0] && pi <= BJERRUM_PI_RANGE[1])) return NaN;
  return 1.7 - 0.54 * Math.log10(pi);
}

/** Where the vane correction of a set came from, shown beside the values it changed. */
export interface VaneCorrection {
  /** "none": su as measured; "given": a factor the user typed; "bjerrum": μ from PI. */
  basis: "none" | "given" | "bjerrum";
  factor: number;
  plasticityIndex?: number;
}

export const BJERRUM_SOURCE =
  "Bjerrum (1972), μ = 1.7 − 0.54·log10(PI) as fitted by Azzouz, Baligh & Ladd (1983); written from memory";
