/**
 * One given circle, reported slice by slice (docs/engine-io.md "Output of one circle"). It runs
 * the same evaluator as the grid search, so a stored critical circle re-checks to exactly
 * the same factor of safety.
 */
import { evaluateCircle, sliceMass } from "./evaluate-circle";
import type { EngineWarning } from "./issues";
import { fmt } from "./issues";
import { ordinaryNormal } from "./methods/ordinary";
import { prepareSection, type PreparedSection } from "./prepare";
import { finiteOrNull, issuesToWarnings, type Circle, type EngineFailure } from "./results";
import { createScratch, type Scratch } from "./scratch";
import { M_ALPHA_WARN } from "./search-warnings";
import { OK, REASONS, REASON_TEXT, RIGID_NO_WEIGHT, rigidNoWeightText } from "./status";
import { validateSection } from "./validate";
import { ENGINE_VERSION } from "./version";
import type { AnalysisFsRecord, LambdaRecord, RigorousRecord } from "./rigorous-types";
import { circleRigorous } from "./rigorous-circle";
import { arcY } from "./evaluate-circle";
import { checkWaterField, type WaterFieldOptions } from "./water-field";
import { resolveAnalysis } from "./defaults";
import { replayStagedMass } from "./drawdown/staged-circle";
import { sliceStage, stageSummary, stageWarnings, type SliceStage, type StageFs } from "./drawdown/staged-report";

/** One slice of the governing slip mass. Forces kN/m, pressures kPa, lengths m, angles °. */
export interface SliceRow {
  xLeft: number;
  xRight: number;
  /** Soil weight W. */
  weight: number;
  /** Ponded water on top (vertical) and its horizontal thrust, positive in the sliding direction. */
  pondedLoad: number;
  waterThrust: number;
  surcharge: number;
  seismicForce: number;
  /** Base angle, positive where the base falls in the direction of sliding. */
  alpha: number;
  baseLength: number;
  baseY: number;
  porePressure: number;
  material: string;
  c: number;
  phi: number;
  /** Driving term V·sin α + ΣH·(yc − y)/R. */
  driving: number;
  mAlpha: number | null;
  normalBishop: number | null;
  resistingBishop: number | null;
  normalOrdinary: number;
  resistingOrdinary: number;
  /**
   * Staged drawdown only (docs/engine.md §7(b)): the base's stage-1 stresses, strengths and the
   * strength that governs in the final stage. c, phi and the Bishop and ordinary terms above
   * then show the final-stage strengths of Bishop's chain (of the ordinary method's chain
   * when Bishop has no result).
   */
  stage?: SliceStage;
}

export interface CircleSuccess {
  ok: true;
  engineVersion: string;
  circle: Circle;
  /** Bishop and the ordinary method always; Spencer and Morgenstern–Price when analysis.methods asks. */
  fs: { bishop: number | null; fellenius: number | null } & AnalysisFsRecord;
  /** λ beside fs for Spencer and Morgenstern–Price (docs/engine-io.md). */
  lambda?: LambdaRecord;
  /** Their full solutions: interslice forces, line of thrust, warnings with their place. */
  rigorous?: RigorousRecord;
  reason?: string;
  reasonText?: string;
  entry?: [number, number];
  exit?: [number, number];
  direction?: "left" | "right";
  masses: number;
  ordinaryForm: string;
  iterations?: number;
  minMAlpha?: number | null;
  drivingSum?: number;
  /** Staged drawdown only: the factor of safety of each stage per method; `fs` holds the final ones. */
  stages?: { bishop: StageFs | null; fellenius: StageFs | null };
  /** Staged drawdown only: the procedure used. */
  stagedVariant?: "three-stage" | "usace-two-stage";
  slices: SliceRow[];
  warnings: EngineWarning[];
}

export type CircleResult = CircleSuccess | EngineFailure;

/**
 * Analyses one circle (xc, yc, r in m) of a section document by both methods.
 * @returns FS per method (null with a reason when the circle is invalid) and the slice table
 */
export function analyzeCircle(doc: unknown, circle: Circle, opts: WaterFieldOptions = {}): CircleResult {
  const v = validateSection(doc);
  if (!v.ok) return v;
  const analysis = resolveAnalysis(v.section.analysis);
  const noField = checkWaterField(v.section, analysis.case, opts.waterField);
  if (noField.length > 0) return { ok: false, errors: noField, warnings: v.warnings };
  const P = prepareSection(v.section, analysis, opts.waterField);
  const S = createScratch(true);
  const c: Circle = { xc: circle.xc, yc: circle.yc, r: circle.r };
  const warnings: EngineWarning[] = [...issuesToWarnings(v.warnings), ...P.warnings];
  const base = {
    ok: true as const,
    engineVersion: ENGINE_VERSION,
    circle: c,
    ordinaryForm: P.analysis.ordinaryForm,
    warnings,
  };
  if (![c.xc, c.yc, c.r].every(Number.isFinite)) {
    return {
      ...base,
      fs: { bishop: null, fellenius: null, ...noRigorous(P) },
      reason: "radius-not-positive",
      reasonText: "The circle needs finite xc, yc and r.",
      masses: 0,
      slices: [],
    };
  }
  const st = evaluateCircle(P, S, c.xc, c.yc, c.r, true);
  if (st !== OK) {
    return {
      ...base,
      fs: { bishop: null, fellenius: null, ...noRigorous(P) },
      reason: REASONS[st],
      reasonText: st === RIGID_NO_WEIGHT ? rigidNoWeightText(P.mat.ids[S.rigidMat]) : REASON_TEXT[st],
      masses: S.nMass,
      slices: [],
    };
  }
  const fsB = S.fsB;
  const fsO = S.fsO;
  const reasonB = S.reasonB;
  const iterations = S.iterations;
  const minMa = S.minMa;
  const minMaX = S.minMaX;
  const minMaAlpha = S.minMaAlpha;
  const negO = S.negO;
  const negB = S.negB;
  const m = S.govB >= 0 ? S.govB : S.govO;
  const dir = S.govB >= 0 ? S.dirB : S.dirO;
  const staged = P.staged !== null ? stagedPart(P, S, c, m, dir, warnings) : null;
  if (!staged) sliceMass(P, S, c.xc, c.yc, c.r, m, dir);
  const slices = sliceRows(P.mat.ids, S, fsB, P.ordinaryForm === 1);
  if (staged) for (let i = 0; i < slices.length; i++) slices[i].stage = sliceStage(P, S, i, staged.bishop);
  const xa = S.massA[m];
  const xb = S.massB[m];
  const a: [number, number] = [xa, arcY(c.xc, c.yc, c.r, xa)];
  const b: [number, number] = [xb, arcY(c.xc, c.yc, c.r, xb)];
  if (Number.isFinite(fsB) && minMa < M_ALPHA_WARN) {
    warnings.push({
      code: "m-alpha-low",
      message: `mα falls to ${minMa.toFixed(3)} (below ${M_ALPHA_WARN}) at x = ${fmt(minMaX)} m, base angle ${minMaAlpha.toFixed(1)}°: exit too steep; move the circle or check with a method that satisfies force equilibrium.`,
    });
  }
  if (negO > 0)
    warnings.push({
      code: "negative-normal",
      message: `Ordinary method: N′ came out negative on ${negO} ${negO === 1 ? "slice" : "slices"} and was set to zero.`,
    });
  if (Number.isFinite(fsB) && negB > 0)
    warnings.push({
      code: "negative-normal",
      message: `Bishop's simplified method: N′ came out negative on ${negB} ${negB === 1 ? "slice" : "slices"}; their shear strength is c′·l only.`,
    });
  if (S.nMass > 1)
    warnings.push({
      code: "several-slip-masses",
      message: `The circle cuts ${S.nMass} separate pieces of soil; each was analysed and the lowest FS is reported. The slices shown are those of the governing piece.`,
    });
  const rig = rigorousPart(P, S, c, warnings);
  return {
    ...base,
    fs: { bishop: finiteOrNull(fsB), fellenius: finiteOrNull(fsO), ...(rig?.fs ?? {}) },
    ...(rig ? { lambda: rig.lambda, rigorous: rig.rigorous } : {}),
    ...(Number.isFinite(fsB) ? {} : { reason: REASONS[reasonB], reasonText: REASON_TEXT[reasonB] }),
    entry: dir >= 0 ? a : b,
    exit: dir >= 0 ? b : a,
    direction: dir >= 0 ? "right" : "left",
    masses: S.nMass,
    iterations,
    minMAlpha: finiteOrNull(minMa),
    drivingSum: S.D,
    ...(staged ? { stages: staged.stages, stagedVariant: staged.variant } : {}),
    slices,
  };
}

/** null for each rigorous method asked for: a circle without a slip mass has no factor. */
function noRigorous(P: PreparedSection): AnalysisFsRecord {
  const out: AnalysisFsRecord = {};
  for (const m of P.analysis.rigorous) out[m] = null;
  return out;
}

/**
 * Spencer and Morgenstern–Price on the circle, when asked for (after the slice table, since they
 * re-slice). A staged drawdown has no rigorous form here: null with a warning.
 */
function rigorousPart(P: PreparedSection, S: Scratch, c: Circle, warnings: EngineWarning[]) {
  const methods = P.analysis.rigorous;
  if (methods.length === 0) return null;
  if (P.staged !== null) {
    warnings.push({
      code: "rigorous-not-staged",
      message: "Spencer and Morgenstern–Price are not run in a staged drawdown; use the effective-stress drawdown.",
    });
    return { fs: noRigorous(P), lambda: noRigorous(P), rigorous: {} };
  }
  const r = circleRigorous(P, S, c, methods, P.analysis.interslice);
  warnings.push(...r.warnings);
  return r;
}

/**
 * Stage factors of the evaluated circle, then a replay of the governing mass that leaves its
 * final-stage strengths and stage data in S for the slice table.
 */
function stagedPart(P: PreparedSection, S: Scratch, c: Circle, m: number, dir: number, warnings: EngineWarning[]) {
  const bishop = S.govB >= 0;
  const stages = {
    bishop: bishop ? stageSummary(S.stage.govB) : null,
    fellenius: S.govO >= 0 ? stageSummary(S.stage.govO) : null,
  };
  stageWarnings("bishop", stages.bishop, "this circle", warnings);
  stageWarnings("fellenius", stages.fellenius, "this circle", warnings);
  replayStagedMass(P, S, c.xc, c.yc, c.r, m, dir, bishop);
  const variant: "three-stage" | "usace-two-stage" = P.analysis.drawdown?.stagedVariant ?? "three-stage";
  return { bishop, stages, variant };
}

/** Per-slice table of the mass now in S, with Bishop terms at its converged F. */
function sliceRows(ids: string[], S: Scratch, fsB: number, eff: boolean): SliceRow[] {
  const rows: SliceRow[] = [];
  const hasB = Number.isFinite(fsB);
  for (let i = 0; i < S.n; i++) {
    const tp = S.tanPhi[i];
    const b = S.bb[i];
    const l = S.len[i];
    const c = S.c[i];
    const nO = tp === 0 ? 0 : ordinaryNormal(S, i, eff);
    let ma: number | null = null;
    let nB: number | null = null;
    let sB: number | null = null;
    if (hasB) {
      // FS = 0 only when no slice has strength; then the strength terms vanish.
      const inv = fsB > 0 ? 1 / fsB : 0;
      ma = S.cosA[i] + S.sinA[i] * tp * inv;
      const p = S.V[i] - S.u[i] * b;
      const n = (p - (c * b * S.sinA[i] * inv) / S.cosA[i]) / ma;
      nB = tp === 0 ? null : Math.max(0, n);
      sB = tp === 0 || n < 0 ? c * l : (c * b + p * tp) / ma;
    }
    rows.push({
      xLeft: S.xL[i],
      xRight: S.xR[i],
      weight: S.W[i],
      pondedLoad: S.Ww[i],
      waterThrust: S.Fw[i],
      surcharge: S.Q[i],
      seismicForce: S.Hs[i],
      alpha: (Math.atan2(S.sinA[i], S.cosA[i]) * 180) / Math.PI,
      baseLength: l,
      baseY: S.ym[i],
      porePressure: S.uRaw[i],
      material: ids[S.mat[i]] ?? "",
      c,
      phi: (Math.atan(tp) * 180) / Math.PI,
      driving: S.dD[i],
      mAlpha: ma,
      normalBishop: nB,
      resistingBishop: sB,
      normalOrdinary: nO,
      resistingOrdinary: c * l + nO * tp,
    });
  }
  return rows;
}
