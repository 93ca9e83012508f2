/**
 * One sweep job: the section generated at the job's pair of ratios, with the phreatic line of
 * the job's pool recomputed for that geometry, searched with a grid that follows it. The same
 * function runs in a browser Web Worker, in a server worker thread and in the "open as a run"
 * route, so all three give the same numbers.
 */
import {
  runGridSearch,
  type Analysis,
  type Circle,
  type GridSearchSuccess,
  type Grid,
  type Material,
  type Radii,
  type SectionDocument,
} from "@/lib/stability";
import { prepareWater } from "@/lib/seepage-stability";
import { DesignInputError, generateEmbankment, type GeneratedEmbankment } from "./generate-embankment";
import { gridForFace, gridResolution, shiftTowardEdge, slideDirection } from "./grid-follow";
import type { EmbankmentParams } from "./parameters";
import { sweepCase, type DesignFace, type SweepCaseKey, type SweepJob, type SweepSettings } from "./sweep-plan";

export interface SweepPoint {
  id: string;
  phase: SweepJob["phase"];
  face: DesignFace;
  caseKey: SweepCaseKey;
  upstreamRatio: number;
  downstreamRatio: number;
  /** The swept face's own ratio (H:V). */
  ratio: number;
  fsBishop: number | null;
  fsOrdinary: number | null;
  /** Bishop's critical circle (m). */
  circle: Circle | null;
  /** FS change one grid step away from the minimum (see gridResolution). */
  resolution: number | null;
  /** How many times the grid was moved and searched again because its minimum lay on its edge. */
  gridMoves: number;
  /** True when the minimum still lies on a movable edge after the last move allowed: not a settled FS. */
  gridEdge: boolean;
  grid: Grid | null;
  radii: Radii | null;
  /** Fill cross-section area at this pair of ratios (m² = m³ per metre of dam). */
  fillArea: number;
  warnings: string[];
  /** Why the job gave no FS (a case outside the seepage method, a failed search), else null. */
  error: string | null;
  elapsedMs: number;
}

export type JobSettings = Pick<SweepSettings, "nx" | "ny" | "radii" | "slices" | "refine">;

/** The parameters with the job's two ratios. */
export function paramsForJob(
  params: EmbankmentParams,
  job: Pick<SweepJob, "upstreamRatio" | "downstreamRatio">,
): EmbankmentParams {
  return { ...params, upstreamSlope: job.upstreamRatio, downstreamSlope: job.downstreamRatio };
}

/** The analysis block of a job: its case, sliding direction, pools and search density. */
export function analysisForJob(
  params: EmbankmentParams,
  job: Pick<SweepJob, "caseKey">,
  grid: Grid,
  radii: Radii,
  settings: JobSettings,
): Analysis {
  const c = sweepCase(job.caseKey);
  const analysis: Analysis = {
    case: c.engineCase,
    methods: ["bishop", "fellenius"],
    slices: settings.slices,
    direction: slideDirection(c.face),
    grid,
    radii,
    refine: settings.refine,
    ordinaryForm: "classical",
  };
  if (c.engineCase === "drawdown") {
    analysis.drawdown = {
      from: c.pool === "flood" ? params.floodPool : params.normalPool,
      to: params.drawdownTo,
      method: "effective",
    };
  }
  return analysis;
}

/** Moves of the grid toward an edge minimum before the point is reported as unsettled. */
export const MAX_GRID_MOVES = 3;

export interface JobSearch {
  generated: GeneratedEmbankment;
  gridMoves: number;
  gridEdge: boolean;
  /** The document searched, with its analysis block. */
  document: SectionDocument;
  result: GridSearchSuccess;
}

export type JobSearchOutcome =
  { ok: true; search: JobSearch } | { ok: false; error: string; generated: GeneratedEmbankment | null };

/**
 * Generates the job's section and runs its grid search. While the minimum lies on a movable edge
 * of the grid, the grid is moved toward it and searched again (up to MAX_GRID_MOVES times); a
 * move that finds nothing lower settles the edge, since the ground beyond it has been searched.
 */
export function searchJob(
  params: EmbankmentParams,
  materials: readonly Material[],
  job: SweepJob,
  settings: JobSettings,
): JobSearchOutcome {
  const c = sweepCase(job.caseKey);
  let generated: GeneratedEmbankment;
  try {
    generated = generateEmbankment(paramsForJob(params, job), materials, { pool: c.pool });
  } catch (err) {
    if (err instanceof DesignInputError) return { ok: false, error: err.message, generated: null };
    throw err;
  }
  if (!generated.seepage.line) {
    const why =
      generated.seepage.limits.find((l) => l.severity === "error")?.message ?? "No phreatic line for this pool.";
    return { ok: false, error: why, generated };
  }
  const first = gridForFace(generated.document, c.face, settings);
  // Water from a seepage solution is solved once per job (one orchestrator), then each grid reuses it.
  const water = prepareWater(generated.document);
  if (!water.ok) return { ok: false, error: water.errors.map((e) => `${e.path}: ${e.message}`).join("; "), generated };
  const solved = water.document as SectionDocument;
  const run = (grid: Grid, radii: Radii) => {
    const analysis = analysisForJob(params, job, grid, radii, settings);
    const result = runGridSearch({ ...solved, analysis }, { waterField: water.waterField });
    return { document: { ...generated.document, analysis } as SectionDocument, result };
  };
  let best = run(first.grid, first.radii);
  if (!best.result.ok)
    return { ok: false, error: best.result.errors.map((e) => `${e.path}: ${e.message}`).join("; "), generated };
  const fs = (r: ReturnType<typeof runGridSearch>) => (r.ok ? (r.results.bishop?.fs ?? Infinity) : Infinity);
  let grid = first.grid;
  let gridMoves = 0;
  let gridEdge = false;
  for (;;) {
    const map = best.result.ok ? best.result.fsMap.bishop : undefined;
    const moved = map ? shiftTowardEdge(grid, map, params.crestElevation) : null;
    if (!moved) break;
    if (gridMoves === MAX_GRID_MOVES) {
      gridEdge = true;
      break;
    }
    const again = run(moved, first.radii);
    gridMoves++;
    if (!again.result.ok || !(fs(again.result) < fs(best.result))) break;
    best = again;
    grid = moved;
  }
  if (!best.result.ok) return { ok: false, error: "The search failed.", generated };
  return { ok: true, search: { generated, gridMoves, gridEdge, document: best.document, result: best.result } };
}

/** Runs one job and condenses it to a sweep point (plain JSON). */
export function runSweepJob(
  params: EmbankmentParams,
  materials: readonly Material[],
  job: SweepJob,
  settings: JobSettings,
): SweepPoint {
  const t0 = Date.now();
  const outcome = searchJob(params, materials, job, settings);
  const base = {
    id: job.id,
    phase: job.phase,
    face: job.face,
    caseKey: job.caseKey,
    upstreamRatio: job.upstreamRatio,
    downstreamRatio: job.downstreamRatio,
    ratio: job.face === "upstream" ? job.upstreamRatio : job.downstreamRatio,
  };
  if (!outcome.ok) {
    return {
      ...base,
      fsBishop: null,
      fsOrdinary: null,
      circle: null,
      resolution: null,
      gridMoves: 0,
      gridEdge: false,
      grid: null,
      radii: null,
      fillArea: outcome.generated?.quantities.fillArea ?? 0,
      warnings: [],
      error: outcome.error,
      elapsedMs: Date.now() - t0,
    };
  }
  const { result, document, generated, gridMoves, gridEdge } = outcome.search;
  const bishop = result.results.bishop ?? null;
  const analysis = document.analysis as Analysis;
  return {
    ...base,
    fsBishop: bishop?.fs ?? null,
    fsOrdinary: result.results.fellenius?.fs ?? null,
    circle: bishop?.circle ?? null,
    resolution: result.fsMap.bishop ? gridResolution(result.fsMap.bishop) : null,
    gridMoves,
    gridEdge,
    grid: analysis.grid ?? null,
    radii: analysis.radii ?? null,
    fillArea: generated.quantities.fillArea,
    warnings: result.warnings.map((w) => w.message),
    error: bishop ? null : "No trial circle gave a factor of safety.",
    elapsedMs: Date.now() - t0,
  };
}
