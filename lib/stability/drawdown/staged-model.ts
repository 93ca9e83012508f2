/**
 * Per-material data of a staged rapid drawdown (docs/engine.md §7(b)) as typed arrays indexed by
 * material number, built once per run: how each material drains, and its Kc = 1 envelope
 * (d, tan ψ) or R envelope (cR, tan φR) for the second-stage strength.
 */
import type { PreparedSection } from "../prepare";
import type { Material } from "../schema";
import { kc1Intercept, kc1Slope } from "./staged-strength";

/** Duncan, Wright & Wong (1990) three-stage procedure. */
export const VARIANT_THREE_STAGE = 0;
/** USACE (1970) two-stage procedure, EM 1110-2-1902 (2003) Appendix G. */
export const VARIANT_TWO_STAGE = 1;

/** Low-permeability Mohr–Coulomb material: undrained in stage 2 from its R envelope. */
export const DRAIN_LOW = 0;
/** Free-draining material: c', φ' with the post-drawdown pore pressures in every stage. */
export const DRAIN_FREE = 1;
/** Strength fixed by the document (an undrained su material, or impenetrable): the same in every stage. */
export const DRAIN_FIXED = 2;

/** The staged part of a prepared section. Angles are stored as their trigonometric ratios. */
export interface StagedModel {
  variant: number;
  /** The same section with the pre-drawdown water (stage 1); same strip table as the main one. */
  pre: PreparedSection;
  drainage: Uint8Array;
  /** Kc = 1 envelope τ = d + σ'fc·tan ψ (kPa), from cR, φR (three-stage). */
  d: Float64Array;
  tanPsi: Float64Array;
  /** R envelope itself (two-stage). */
  cR: Float64Array;
  tanPhiR: Float64Array;
  /** sin φ', cos φ' of the effective envelope. */
  sinPhi: Float64Array;
  cosPhi: Float64Array;
}

/**
 * Builds the staged model of a valid section. Materials without an R envelope that are not
 * free-draining are rejected by validation before this runs; here they fall back to drained.
 */
export function buildStagedModel(
  materials: ReadonlyArray<Material>,
  pre: PreparedSection,
  variant: number,
): StagedModel {
  const n = materials.length;
  const m: StagedModel = {
    variant,
    pre,
    drainage: new Uint8Array(n),
    d: new Float64Array(n),
    tanPsi: new Float64Array(n),
    cR: new Float64Array(n),
    tanPhiR: new Float64Array(n),
    sinPhi: new Float64Array(n),
    cosPhi: new Float64Array(n).fill(1),
  };
  materials.forEach((mat, i) => {
    if (mat.model !== "mohr-coulomb") {
      m.drainage[i] = DRAIN_FIXED;
      return;
    }
    const phi = (mat.phi * Math.PI) / 180;
    m.sinPhi[i] = Math.sin(phi);
    m.cosPhi[i] = Math.cos(phi);
    if (mat.freeDraining || mat.cR === undefined || mat.phiR === undefined) {
      m.drainage[i] = DRAIN_FREE;
      return;
    }
    const phiR = (mat.phiR * Math.PI) / 180;
    m.drainage[i] = DRAIN_LOW;
    m.cR[i] = mat.cR;
    m.tanPhiR[i] = Math.tan(phiR);
    m.d[i] = kc1Intercept(mat.cR, phiR, phi);
    m.tanPsi[i] = kc1Slope(phiR, phi);
  });
  return m;
}
