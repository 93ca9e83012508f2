/**
 * Second-stage (undrained) strength of a slice base in a staged rapid drawdown
 * (docs/engine.md §7(b)). Pure scalar functions: no allocation, safe in the slice loop.
 *
 * Duncan, Wright & Wong (1990); Duncan, Wright & Brandon (2014), ch. 9:
 * - Kc = σ'1c/σ'3c from the stage-1 stresses on the slip surface (σ'fc, τfc);
 * - Kf = the same ratio at drained failure on the effective envelope (c', φ');
 * - τK1 = d + σ'fc·tan ψ (isotropic consolidation, from the R envelope),
 *   τKf = c' + σ'fc·tan φ' (consolidation to failure: the effective envelope);
 * - τ2 interpolated linearly in Kc between them, Kc clamped to [1, Kf]. Where the Kc = Kf
 *   envelope lies below the Kc = 1 one (low stresses, dilatant soil) the lower governs,
 *   so τK1 enters as min(τK1, τKf).
 * USACE (1970) two-stage, EM 1110-2-1902 (2003) App. G: τ2 = min(cR + σ'fc·tan φR, τKf),
 * the lower bound of the R and effective (S) envelopes.
 * Stresses in kPa (any consistent unit works: the functions are homogeneous).
 */

/**
 * Intercept d (stress units) of the Kc = 1 envelope τff = d + σ'fc·tan ψ from the R envelope
 * (cR, φR), for a soil with effective friction angle φ'. Angles in radians.
 * d = cR·cos φR·cos φ' / (1 − sin φR) (docs/engine.md §7(b), derived).
 */
export function kc1Intercept(cR: number, phiR: number, phi: number): number {
  return (cR * Math.cos(phiR) * Math.cos(phi)) / (1 - Math.sin(phiR));
}

/** Slope tan ψ of the Kc = 1 envelope from the R envelope: sin φR·cos φ' / (1 − sin φR). Radians. */
export function kc1Slope(phiR: number, phi: number): number {
  return (Math.sin(phiR) * Math.cos(phi)) / (1 - Math.sin(phiR));
}

/**
 * Consolidation stress ratio Kc = σ'1c/σ'3c from the effective normal and shear stress on the
 * failure plane at consolidation (σ'fc, τfc), for a soil with friction angle φ' (sin, cos given).
 * Returns NaN when the denominator is not positive (the caller then takes the lower envelope).
 */
export function consolidationRatio(sigFc: number, tauFc: number, sinPhi: number, cosPhi: number): number {
  const den = sigFc - (tauFc * (1 - sinPhi)) / cosPhi;
  if (!(den > 0)) return NaN;
  return (sigFc + (tauFc * (1 + sinPhi)) / cosPhi) / den;
}

/**
 * Principal stress ratio at drained failure Kf for the consolidation normal stress σ'fc:
 * (σ'fc + c'·cos φ')(1 + sin φ') / [(σ'fc − c'·cos φ')(1 − sin φ')]. NaN when not defined.
 */
export function failureRatio(sigFc: number, c: number, sinPhi: number, cosPhi: number): number {
  const den = (sigFc - c * cosPhi) * (1 - sinPhi);
  if (!(den > 0)) return NaN;
  return ((sigFc + c * cosPhi) * (1 + sinPhi)) / den;
}

/**
 * Three-stage second-stage strength τ2 (stress units) on a slice base.
 * @param sigFc effective normal stress on the base at consolidation (stage 1), ≥ 0
 * @param tauFc shear stress on the base at consolidation, (c' + σ'fc·tan φ')/F1
 * @param c c' ; sinPhi, cosPhi, tanPhi of φ'
 * @param d, tanPsi the Kc = 1 envelope (from kc1Intercept / kc1Slope)
 */
export function threeStageStrength(
  sigFc: number,
  tauFc: number,
  c: number,
  sinPhi: number,
  cosPhi: number,
  tanPhi: number,
  d: number,
  tanPsi: number,
): number {
  const tauKf = c + sigFc * tanPhi;
  const k1 = d + sigFc * tanPsi;
  const tauK1 = k1 < tauKf ? k1 : tauKf;
  const kf = failureRatio(sigFc, c, sinPhi, cosPhi);
  let kc = consolidationRatio(sigFc, tauFc, sinPhi, cosPhi);
  if (!(kf > 1) || Number.isNaN(kc)) return tauK1;
  if (kc < 1) kc = 1;
  else if (kc > kf) kc = kf;
  return ((kf - kc) * tauK1 + (kc - 1) * tauKf) / (kf - 1);
}

/** USACE (1970) two-stage strength: the lower of the R envelope and the effective envelope at σ'fc. */
export function twoStageStrength(sigFc: number, c: number, tanPhi: number, cR: number, tanPhiR: number): number {
  const r = cR + sigFc * tanPhiR;
  const s = c + sigFc * tanPhi;
  return r < s ? r : s;
}

/** Every intermediate of the three-stage interpolation, for reports and tests. */
export interface StageTwoDetail {
  /** Consolidation ratio as computed (NaN → null when its denominator is not positive) and as used. */
  kc: number | null;
  kcUsed: number | null;
  kf: number | null;
  tauK1: number;
  tauKf: number;
  tau2: number;
}

/** The three-stage interpolation with its intermediates (allocates: not for the hot loop). */
export function threeStageDetail(
  sigFc: number,
  tauFc: number,
  c: number,
  phi: number,
  d: number,
  tanPsi: number,
): StageTwoDetail {
  const sinPhi = Math.sin(phi);
  const cosPhi = Math.cos(phi);
  const tanPhi = Math.tan(phi);
  const kc = consolidationRatio(sigFc, tauFc, sinPhi, cosPhi);
  const kf = failureRatio(sigFc, c, sinPhi, cosPhi);
  const usable = kf > 1 && !Number.isNaN(kc);
  return {
    kc: Number.isFinite(kc) ? kc : null,
    kcUsed: usable ? Math.min(Math.max(kc, 1), kf) : null,
    kf: Number.isFinite(kf) ? kf : null,
    tauK1: d + sigFc * tanPsi,
    tauKf: c + sigFc * tanPhi,
    tau2: threeStageStrength(sigFc, tauFc, c, sinPhi, cosPhi, tanPhi, d, tanPsi),
  };
}
