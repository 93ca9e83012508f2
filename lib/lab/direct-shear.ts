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

/** One direct (shear box) test at failure. Stresses in kPa. */
export interface DirectShearTest extends LabRowRef {
  /** Normal stress σn on the shear plane (kPa), > 0. */
  normalStress: number;
  /** Peak shear stress τ at failure (kPa), > 0. */
  shearStress: number;
}

export interface DirectShearInput {
  tests: DirectShearTest[];
  /** Force the envelope through the origin (c' = 0), as for clean sands. */
  zeroCohesion?: boolean;
}

/** Mohr–Coulomb envelope τ = c' + σn·tan φ' from direct shear tests. */
export interface DirectShearResult {
  /** Effective cohesion intercept c' (kPa). */
  cohesion: number;
  /** Effective friction angle φ' (degrees). */
  frictionAngle: number;
  fit: LinearFit;
  /** x = σn (kPa), y = τ (kPa). */
  points: SourcedPoint[];
  /** The fitted envelope from σn = 0 to the largest σn tested, for plotting. */
  line: [[number, number], [number, number]];
  sourceIds: string[];
  warnings: string[];
}

/**
 * Fits the Mohr–Coulomb envelope τ = c' + σn·tan φ' to direct shear results by least squares
 * (Craig's Soil Mechanics, ch. 4; ASTM D3080 for the test itself).
 * Needs 2 tests; 3 or more are recommended (a warning otherwise).
 * @throws LabInputError listing every bad row, e.g. "test 3: normal stress must be positive".
 */
export function deriveDirectShearStrength(input: DirectShearInput): DirectShearResult {
  const problems = new ProblemList();
  const tests = input.tests ?? [];
  if (tests.length < 2) problems.add("input", "tests", `at least 2 tests are needed, got ${tests.length}`);
  tests.forEach((t, i) => {
    const where = describeRow(t, i);
    problems.requirePositive(where, "normalStress", "normal stress", t.normalStress);
    problems.requirePositive(where, "shearStress", "shear stress", t.shearStress);
  });
  problems.throwIfAny();

  const zeroCohesion = input.zeroCohesion === true;
  const distinct = new Set(tests.map((t) => t.normalStress)).size;
  if (!zeroCohesion && distinct < 2) {
    throw new LabInputError([
      { where: "input", field: "normalStress", message: "the tests need at least 2 different normal stresses" },
    ]);
  }
  const fit = fitLine(
    tests.map((t) => t.normalStress),
    tests.map((t) => t.shearStress),
    { throughOrigin: zeroCohesion },
  );
  if (fit.slope <= 0) {
    throw new LabInputError([
      {
        where: "input",
        field: "shearStress",
        message: "shear stress does not rise with normal stress: no friction angle can be fitted",
      },
    ]);
  }

  const warnings: string[] = [];
  if (tests.length < 3) warnings.push(`only ${tests.length} tests: 3 or more are recommended`);
  if (fit.intercept < 0)
    warnings.push(`the fitted cohesion is negative (${fit.intercept.toFixed(1)} kPa): consider forcing c' = 0`);
  if (fit.rSquared < 0.9)
    warnings.push(`the points scatter about the line (R² = ${fit.rSquared.toFixed(3)}): check the tests`);

  const sigmaMax = Math.max(...tests.map((t) => t.normalStress));
  return {
    cohesion: fit.intercept,
    frictionAngle: Math.atan(fit.slope) * DEG_PER_RAD,
    fit,
    points: tests.map((t, i) => sourcedPoint(t, i, t.normalStress, t.shearStress)),
    line: [
      [0, fit.intercept],
      [sigmaMax, fit.intercept + fit.slope * sigmaMax],
    ],
    sourceIds: collectSourceIds(tests),
    warnings,
  };
}
