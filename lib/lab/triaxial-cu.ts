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
  /**
   * Back pressure (kPa) on the datum of the cell and pore pressures; default 0. The R envelope
   * takes σ3c = cell pressure − back pressure, the effective consolidation pressure.
   */
  backPressure?: number;
}

export interface TriaxialCuPoint extends SourcedPoint {
  /** Effective minor and major principal stresses at failure (kPa), for Mohr circles. */
  sigma3Effective: number;
  sigma1Effective: number;
}

/**
 * The total-stress (R) envelope of the same specimens: Mohr circles of total stress at failure,
 * σ3 = σ3c, the cell pressure less the back pressure (the consolidation pressure), and σ1 = σ3 + q,
 * fitted in the same space as the effective envelope. Its cR, φR are what the staged
 * rapid-drawdown method plots against the effective consolidation stress (USACE EM 1110-2-1902;
 * Duncan, Wright & Wong 1990), see docs/engine.md §7(b).
 */
export interface TotalStressEnvelope {
  /** cR (kPa) and φR (degrees). */
  cohesion: number;
  frictionAngle: number;
  fit: LinearFit;
  /** x = p or s (total), y = q or t (kPa). */
  points: { x: number; y: number; sigma3: number; sigma1: number }[];
  line: [[number, number], [number, number]];
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
  /**
   * The R envelope from the same specimens; null when its fit gives no friction angle. Absent on
   * sets derived before it was added (they are derived again when edited).
   */
  totalStress?: TotalStressEnvelope | null;
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
  const back = input.backPressure ?? 0;
  if (problems.requireNonNegative("input", "backPressure", "back pressure", back))
    specimens.forEach((s, i) => {
      if (Number.isFinite(s.cellPressure) && s.cellPressure <= back)
        problems.add(describeRow(s, i), "cellPressure", `cell pressure must exceed the back pressure (${back} kPa)`);
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

  const totalStress = deriveTotalStressEnvelope(input.space, specimens, back, warnings);
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
    totalStress,
  };
}

/** Fits the R envelope to total-stress circles at failure; notes in `warnings` why it could not. */
function deriveTotalStressEnvelope(
  space: TriaxialStressSpace,
  specimens: readonly TriaxialCuSpecimen[],
  backPressure: number,
  warnings: string[],
): TotalStressEnvelope | null {
  const points = specimens.map((s) => {
    const s3 = s.cellPressure - backPressure;
    const s1 = s3 + s.deviatorStress;
    const [x, y] = space === "p-q" ? [(s1 + 2 * s3) / 3, s1 - s3] : [(s1 + s3) / 2, (s1 - s3) / 2];
    return { x, y, sigma3: s3, sigma1: s1 };
  });
  if (new Set(points.map((p) => p.x)).size < 2) {
    warnings.push("no R envelope: the specimens need at least 2 different cell pressures");
    return null;
  }
  const fit = fitLine(
    points.map((p) => p.x),
    points.map((p) => p.y),
  );
  let envelope: { cohesion: number; frictionAngle: number };
  try {
    envelope = toMohrCoulomb(space, fit.intercept, fit.slope);
  } catch (err) {
    if (!(err instanceof LabInputError)) throw err;
    warnings.push(`no R envelope: ${err.problems[0]?.message ?? "the total-stress fit gives no friction angle"}`);
    return null;
  }
  if (envelope.cohesion < 0)
    warnings.push(
      `the fitted R-envelope intercept is negative (${envelope.cohesion.toFixed(1)} kPa): ` +
        "check the specimens or take cR = 0",
    );
  const xMax = Math.max(...points.map((p) => p.x));
  return {
    ...envelope,
    fit,
    points,
    line: [
      [0, fit.intercept],
      [xMax, fit.intercept + fit.slope * xMax],
    ],
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
