/**
 * A search and a one-circle report whose water may come from seepage: the water is solved once
 * (solve-water.ts), then the engine runs on the document with its field. Results carry the
 * seepage summary so a page can say where the pore pressures came from.
 */
import {
  analyzeCircle,
  analyzeSurface,
  runSurfaceSearch,
  type Circle,
  type CircleSuccess,
  type EngineFailure,
  type GridSearchSuccess,
  type SurfaceResult,
  type SurfaceSearchOptions,
  type SurfaceSuccess,
} from "@/lib/stability";
import { solveWater, type SolvedWater } from "./solve-water";
import type { SeepageSummary } from "./types";

type Solved = Extract<SolvedWater, { ok: true }>;

function failure(w: Extract<SolvedWater, { ok: false }>): EngineFailure {
  return { ok: false, errors: w.errors, warnings: [] };
}

/** Solves the water of a document (once), or the failure to hand back as the engine would. */
export function prepareWater(doc: unknown): Solved | EngineFailure {
  const w = solveWater(doc);
  return w.ok ? w : failure(w);
}

/** The grid search of a document on its water, seepage included, then its surfaces when analysis.search asks. */
export function searchOnWater(
  doc: unknown,
  opts: SurfaceSearchOptions = {},
): (GridSearchSuccess & { seepage?: SeepageSummary }) | EngineFailure {
  const w = prepareWater(doc);
  if (!w.ok) return w;
  const r = runSurfaceSearch(w.document, { ...opts, waterField: w.waterField });
  return r.ok && w.seepage ? { ...r, seepage: w.seepage } : r;
}

/** One circle of a document on its water, seepage included. */
export function circleOnWater(
  doc: unknown,
  circle: Circle,
): (CircleSuccess & { seepage?: SeepageSummary }) | EngineFailure {
  const w = prepareWater(doc);
  if (!w.ok) return w;
  const r = analyzeCircle(w.document, circle, { waterField: w.waterField });
  return r.ok && w.seepage ? { ...r, seepage: w.seepage } : r;
}

/** One slip surface of any shape of a document on its water, seepage included. */
export function surfaceOnWater(
  doc: unknown,
  points: ReadonlyArray<readonly [number, number]>,
): (SurfaceSuccess & { seepage?: SeepageSummary }) | EngineFailure {
  const w = prepareWater(doc);
  if (!w.ok) return w;
  const r: SurfaceResult = analyzeSurface(w.document, points, { waterField: w.waterField });
  return r.ok && w.seepage ? { ...r, seepage: w.seepage } : r;
}
