/**
 * The grid search of circular slip surfaces (docs/engine.md §5, docs/engine-io.md "Output of a grid
 * search"): nx × ny centres, radii by tangent elevations or a radius range, each method's
 * own critical circle, the minimum-FS map over centres, the N lowest circles, counts of
 * circles tried / valid / rejected by reason, warnings, optional refinement, and a
 * progress callback that can cancel. Synchronous and deterministic.
 */
import { resolveAnalysis } from "./defaults";
import { evaluateCircle } from "./evaluate-circle";
import type { EngineWarning } from "./issues";
import { prepareSection } from "./prepare";
import { refineFrom } from "./refine";
import {
  describeCircle,
  finiteOrNull,
  issuesToWarnings,
  type CircleFs,
  type EngineFailure,
  type FsMap,
  type MethodRecord,
} from "./results";
import type {
  AnalysisMethod,
  Grid,
  IntersliceFunction,
  Method,
  Radii,
  RigorousMethod,
  SectionDocument,
} from "./schema";
import { createRigorousSearch, rigorousFailureWarnings } from "./rigorous-search";
import { createScratch } from "./scratch";
import { stageWarnings } from "./drawdown/staged-report";
import { createMethodState, localMinima, recordFs, type MethodState } from "./search-state";
import { criticalWarnings, gridEdgeWarnings } from "./search-warnings";
import { OK, REASONS, RIGID_NO_WEIGHT, TOO_MANY_BREAKS } from "./status";
import { validateSection } from "./validate";
import { checkSearchSettings } from "./validate-analysis";
import { ENGINE_VERSION } from "./version";

/** Options of a search run. */
export interface GridSearchOptions {
  /** Called about once per row of centres with the fraction done; return false to cancel. */
  onProgress?: (fraction: number) => boolean | void;
}

/** A completed (or cancelled) grid search; plain JSON. */
export interface GridSearchSuccess {
  ok: true;
  engineVersion: string;
  case: string;
  /** The circular methods run (their results are keyed by these names). */
  methods: Method[];
  /**
   * Spencer and Morgenstern–Price, when asked for: their results sit beside the circular methods'
   * in `results`, `fsMap` and `lowest`, each with its own critical circle and `lambda`.
   */
  rigorousMethods?: RigorousMethod[];
  /** The Morgenstern–Price interslice function, when that method ran. */
  interslice?: IntersliceFunction;
  ordinaryForm: string;
  results: MethodRecord<CircleFs | null>;
  fsMap: MethodRecord<FsMap>;
  lowest: MethodRecord<CircleFs[]>;
  circles: { tried: number; valid: number; rejected: Record<string, number> };
  warnings: EngineWarning[];
  cancelled: boolean;
  /** Staged drawdown only (docs/engine.md §7(b)): the procedure used; each circle's FS is its final stage's. */
  stagedVariant?: "three-stage" | "usace-two-stage";
}

export type GridSearchResult = GridSearchSuccess | EngineFailure;

/** Evenly spaced values from a to b (n ≥ 1 of them). */
function spaced(a: number, b: number, n: number): number[] {
  if (n <= 1) return [a];
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(a + ((b - a) * i) / (n - 1));
  return out;
}

/** Radius of radius index i for a centre at height yc. */
function radiusAt(radii: Radii, values: number[], yc: number, i: number): number {
  return "tangentY1" in radii ? yc - values[i] : values[i];
}

/**
 * Runs the grid search of a section document (validated here; a document with errors
 * returns them with ok: false).
 * @returns per-method critical circles (FS dimensionless, lengths m) and search statistics
 */
export function runGridSearch(doc: SectionDocument | unknown, opts: GridSearchOptions = {}): GridSearchResult {
  const v = validateSection(doc);
  if (!v.ok) return v;
  const missing = checkSearchSettings(v.section.analysis);
  if (missing.length > 0) return { ok: false, errors: missing, warnings: v.warnings };
  const analysis = resolveAnalysis(v.section.analysis);
  const grid = analysis.grid as Grid;
  const radii = analysis.radii as Radii;
  const P = prepareSection(v.section, analysis);
  const S = createScratch();
  const methods = analysis.methods;
  const askB = methods.includes("bishop");
  const rig = createRigorousSearch(P, grid.nx * grid.ny, analysis.lowestCount);
  // Bishop's factor is the rigorous methods' starting guess.
  const wantB = askB || rig !== null;
  const xs = spaced(grid.x1, grid.x2, grid.nx);
  const ys = spaced(grid.y1, grid.y2, grid.ny);
  const rv =
    "tangentY1" in radii ? spaced(radii.tangentY1, radii.tangentY2, radii.n) : spaced(radii.r1, radii.r2, radii.n);
  const cells = grid.nx * grid.ny;
  const states = methods.map((m) => createMethodState(m, cells, analysis.lowestCount));
  const stO = states.find((s) => s.method === "fellenius");
  const stB = states.find((s) => s.method === "bishop");
  const rejected: Record<string, number> = {};
  let tried = 0;
  let valid = 0;
  let cancelled = false;
  const weightless = new Set<string>();
  const visit = (xc: number, yc: number, r: number, cell: number, ix: number, iy: number, ir: number): boolean => {
    tried++;
    const st = evaluateCircle(P, S, xc, yc, r, wantB);
    if (st !== OK) {
      rejected[REASONS[st]] = (rejected[REASONS[st]] ?? 0) + 1;
      if (st === RIGID_NO_WEIGHT) weightless.add(P.mat.ids[S.rigidMat] ?? "?");
      return false;
    }
    if (askB && !(S.fsB > 0)) rejected[REASONS[S.reasonB]] = (rejected[REASONS[S.reasonB]] ?? 0) + 1;
    else valid++;
    if (stO) recordFs(stO, S.fsO, xc, yc, r, cell, ix, iy, ir);
    if (stB && S.fsB > 0) recordFs(stB, S.fsB, xc, yc, r, cell, ix, iy, ir);
    if (rig) rig.visit(S, xc, yc, r, cell, ix, iy, ir);
    return true;
  };
  const share = analysis.refine ? 0.8 : 1;
  for (let iy = 0; iy < grid.ny && !cancelled; iy++) {
    const yc = ys[iy];
    for (let ix = 0; ix < grid.nx; ix++) {
      const xc = xs[ix];
      for (let ir = 0; ir < rv.length; ir++) visit(xc, yc, radiusAt(radii, rv, yc, ir), iy * grid.nx + ix, ix, iy, ir);
    }
    if (opts.onProgress && opts.onProgress((share * (iy + 1)) / grid.ny) === false) cancelled = true;
  }
  const allStates = rig ? [...states, ...rig.states] : states;
  for (const M of allStates) {
    M.coarseIx = M.bestIx;
    M.coarseIy = M.bestIy;
    M.coarseIr = M.bestIr;
  }
  const fsOf = (m: AnalysisMethod) => (m === "bishop" ? S.fsB : m === "fellenius" ? S.fsO : rig ? rig.fsOf(m) : NaN);
  if (analysis.refine && !cancelled) cancelled = !refineAll(allStates, grid, rv, xs, ys, visit, fsOf, opts);
  if (!cancelled && opts.onProgress) opts.onProgress(1);
  const warnings: EngineWarning[] = [...issuesToWarnings(v.warnings), ...P.warnings];
  const results: MethodRecord<CircleFs | null> = {};
  const fsMap: MethodRecord<FsMap> = {};
  const lowest: MethodRecord<CircleFs[]> = {};
  for (const M of allStates) {
    const crit = Number.isFinite(M.bestFs)
      ? describeCircle(P, S, { xc: M.bestXc, yc: M.bestYc, r: M.bestR }, M.method)
      : null;
    results[M.method] = crit;
    fsMap[M.method] = { nx: grid.nx, ny: grid.ny, xs, ys, values: Array.from(M.map, finiteOrNull) };
    const list: CircleFs[] = [];
    for (let i = 0; i < M.lowest.n; i++) {
      const c = describeCircle(P, S, { xc: M.lowest.xc[i], yc: M.lowest.yc[i], r: M.lowest.r[i] }, M.method);
      if (c) list.push(c);
    }
    lowest[M.method] = list;
    gridEdgeWarnings(M, grid, rv.length, warnings);
    criticalWarnings(P, S, M.method, crit, warnings);
    if (M.method === "bishop" || M.method === "fellenius")
      stageWarnings(M.method, crit?.stages, "critical circle", warnings);
  }
  if (rig) rigorousFailureWarnings(rig, warnings);
  if (weightless.size > 0)
    warnings.push({
      code: "impenetrable-without-weight",
      message:
        `${rejected[REASONS[RIGID_NO_WEIGHT]]} trial circles were skipped because their slip mass carries ` +
        `impenetrable material without a unit weight (${[...weightless].map((m) => `'${m}'`).join(", ")}). ` +
        "Give it gamma so that its weight is carried.",
    });
  const complex = rejected[REASONS[TOO_MANY_BREAKS]] ?? 0;
  if (complex > 0)
    warnings.push({
      code: "circles-too-complex",
      message:
        `${complex} of ${tried} trial circles were skipped: under them the section has more slice breaks ` +
        "than the engine can hold. Simplify the ground or the layers there, so that no circle is missed.",
    });
  if (cancelled)
    warnings.push({
      code: "search-cancelled",
      message: "The search was cancelled; results cover the circles tried so far.",
    });
  return {
    ok: true,
    engineVersion: ENGINE_VERSION,
    case: analysis.case,
    methods,
    ordinaryForm: analysis.ordinaryForm,
    results,
    fsMap,
    lowest,
    circles: { tried, valid, rejected },
    warnings,
    cancelled,
    ...(rig ? { rigorousMethods: rig.methods, interslice: analysis.interslice } : {}),
    ...(P.staged !== null ? { stagedVariant: analysis.drawdown?.stagedVariant ?? "three-stage" } : {}),
  };
}

/** Refines around up to 3 local minima of each method's map; false when cancelled. */
function refineAll(
  states: MethodState[],
  grid: Grid,
  rv: number[],
  xs: number[],
  ys: number[],
  visit: (xc: number, yc: number, r: number, cell: number, ix: number, iy: number, ir: number) => boolean,
  fsOf: (m: AnalysisMethod) => number,
  opts: GridSearchOptions,
): boolean {
  const dx = grid.nx > 1 ? xs[1] - xs[0] : grid.ny > 1 ? ys[1] - ys[0] : 1;
  const dy = grid.ny > 1 ? ys[1] - ys[0] : dx;
  const dr = rv.length > 1 ? Math.abs(rv[1] - rv[0]) : Math.max(dx, dy);
  const starts: { M: MethodState; cell: number }[] = [];
  for (const M of states) for (const cell of localMinima(M, grid.nx, grid.ny, 3)) starts.push({ M, cell });
  let done = 0;
  let stop = false;
  for (const { M, cell } of starts) {
    const start = { xc: xs[cell % grid.nx], yc: ys[Math.floor(cell / grid.nx)], r: M.mapR[cell] };
    const ok = refineFrom(
      start,
      M.map[cell],
      dx,
      dy,
      dr,
      (x, y, r) => {
        const f = visit(x, y, r, -1, -1, -1, -1) ? fsOf(M.method) : NaN;
        return f > 0 ? f : Infinity;
      },
      () => stop,
    );
    if (!ok) return false;
    done++;
    if (opts.onProgress && opts.onProgress(0.8 + (0.2 * done) / starts.length) === false) stop = true;
    if (stop) return false;
  }
  return true;
}
