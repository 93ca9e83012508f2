/**
 * One slip surface given as a polyline (`--surface`, docs/engine-io.md "Methods and slip surfaces of
 * any shape"): every method asked for, Bishop and the ordinary method null with `circular-only`,
 * Spencer and Morgenstern–Price with λ, interslice forces and the line of thrust; the slice table.
 */
import { groundAt } from "../ground";
import type { EngineWarning } from "../issues";
import { prepareSection, type PreparedSection } from "../prepare";
import type { WaterFieldOptions } from "../water-field";
import { issuesToWarnings, type EngineFailure } from "../results";
import { rigorousReport } from "../rigorous-report";
import type {
  AnalysisFsRecord,
  LambdaRecord,
  MethodReason,
  RigorousRecord,
  SurfaceSliceRow,
  SurfaceSuccess,
  XY,
} from "../rigorous-types";
import type { AnalysisMethod } from "../schema";
import {
  M_ALPHA,
  NO_MASS,
  NOT_CONVERGED,
  OK,
  OUT_OF_SECTION,
  REASONS,
  REASON_TEXT,
  RIGID,
  RIGID_NO_WEIGHT,
  TOO_MANY_BREAKS,
  rigidNoWeightText,
} from "../status";
import { validateSection } from "../validate";
import { ENGINE_VERSION } from "../version";
import { checkSurface } from "./check-surface";
import { createSurfaceEvaluator, surfaceDirection, type SurfaceEvaluator } from "./evaluate-surface";
import { evaluateSurface } from "./evaluate-surface";
import { ABOVE_GROUND, sliceSurface, type SurfaceSlices } from "./slice-surface";

export type SurfaceResult = SurfaceSuccess | EngineFailure;

export const CIRCULAR_ONLY: MethodReason = {
  reason: "circular-only",
  reasonText: "This method assumes a circular slip surface (moment equilibrium about its centre).",
};

/** Texts of the slicing statuses whose circle wording does not fit a surface of any shape. */
const SURFACE_TEXT: Readonly<Record<number, string>> = {
  [NO_MASS]: "The slip surface does not cut the ground: there is no slip mass.",
  [OUT_OF_SECTION]:
    "The slip mass reaches a side of the section, or the slip surface leaves the bottom of the regions.",
  [RIGID]: "The slip surface enters impenetrable material.",
  [TOO_MANY_BREAKS]: "The section is too detailed under this slip surface (too many slice breaks).",
};

/** The reason name and text of a slicing status. */
export function sliceReason(P: PreparedSection, st: number, E: SurfaceEvaluator): MethodReason {
  if (st === ABOVE_GROUND)
    return { reason: "above-ground", reasonText: "The slip surface passes above the ground between its ends." };
  if (st === RIGID_NO_WEIGHT) return { reason: REASONS[st], reasonText: rigidNoWeightText(P.mat.ids[E.B.rigidMat]) };
  return { reason: REASONS[st] ?? "invalid", reasonText: SURFACE_TEXT[st] ?? REASON_TEXT[st] };
}

/** Analyses the slip surface `points` ([x, y] in m, from one ground point to another) of a section document. */
export function analyzeSurface(
  doc: unknown,
  points: ReadonlyArray<readonly [number, number]>,
  opts: WaterFieldOptions = {},
): SurfaceResult {
  const v = validateSection(doc);
  if (!v.ok) return v;
  const P = prepareSection(v.section, undefined, opts.waterField);
  const warnings: EngineWarning[] = [...issuesToWarnings(v.warnings), ...P.warnings];
  const methods = P.analysis.allMethods;
  const fs: AnalysisFsRecord = {};
  const lambda: LambdaRecord = {};
  const reasons: Partial<Record<AnalysisMethod, MethodReason>> = {};
  for (const m of methods) fs[m] = null;
  for (const m of P.analysis.rigorous) lambda[m] = null;
  const base = { ok: true as const, engineVersion: ENGINE_VERSION, fs, lambda, reasons, warnings };
  const checked = checkSurface(P, points);
  const given: XY[] = points.map((p) => [p[0], p[1]]);
  if (!checked.ok) {
    for (const m of methods) reasons[m] = { reason: checked.reason, reasonText: checked.reasonText };
    return { ...base, surface: given, ...refusal(checked), slices: [], rigorous: {} };
  }
  const { px, py } = checked;
  const surface: XY[] = Array.from(px, (x, i) => [x, py[i]] as XY);
  for (const m of methods) if (m === "bishop" || m === "fellenius") reasons[m] = CIRCULAR_ONLY;
  const E = createSurfaceEvaluator();
  const rigorous: RigorousRecord = {};
  let dir = surfaceDirection(P, py) || 1;
  const halfSine = P.analysis.interslice === "half-sine";
  const geo = (d: number) => ({
    dir: d,
    baseAt: (x: number) => interpolate(px, py, x),
    topAt: (x: number) => groundAt(P.ground, x),
  });
  for (const m of P.analysis.rigorous) {
    if (P.staged !== null) {
      reasons[m] = { reason: "rigorous-not-staged", reasonText: "Not run in a staged drawdown." };
      continue;
    }
    const f = evaluateSurface(P, E, px, py, m, halfSine);
    if (E.status !== OK && E.status !== NOT_CONVERGED && E.status !== M_ALPHA) {
      const why = sliceReason(P, E.status, E);
      for (const k of methods) reasons[k] = why;
      return { ...base, surface, reason: why.reason, reasonText: why.reasonText, at: atOf(E.B), slices: [], rigorous };
    }
    dir = E.dir;
    const rep = rigorousReport(E.G, m, P.analysis.interslice, geo(E.dir));
    rigorous[m] = rep;
    fs[m] = Number.isFinite(f) ? f : null;
    lambda[m] = rep.lambda;
    if (rep.reason) reasons[m] = { reason: rep.reason, reasonText: rep.reasonText ?? "" };
    warnings.push(...rep.warnings.map((w) => ({ code: w.code, message: w.message })));
  }
  const st = sliceSurface(P, E.B, px, py, dir);
  if (st !== OK) {
    const why = sliceReason(P, st, E);
    for (const k of methods) reasons[k] = why;
    return { ...base, surface, reason: why.reason, reasonText: why.reasonText, at: atOf(E.B), slices: [], rigorous };
  }
  const a: XY = [px[0], py[0]];
  const b: XY = [px[px.length - 1], py[py.length - 1]];
  return {
    ...base,
    surface,
    entry: dir > 0 ? a : b,
    exit: dir > 0 ? b : a,
    direction: dir > 0 ? "right" : "left",
    slices: sliceRows(P, E.B, dir),
    rigorous,
  };
}

function refusal(r: { reason: string; reasonText: string; at: XY | null }) {
  return { reason: r.reason, reasonText: r.reasonText, at: r.at };
}

function atOf(B: SurfaceSlices): XY | null {
  return Number.isFinite(B.atX) ? [B.atX, B.atY] : null;
}

/** Elevation of polyline (px, py) at x (clamped to its ends). */
export function interpolate(px: ArrayLike<number>, py: ArrayLike<number>, x: number): number {
  const n = px.length;
  if (x <= px[0]) return py[0];
  if (x >= px[n - 1]) return py[n - 1];
  let i = 0;
  while (px[i + 1] < x) i++;
  return py[i] + ((py[i + 1] - py[i]) * (x - px[i])) / (px[i + 1] - px[i]);
}

/** The slice table; α is positive where the base falls in the sliding direction, as for circles. */
function sliceRows(P: PreparedSection, B: SurfaceSlices, dir: number): SurfaceSliceRow[] {
  const rows: SurfaceSliceRow[] = [];
  for (let i = 0; i < B.n; i++) {
    const b = B.xr[i] - B.xl[i];
    rows.push({
      xLeft: B.xl[i],
      xRight: B.xr[i],
      weight: B.W[i],
      pondedLoad: B.Ww[i],
      waterThrust: B.Fw[i],
      surcharge: B.Q[i],
      seismicForce: B.Hs[i],
      alpha: (Math.atan(-dir * B.slope[i]) * 180) / Math.PI,
      baseLength: b * Math.sqrt(1 + B.slope[i] * B.slope[i]),
      baseY: B.ym[i],
      porePressure: B.uRaw[i],
      material: P.mat.ids[B.mat[i]] ?? "",
      c: B.c[i],
      phi: (Math.atan(B.tp[i]) * 180) / Math.PI,
    });
  }
  return rows;
}
