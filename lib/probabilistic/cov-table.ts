/**
 * Typical coefficients of variation of soil properties, used as the default spread of a material
 * that no lab set backs. The ranges for γ, φ′ and su are those of Duncan (2000), "Factors of safety
 * and reliability in geotechnical engineering", J. Geotech. Geoenviron. Eng. 126(4), Table 1, which
 * gathers earlier compilations such as Phoon & Kulhawy (1999); the ranges are quoted from memory.
 * Duncan's table gives no range for c′; the range 13–70 % is Cherubini's (1997), as quoted in
 * Cherubini's 2001 discussion of Duncan (2000). The default is the middle of each range, a choice
 * of ours, and every default says where it came from so the engineer can replace it.
 */
export type CovQuantity = "c" | "phi" | "su" | "gamma";

export interface CovRange {
  low: number;
  high: number;
  /** The distribution a default of this quantity uses: lognormal keeps strengths that must stay positive above 0. */
  dist: "normal" | "lognormal";
  source: string;
}

const DUNCAN = "Duncan (2000) Table 1, range from memory";

export const TYPICAL_COV: Record<CovQuantity, CovRange> = {
  gamma: { low: 0.03, high: 0.07, dist: "normal", source: DUNCAN },
  phi: { low: 0.02, high: 0.13, dist: "normal", source: DUNCAN },
  su: { low: 0.13, high: 0.4, dist: "lognormal", source: DUNCAN },
  c: { low: 0.13, high: 0.7, dist: "lognormal", source: "Cherubini (1997) via the 2001 discussion of Duncan (2000)" },
};

/** The default coefficient of variation: the middle of the published range. */
export function typicalCov(q: CovQuantity): number {
  const r = TYPICAL_COV[q];
  return (r.low + r.high) / 2;
}

/** "COV 7.5 % (middle of 2–13 %, Duncan (2000) Table 1, range from memory)". */
export function covBasis(q: CovQuantity): string {
  const r = TYPICAL_COV[q];
  const pct = (v: number) => `${Number((v * 100).toFixed(1))}`;
  return `COV ${pct(typicalCov(q))} % (middle of ${pct(r.low)}–${pct(r.high)} %, ${r.source})`;
}
