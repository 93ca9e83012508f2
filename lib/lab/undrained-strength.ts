import { fitLine, type LinearFit } from "./least-squares";
import { ProblemList, collectSourceIds, describeRow, type LabRowRef } from "./lab-input";
import { BJERRUM_PI_RANGE, bjerrumMu, type VaneCorrection } from "./vane-correction";

/**
 * One undrained strength measurement. Give `deviatorStress` for a UU triaxial test or `su` for a
 * field vane; place it by `elevation` (m) or by `depth` below `groundElevation` (m).
 */
export interface UndrainedTest extends LabRowRef {
  depth?: number;
  elevation?: number;
  /** UU triaxial deviator stress at failure q = σ1 − σ3 (kPa); su = q/2. */
  deviatorStress?: number;
  /** Field vane undrained strength (kPa), before any correction factor. */
  su?: number;
}

export interface UndrainedStrengthInput {
  source: "uu" | "vane";
  tests: UndrainedTest[];
  /** `constant`: one su (mean); `linear`: su at a datum plus a gradient with depth. */
  model: "constant" | "linear";
  /** Ground elevation (m), needed when tests are placed by depth. */
  groundElevation?: number;
  /** Datum elevation for the linear model (m); default the ground, else the highest test. */
  datumElevation?: number;
  /** Multiplier on vane su typed by the user; default 1, i.e. no correction. */
  vaneCorrectionFactor?: number;
  /**
   * Plasticity index PI (%) of the clay: when given, vane su is multiplied by Bjerrum's μ(PI)
   * (lib/lab/vane-correction.ts). Only one of this and vaneCorrectionFactor may be given.
   */
  vanePlasticityIndex?: number;
}

export interface UndrainedPoint {
  /** Undrained strength (kPa) after any vane correction. */
  su: number;
  /** Vane tests: su as read in the field (kPa), before the correction. */
  measuredSu?: number;
  /** Elevation (m), or null when the test has no position. */
  elevation: number | null;
  index: number;
  id?: string;
  specimen?: string;
}

/**
 * Fields of the engine's `undrained` material model (docs/engine-io.md):
 * su(y) = su + suGradient·max(0, suDatum − y).
 */
export interface UndrainedModelFields {
  su: number;
  suGradient?: number;
  suDatum?: number;
}

interface CommonResult {
  n: number;
  points: UndrainedPoint[];
  engineFields: UndrainedModelFields;
  sourceIds: string[];
  warnings: string[];
  /** Vane tests: the correction applied to every reading (absent for UU tests). */
  vaneCorrection?: VaneCorrection;
}

export interface ConstantSuResult extends CommonResult {
  model: "constant";
  /** Mean su (kPa). */
  su: number;
  /** Sample standard deviation (n − 1) in kPa; null for one test. */
  standardDeviation: number | null;
  coefficientOfVariation: number | null;
}

export interface LinearSuResult extends CommonResult {
  model: "linear";
  /** su at the datum elevation (kPa). */
  su: number;
  /** Increase of su per metre of depth below the datum (kPa/m). */
  suGradient: number;
  /** Datum elevation (m). */
  suDatum: number;
  /** Least-squares fit of su (kPa) against elevation (m). */
  fit: LinearFit;
  /** The fitted line as [su, elevation] from the datum down to the deepest test, for plotting. */
  line: [[number, number], [number, number]];
}

export type UndrainedStrengthResult = ConstantSuResult | LinearSuResult;

/**
 * Undrained shear strength su from UU triaxial tests (su = q/2, the radius of the total-stress Mohr
 * circle; ASTM D2850) or field vane tests (ASTM D2573), as a constant (mean with sample standard
 * deviation) or as a line with depth, returned in the engine's `undrained` fields.
 * @throws LabInputError, e.g. "test 2: deviator stress must be positive".
 */
export function deriveUndrainedStrength(input: UndrainedStrengthInput): UndrainedStrengthResult {
  const problems = new ProblemList();
  const tests = input.tests ?? [];
  const needPosition = input.model === "linear";
  if (input.source !== "uu" && input.source !== "vane")
    problems.add("input", "source", "source must be 'uu' or 'vane'");
  if (input.model !== "constant" && input.model !== "linear")
    problems.add("input", "model", "model must be 'constant' or 'linear'");
  if (tests.length < (needPosition ? 2 : 1))
    problems.add("input", "tests", `at least ${needPosition ? 2 : 1} tests are needed, got ${tests.length}`);
  const correction = input.source === "vane" ? vaneCorrectionOf(input, problems) : undefined;
  const factor = correction?.factor ?? 1;
  if (input.groundElevation !== undefined)
    problems.requireFinite("input", "groundElevation", "ground elevation", input.groundElevation);
  if (input.datumElevation !== undefined)
    problems.requireFinite("input", "datumElevation", "datum elevation", input.datumElevation);

  const points: UndrainedPoint[] = tests.map((t, i) => {
    const where = describeRow(t, i);
    let su = 0;
    if (input.source === "uu") {
      if (problems.requirePositive(where, "deviatorStress", "deviator stress", t.deviatorStress))
        su = (t.deviatorStress as number) / 2;
    } else if (problems.requirePositive(where, "su", "vane su", t.su)) {
      su = (t.su as number) * factor;
    }
    const elevation = elevationOf(t, input.groundElevation, where, problems, needPosition);
    const point: UndrainedPoint = { su, elevation, index: i + 1 };
    if (input.source === "vane" && typeof t.su === "number") point.measuredSu = t.su;
    if (t.id !== undefined) point.id = t.id;
    if (t.specimen !== undefined) point.specimen = t.specimen;
    return point;
  });
  problems.throwIfAny();

  const common = { n: tests.length, points, sourceIds: collectSourceIds(tests) };
  const result = input.model === "constant" ? constantSu(common) : linearSu(common, input, problems);
  if (!correction) return result;
  result.vaneCorrection = correction;
  if (correction.basis === "bjerrum" && correction.factor > 1)
    result.warnings.push(
      `Bjerrum's μ is ${correction.factor.toFixed(2)} at PI ${correction.plasticityIndex} %: ` +
        "it raises the vane strength; many designers take μ no higher than 1",
    );
  return result;
}

/** The correction the user chose for vane readings: none, a typed factor, or Bjerrum's μ(PI). */
function vaneCorrectionOf(input: UndrainedStrengthInput, problems: ProblemList): VaneCorrection {
  const pi = input.vanePlasticityIndex;
  if (pi !== undefined && input.vaneCorrectionFactor !== undefined) {
    problems.add(
      "input",
      "vanePlasticityIndex",
      "give either a vane correction factor or the plasticity index for Bjerrum's μ, not both",
    );
    return { basis: "none", factor: 1 };
  }
  if (pi !== undefined) {
    const [lo, hi] = BJERRUM_PI_RANGE;
    const mu = bjerrumMu(pi);
    if (!Number.isFinite(mu)) {
      problems.add(
        "input",
        "vanePlasticityIndex",
        `plasticity index ${pi} % is outside Bjerrum's curve (PI ${lo} to ${hi} %): give a correction factor instead`,
      );
      return { basis: "none", factor: 1 };
    }
    return { basis: "bjerrum", factor: mu, plasticityIndex: pi };
  }
  if (input.vaneCorrectionFactor === undefined) return { basis: "none", factor: 1 };
  const ok = problems.requirePositive(
    "input",
    "vaneCorrectionFactor",
    "vane correction factor",
    input.vaneCorrectionFactor,
  );
  return ok ? { basis: "given", factor: input.vaneCorrectionFactor } : { basis: "none", factor: 1 };
}

function elevationOf(
  t: UndrainedTest,
  ground: number | undefined,
  where: string,
  problems: ProblemList,
  required: boolean,
): number | null {
  if (t.elevation !== undefined)
    return problems.requireFinite(where, "elevation", "elevation", t.elevation) ? t.elevation : null;
  if (t.depth !== undefined) {
    if (!problems.requireNonNegative(where, "depth", "depth", t.depth)) return null;
    if (ground !== undefined && Number.isFinite(ground)) return ground - t.depth;
    if (required) problems.add(where, "depth", "depth is given but no ground elevation to turn it into an elevation");
    return null;
  }
  if (required) problems.add(where, "elevation", "an elevation or a depth is needed for su varying with depth");
  return null;
}

function constantSu(common: Omit<CommonResult, "engineFields" | "warnings">): ConstantSuResult {
  const values = common.points.map((p) => p.su);
  const n = values.length;
  const mean = values.reduce((s, v) => s + v, 0) / n;
  const sd = n > 1 ? Math.sqrt(values.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1)) : null;
  const warnings: string[] = [];
  if (n < 3) warnings.push(`only ${n} test${n === 1 ? "" : "s"}: 3 or more are recommended`);
  if (sd !== null && sd / mean > 0.3)
    warnings.push(`su varies widely (CoV ${(sd / mean).toFixed(2)}): consider su rising with depth or a lower value`);
  return {
    model: "constant",
    su: mean,
    standardDeviation: sd,
    coefficientOfVariation: sd === null ? null : sd / mean,
    engineFields: { su: mean },
    ...common,
    warnings,
  };
}

function linearSu(
  common: Omit<CommonResult, "engineFields" | "warnings">,
  input: UndrainedStrengthInput,
  problems: ProblemList,
): LinearSuResult {
  const elevations = common.points.map((p) => p.elevation as number);
  if (new Set(elevations).size < 2) {
    problems.add("input", "tests", "the tests need at least 2 different elevations to fit su against depth");
    problems.throwIfAny();
  }
  const fit = fitLine(
    elevations,
    common.points.map((p) => p.su),
  );
  const top = Math.max(...elevations);
  const bottom = Math.min(...elevations);
  const datum = input.datumElevation ?? input.groundElevation ?? top;
  const suAtDatum = fit.intercept + fit.slope * datum;
  const gradient = -fit.slope;
  if (!(suAtDatum > 0)) {
    problems.add(
      "input",
      "datumElevation",
      `the fitted su at the datum (${datum.toFixed(2)} m) is ${suAtDatum.toFixed(1)} kPa: choose a lower datum or a constant su`,
    );
    problems.throwIfAny();
  }
  const warnings: string[] = [];
  if (common.n < 3) warnings.push(`only ${common.n} tests: 3 or more are recommended`);
  if (gradient < 0)
    warnings.push("su falls with depth in these tests; the engine's model expects it to rise: consider a constant su");
  if (datum < top)
    warnings.push(
      `the datum (${datum.toFixed(2)} m) is below the highest test (${top.toFixed(2)} m): above the datum the engine holds su constant`,
    );
  const lowest = Math.min(bottom, datum);
  return {
    model: "linear",
    su: suAtDatum,
    suGradient: gradient,
    suDatum: datum,
    fit,
    line: [
      [suAtDatum, datum],
      [suAtDatum + gradient * (datum - lowest), lowest],
    ],
    engineFields: { su: suAtDatum, suGradient: gradient, suDatum: datum },
    ...common,
    warnings,
  };
}
