/**
 * The parts of the section document (docs/engine-io.md, input version 1) that the CSV files carry.
 * Kept here, not imported from lib/stability, so import/export stays a leaf module.
 */

/** [x, y] in metres. */
export type Point = [number, number];

/** A closed polygon (first point not repeated) of one material. */
export interface SectionRegion {
  material: string;
  points: Point[];
  /** The region's name as the user gave it (the geometry CSV's region column). */
  name?: string;
}

export interface MohrCoulombMaterial {
  id: string;
  model: "mohr-coulomb";
  /** kN/m³ */
  gamma: number;
  /** kN/m³, used below the phreatic line */
  gammaSat?: number;
  /** kPa */
  c: number;
  /** degrees */
  phi: number;
  /** Optional end-of-construction undrained strength, kPa at suDatum, rising by suGradient kPa/m below it. */
  su?: number;
  suGradient?: number;
  suDatum?: number;
  /** Total-stress (R) envelope for a staged drawdown: intercept kPa, angle degrees. */
  cR?: number;
  phiR?: number;
  /** Drains as fast as the pool falls or the fill is placed: keeps effective strength then. */
  freeDraining?: boolean;
  /** Display colour, #RRGGBB. */
  color?: string;
}

export interface UndrainedMaterial {
  id: string;
  model: "undrained";
  gamma: number;
  gammaSat?: number;
  /** su (kPa) at suDatum (m), rising by suGradient (kPa/m) with depth below it. */
  su: number;
  suGradient?: number;
  suDatum?: number;
  freeDraining?: boolean;
  color?: string;
}

export interface ImpenetrableMaterial {
  id: string;
  model: "impenetrable";
  color?: string;
}

export type SectionMaterial = MohrCoulombMaterial | UndrainedMaterial | ImpenetrableMaterial;

export const MATERIAL_MODELS = ["mohr-coulomb", "undrained", "impenetrable"] as const;
