import { fitLine, type LinearFit } from "./least-squares";
import {
  DEG_PER_RAD,
  LabInputError,
  ProblemList,
  collectSourceIds,
  describeRow,
  sourcedPoint,
  type LabRowRef,
  type SourcedPoint,
} from "./lab-input";

/** One consolidated-undrained triaxial specimen at failure (all kPa). */
export interface TriaxialCuSpecimen extends LabRowRef {
  /** Cell (confining) pressure σ3, total (kPa). */
  cellPressure: number;
  /** Deviator stress at failure q = σ1 − σ3 (kPa), > 0. */
  deviatorStress: number;
  /** Pore pressure at failure u (kPa), measured from the same datum as σ3. */
  porePressure: number;
}

/**
 * Stress space for the fit: `p-q` uses p' = (σ1' + 2σ3')/3 and q = σ1 − σ3 (Cambridge form);
 * `s-t` uses s' = (σ1' + σ3')/2 and t = (σ1 − σ3)/2 (MIT form).
 */
export type TriaxialStressSpace = "p-q" | "s-t";

export interface TriaxialCuInput {
  specimens: TriaxialCuSpecimen[];
  space: TriaxialStressSpace;
}

export interface TriaxialCuPoint extends SourcedPoint {
  /** Effective minor and major principal stresses at failure (kPa), for Mohr circles. */
  sigma3Effective: number;
  sigma1Effective: number;
}

export interface TriaxialCuResult {
  space: TriaxialStressSpace;
  /** c' (kPa) and φ' (degrees) of the Mohr–Coulomb envelope. */
  cohesion: number;
  frictionAngle: number;
  /** The fitted line in the chosen space: q = k + M·p' or t = a + s'·tan α. */
  lineIntercept: number;
  lineSlope: number;
  fit: LinearFit;
  /** x = p' or s', y = q or t (kPa). */
  points: TriaxialCuPoint[];
  line: [[number, number], [number, number]];
  sourceIds: string[];
  warnings: string[];
}

/**
 * Derives effective c', φ' from consolidated-undrained triaxial compression tests with pore
 * pressure measurement (ASTM D4767; Craig's Soil Mechanics, ch. 4; Wood, Soil Behaviour and
 * Critical State Soil Mechanics, for the p'–q relations).
 *
 * - p'–q: q = k + M·p' gives sin φ' = 3M/(6 + M) and c' = k·(3 − sin φ')/(6·cos φ').
 * - s'–t: t = a + s'·tan α gives sin φ' = tan α and c' = a/cos φ'.
 * For specimens that fail exactly on one Mohr–Coulomb envelope both give the same c', φ'.
 * @throws LabInputError, e.g. "test 2: effective cell pressure σ3 − u must be positive".
 */
export function deriveTriaxialCuStrength(input: TriaxialCuInput): TriaxialCuResult {
  const problems = new ProblemList();
  const specimens = input.specimens ?? [];
  if (input.space !== "p-q" && input.space !== "s-t") problems.add("input", "space", "space must be 'p-q' or 's-t'");
  if (specimens.length < 2)
    problems.add("input", "specimens", `at least 2 specimens are needed, got ${specimens.length}`);
  specimens.forEach((s, i) => {
    const where = describeRow(s, i);
    const okCell = problems.requireNonNegative(where, "cellPressure", "cell pressure", s.cellPressure);
    problems.requirePositive(where, "deviatorStress", "deviator stress", s.deviatorStress);
    const okU = problems.requireFinite(where, "porePressure", "pore pressure", s.porePressure);
    if (okCell && okU && s.cellPressure - s.porePressure <= 0) {
      problems.add(where, "porePressure", "effective cell pressure σ3 − u must be positive");
    }
  });
  problems.throwIfAny();

  const points = specimens.map((s, i): TriaxialCuPoint => {
    const s3 = s.cellPressure - s.porePressure;
    const s1 = s3 + s.deviatorStress;
    const [x, y] = input.space === "p-q" ? [(s1 + 2 * s3) / 3, s1 - s3] : [(s1 + s3) / 2, (s1 - s3) / 2];
    return { ...sourcedPoint(s, i, x, y), sigma3Effective: s3, sigma1Effective: s1 };
  });
  if (new Set(points.map((p) => p.x)).size < 2) {
    throw new LabInputError([
      {
        where: "input",
        field: "specimens",
        message: "the specimens need at least 2 different mean effective stresses",
      },
    ]);
  }
  const fit = fitLine(
    points.map((p) => p.x),
    points.map((p) => p.y),
  );
  const { cohesion, frictionAngle } = toMohrCoulomb(input.space, fit.intercept, fit.slope);

  const warnings: string[] = [];
  if (specimens.length < 3) warnings.push(`only ${specimens.length} specimens: 3 or more are recommended`);
  if (cohesion < 0)
    warnings.push(`the fitted cohesion is negative (${cohesion.toFixed(1)} kPa): check the specimens or take c' = 0`);
  if (fit.rSquared < 0.9)
    warnings.push(`the points scatter about the line (R² = ${fit.rSquared.toFixed(3)}): check the tests`);

  const xMax = Math.max(...points.map((p) => p.x));
  return {
    space: input.space,
    cohesion,
    frictionAngle,
    lineIntercept: fit.intercept,
    lineSlope: fit.slope,
    fit,
    points,
    line: [
      [0, fit.intercept],
      [xMax, fit.intercept + fit.slope * xMax],
    ],
    sourceIds: collectSourceIds(specimens),
    warnings,
  };
}

/** Converts a fitted line in p'–q or s'–t space to c' (kPa) and φ' (degrees). */
export function toMohrCoulomb(
  space: TriaxialStressSpace,
  intercept: number,
  slope: number,
): { cohesion: number; frictionAngle: number } {
  // sin φ' must lie in (0, 1): M in (0, 3) for p'–q, tan α in (0, 1) for s'–t.
  const sinPhi = space === "p-q" ? (3 * slope) / (6 + slope) : slope;
  if (!(sinPhi > 0 && sinPhi < 1)) {
    const limit = space === "p-q" ? "M must lie between 0 and 3" : "tan α must lie between 0 and 1";
    throw new LabInputError([
      {
        where: "input",
        field: "specimens",
        message: `the fitted slope ${slope.toFixed(3)} gives no friction angle (${limit})`,
      },
    ]);
  }
  const cosPhi = Math.sqrt(1 - sinPhi * sinPhi);
  const cohesion = space === "p-q" ? (intercept * (3 - sinPhi)) / (6 * cosPhi) : intercept / cosPhi;
  return { cohesion, frictionAngle: Math.asin(sinPhi) * DEG_PER_RAD };
}
