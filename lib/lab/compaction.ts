import { evaluatePolynomial, fitPolynomial, type PolynomialFit } from "./least-squares";
import {
  LabInputError,
  ProblemList,
  collectSourceIds,
  describeRow,
  sourcedPoint,
  type LabRowRef,
  type SourcedPoint,
} from "./lab-input";

/** Standard gravity (m/s²) and unit weight of water (kN/m³) used for unit weights. */
export const GRAVITY = 9.81;
export const UNIT_WEIGHT_WATER = 9.81;
/** Density of water (Mg/m³). */
export const WATER_DENSITY = 1.0;

/** One compaction point: moisture content w (%) with dry density, or bulk density (Mg/m³). */
export interface CompactionPoint extends LabRowRef {
  moistureContent: number;
  dryDensity?: number;
  /** Bulk (wet) density; converted with ρd = ρ/(1 + w). Ignored when dryDensity is given. */
  bulkDensity?: number;
}

export interface CompactionInput {
  points: CompactionPoint[];
  /** Specific gravity of the solids Gs; default 2.70. */
  specificGravity?: number;
  /** Acceptance density as a percentage of the maximum dry density; default 95. */
  acceptancePercent?: number;
}

export interface AcceptanceLimit {
  /** Moisture content (%) where the fitted curve crosses the acceptance density. */
  moistureContent: number;
  /** True when the crossing lies outside the tested moisture range (read from the curve's extension). */
  extrapolated: boolean;
}

export interface CompactionResult {
  /** Maximum dry density (Mg/m³) and optimum moisture content (%) at the peak of the fitted curve. */
  maxDryDensity: number;
  optimumMoistureContent: number;
  /** Quadratic y = c0 + c1·w + c2·w² fitted to the peak point and up to two points either side. */
  curveFit: PolynomialFit;
  /** 1-based input positions of the points used for the curve. */
  curveSourceIndexes: number[];
  acceptance: { percent: number; dryDensity: number; dryLimit: AcceptanceLimit; wetLimit: AcceptanceLimit };
  /** Sampled fitted curve, [w %, ρd Mg/m³][], over the tested range and the acceptance window. */
  curve: [number, number][];
  /** Zero-air-voids line ρd = Gs·ρw/(1 + w·Gs) over the same range, [w %, ρd][]. */
  zeroAirVoids: [number, number][];
  specificGravity: number;
  /** Unit weights at the optimum (kN/m³): bulk γ = ρd(1 + w)·g; γsat = (Gs + e)·γw/(1 + e). */
  unitWeight: number;
  saturatedUnitWeight: number;
  /** Void ratio e = Gs·ρw/ρd − 1 and degree of saturation Sr = w·Gs/e at the optimum. */
  voidRatio: number;
  degreeOfSaturation: number;
  /** x = w (%), y = ρd (Mg/m³), sorted by w. */
  points: SourcedPoint[];
  sourceIds: string[];
  warnings: string[];
}

/** Dry density on the zero-air-voids line (Mg/m³) at moisture content w (%) for solids of Gs. */
export function zeroAirVoidsDensity(moisturePercent: number, specificGravity: number): number {
  return (specificGravity * WATER_DENSITY) / (1 + (moisturePercent / 100) * specificGravity);
}

/**
 * Reads a compaction curve (ASTM D698 / D1557 definitions: the maximum dry unit weight and optimum
 * water content are the peak of the curve through the points; Craig's Soil Mechanics, ch. 1).
 *
 * Assumptions: the curve is a least-squares quadratic through the densest point and up to two points
 * on each side (a parabola is the usual local shape near the peak); the peak must be bracketed by
 * drier and wetter points; acceptance limits are the quadratic's crossings of p % of the maximum and
 * are flagged `extrapolated` outside the tested range; ρw = 1.0 Mg/m³, g = 9.81 m/s²,
 * γw = 9.81 kN/m³; the saturated unit weight assumes the compacted void ratio is kept.
 * @throws LabInputError, e.g. "test 4: dry density must be positive".
 */
export function deriveCompactionCurve(input: CompactionInput): CompactionResult {
  const problems = new ProblemList();
  const gs = input.specificGravity ?? 2.7;
  const percent = input.acceptancePercent ?? 95;
  const raw = input.points ?? [];
  if (raw.length < 3) problems.add("input", "points", `at least 3 points are needed, got ${raw.length}`);
  if (problems.requirePositive("input", "specificGravity", "specific gravity", gs) && (gs < 2 || gs > 3.2)) {
    problems.add("input", "specificGravity", `specific gravity ${gs} is outside 2.0–3.2`);
  }
  if (problems.requirePositive("input", "acceptancePercent", "acceptance percentage", percent) && percent >= 100) {
    problems.add("input", "acceptancePercent", "acceptance percentage must be below 100");
  }
  const warnings: string[] = [];
  const rows = raw.map((p, i) => {
    const rho = dryDensityOf(p, describeRow(p, i), problems, warnings);
    // A value in kg/m³ or t/m³ typed by mistake is caught here rather than as a bad Gs later.
    if (rho > 3)
      problems.add(
        describeRow(p, i),
        "dryDensity",
        `dry density ${rho.toFixed(3)} is not plausible in Mg/m³ (enter e.g. 1.85, not 1850)`,
      );
    return { p, i, rho };
  });
  problems.throwIfAny();

  rows.sort((a, b) => a.p.moistureContent - b.p.moistureContent);
  if (new Set(rows.map((r) => r.p.moistureContent)).size !== rows.length)
    fail("points", "two points have the same moisture content: merge or remove one");
  const peak = rows.reduce((best, r, k) => (r.rho > rows[best].rho ? k : best), 0);
  if (peak === 0) fail("points", "the densest point is the driest: the peak is not bracketed; add a drier test");
  if (peak === rows.length - 1)
    fail("points", "the densest point is the wettest: the peak is not bracketed; add a wetter test");
  if (rows.length < 4)
    warnings.push(`only ${rows.length} points: 4 or more (two on each side of the optimum) are usual`);

  const local = rows.slice(Math.max(0, peak - 2), peak + 3);
  const curveFit = fitPolynomial(
    local.map((r) => r.p.moistureContent),
    local.map((r) => r.rho),
    2,
  );
  const [c0, c1, c2] = curveFit.coefficients;
  if (!(c2 < 0)) fail("points", "the points near the peak do not form a curve that opens downward");
  const wOpt = -c1 / (2 * c2);
  const rhoMax = evaluatePolynomial(curveFit.coefficients, wOpt);
  const wMin = rows[0].p.moistureContent;
  const wMax = rows[rows.length - 1].p.moistureContent;

  const target = (percent / 100) * rhoMax;
  const half = Math.sqrt((c1 * c1 - 4 * c2 * (c0 - target)) / (c2 * c2)) / 2;
  const limit = (w: number): AcceptanceLimit => ({ moistureContent: w, extrapolated: w < wMin || w > wMax });
  const dryLimit = limit(wOpt - half);
  const wetLimit = limit(wOpt + half);
  if (dryLimit.extrapolated)
    warnings.push(
      `the dry-side limit (${dryLimit.moistureContent.toFixed(1)} %) lies outside the tested range: test a drier point to confirm it`,
    );
  if (wetLimit.extrapolated)
    warnings.push(
      `the wet-side limit (${wetLimit.moistureContent.toFixed(1)} %) lies outside the tested range: test a wetter point to confirm it`,
    );

  rows.forEach((r) => {
    if (r.rho > zeroAirVoidsDensity(r.p.moistureContent, gs) * 1.001) {
      warnings.push(
        `${describeRow(r.p, r.i)} plots above the zero-air-voids line for Gs = ${gs}: check Gs, w or the density`,
      );
    }
  });

  const lo = Math.min(wMin, dryLimit.moistureContent);
  const hi = Math.max(wMax, wetLimit.moistureContent);
  const sample = (f: (w: number) => number): [number, number][] =>
    Array.from({ length: 41 }, (_, k) => {
      const w = lo + ((hi - lo) * k) / 40;
      return [w, f(w)];
    });
  const voidRatio = (gs * WATER_DENSITY) / rhoMax - 1;
  if (!(voidRatio > 0))
    fail("points", `the maximum dry density ${rhoMax.toFixed(3)} Mg/m³ is not below Gs·ρw: check Gs`);

  return {
    maxDryDensity: rhoMax,
    optimumMoistureContent: wOpt,
    curveFit,
    curveSourceIndexes: local.map((r) => r.i + 1),
    acceptance: { percent, dryDensity: target, dryLimit, wetLimit },
    curve: sample((w) => evaluatePolynomial(curveFit.coefficients, w)),
    zeroAirVoids: sample((w) => zeroAirVoidsDensity(w, gs)),
    specificGravity: gs,
    unitWeight: rhoMax * (1 + wOpt / 100) * GRAVITY,
    saturatedUnitWeight: ((gs + voidRatio) * UNIT_WEIGHT_WATER) / (1 + voidRatio),
    voidRatio,
    degreeOfSaturation: ((wOpt / 100) * gs) / voidRatio,
    points: rows.map((r) => sourcedPoint(r.p, r.i, r.p.moistureContent, r.rho)),
    sourceIds: collectSourceIds(raw),
    warnings,
  };
}

function fail(field: string, message: string): never {
  throw new LabInputError([{ where: "input", field, message }]);
}

function dryDensityOf(p: CompactionPoint, where: string, problems: ProblemList, warnings: string[]): number {
  if (!problems.requireNonNegative(where, "moistureContent", "moisture content", p.moistureContent)) return 0;
  if (p.dryDensity !== undefined) {
    if (!problems.requirePositive(where, "dryDensity", "dry density", p.dryDensity)) return 0;
    if (p.bulkDensity !== undefined && Number.isFinite(p.bulkDensity)) {
      const implied = p.bulkDensity / (1 + p.moistureContent / 100);
      if (Math.abs(implied - p.dryDensity) > 0.005 * p.dryDensity)
        warnings.push(
          `${where}: bulk density and moisture content imply ρd = ${implied.toFixed(3)} Mg/m³, not the ${p.dryDensity} given; the dry density was used`,
        );
    }
    return p.dryDensity;
  }
  if (p.bulkDensity === undefined) {
    problems.add(where, "dryDensity", "dry density or bulk density is needed");
    return 0;
  }
  if (!problems.requirePositive(where, "bulkDensity", "bulk density", p.bulkDensity)) return 0;
  return p.bulkDensity / (1 + p.moistureContent / 100);
}
