/**
 * Public result shapes of the methods that satisfy both force and moment equilibrium (Spencer 1967,
 * Morgenstern & Price 1965) and of slip surfaces of any shape (docs/engine-io.md "Methods and slip
 * surfaces of any shape"). Plain JSON: numbers, arrays, null; never NaN or Infinity. These shapes
 * are a contract with the result view: fields may be added, none renamed or removed.
 */
import type { AnalysisMethod, IntersliceFunction, RigorousMethod } from "./schema";
import type { EngineWarning } from "./issues";
import type { SliceRow } from "./analyze-circle";

export type { AnalysisMethod, IntersliceFunction, RigorousMethod };

/** The methods that satisfy force and moment equilibrium, in report order. */
export const RIGOROUS_METHODS: readonly RigorousMethod[] = ["spencer", "morgenstern-price"];

/** A point [x, y] in metres. */
export type XY = [number, number];

/** The interslice forces on one slice boundary (kN/m), numbered from the upslope end of the mass. */
export interface IntersliceForce {
  /** Abscissa of the boundary (m, document coordinates). */
  x: number;
  /** Slip surface and ground elevations at the boundary (m). */
  yBase: number;
  yTop: number;
  /** Interslice normal force E (kN/m); positive in compression. 0 at both ends of the mass. */
  normal: number;
  /** Interslice shear force X = λ·f(x)·E (kN/m). */
  shear: number;
  /** Elevation of E's line of action (m): the line of thrust. null at the ends and where E ≈ 0. */
  thrustY: number | null;
}

/** The base forces of one slice at the solution (kN/m). */
export interface RigorousSlice {
  xLeft: number;
  xRight: number;
  /** Elevation of the base midpoint (m) and base angle (°, positive where it falls in the sliding direction). */
  baseY: number;
  alpha: number;
  /** Effective base normal force N' = N − u·l (kN/m); may be negative (then a warning). */
  normal: number;
  /** Mobilised base shear (c'·l + N'·tan φ')/F (kN/m). */
  shear: number;
  /** cos α + sin α·tan φ'/F at the solution. */
  mAlpha: number;
}

/** Why a rigorous solution is doubtful, with the place it concerns. */
export type RigorousWarningCode = "thrust-outside" | "tension" | "m-alpha-low" | "negative-normal";

/** A warning on one method's solution; `at` is the point (m) it concerns, when it has one. */
export interface RigorousWarning extends EngineWarning {
  code: RigorousWarningCode;
  at: XY | null;
}

/**
 * One method's full solution on one slip surface (circle or polyline). `fs` and `lambda` are null
 * when there is no solution; `reason` (kebab-case) and `reasonText` then say why.
 */
export interface RigorousFs {
  method: RigorousMethod;
  fs: number | null;
  /** λ of X = λ·f(x)·E; for Spencer tan θ of the constant interslice inclination θ. */
  lambda: number | null;
  reason?: string;
  reasonText?: string;
  /** The interslice function used: Spencer is always "constant". */
  interslice: IntersliceFunction;
  /** Newton steps (plus fallback evaluations) used. */
  iterations: number;
  minMAlpha: number | null;
  /** n + 1 boundaries of n slices, in document order (x increasing). */
  boundaries: IntersliceForce[];
  /** The line of thrust through the interior boundaries, [x, y] (m), x increasing. */
  thrustLine: XY[];
  slices: RigorousSlice[];
  warnings: RigorousWarning[];
}

/** Per rigorous method: its solution on the surface reported. */
export type RigorousRecord = Partial<Record<RigorousMethod, RigorousFs>>;

/** λ of each rigorous method asked for (null without a solution): printed beside `fs`. */
export type LambdaRecord = Partial<Record<RigorousMethod, number | null>>;

/** A factor of safety per method asked (null with a reason when the method gives none). */
export type AnalysisFsRecord = Partial<Record<AnalysisMethod, number | null>>;

/** Why a method has no factor on a surface: `circular-only` for Bishop and the ordinary method. */
export interface MethodReason {
  reason: string;
  reasonText: string;
}

/** The loads and strengths of one slice of a polyline surface (forces kN/m, kPa, m, °): the circle's
 * slice row without its circle-only terms. */
export type SurfaceSliceRow = Pick<
  SliceRow,
  | "xLeft"
  | "xRight"
  | "weight"
  | "pondedLoad"
  | "waterThrust"
  | "surcharge"
  | "seismicForce"
  | "alpha"
  | "baseLength"
  | "baseY"
  | "porePressure"
  | "material"
  | "c"
  | "phi"
>;

/** The result of one slip surface given as a polyline (`--surface`). */
export interface SurfaceSuccess {
  ok: true;
  engineVersion: string;
  /** The surface as analysed, [x, y] (m), x increasing; its ends lie on the ground. */
  surface: XY[];
  fs: AnalysisFsRecord;
  lambda: LambdaRecord;
  /** Methods without a factor, and why (`circular-only`, `not-converged`, …). */
  reasons: Partial<Record<AnalysisMethod, MethodReason>>;
  /** Set when the surface itself is refused (every fs null): why, in words, and where. */
  reason?: string;
  reasonText?: string;
  at?: XY | null;
  /** Upslope end, toe end and sliding direction; absent when the surface is refused. */
  entry?: XY;
  exit?: XY;
  direction?: "left" | "right";
  slices: SurfaceSliceRow[];
  rigorous: RigorousRecord;
  warnings: EngineWarning[];
}

/** Progress of a surfaces search: fraction done (0–1) and the lowest FS so far (null before any). */
export interface SurfaceSearchProgress {
  fraction: number;
  bestFs: number | null;
}
