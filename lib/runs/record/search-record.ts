/**
 * The one search a run record is made of: the grid search of the run's document, then each
 * method's critical circle reported slice by slice, with the warnings of both gathered into one
 * list. The browser's worker calls it for the preview and the server calls it on save, with the
 * same document, so the two agree exactly (the engine is deterministic; docs/engine.md §5). Water from
 * a seepage solution is solved once here, through the one orchestrator (lib/seepage-stability).
 */
import {
  analyzeCircle,
  runGridSearch,
  runSurfaceSearch,
  type CircleSuccess,
  type EngineFailure,
  type EngineWarning,
  type GridSearchOptions,
  type GridSearchSuccess,
  type Method,
  type SectionDocument,
} from "@/lib/stability";
import { prepareWater, type SeepageSummary } from "@/lib/seepage-stability";

export type CriticalReports = Partial<Record<Method, CircleSuccess>>;

export interface SearchRecord {
  ok: true;
  /** The grid search, its warnings already merged with the critical circles' own (see keptWarnings). */
  result: GridSearchSuccess;
  /** Each method's critical circle, reported slice by slice. */
  critical: CriticalReports;
  /** Where the pore pressures came from when the water is a seepage solution's (q, mesh). */
  seepage?: SeepageSummary;
}

/**
 * Warnings that only the slice-by-slice report of a circle raises; the grid search's own list
 * already carries the rest (grid edge, radius limit, least mα, no valid circle).
 */
const SLICE_LEVEL = new Set(["negative-normal", "several-slip-masses"]);

const METHOD_PREFIX: Record<Method, string> = { bishop: "Bishop", fellenius: "Ordinary" };

/**
 * The method a circle-report warning speaks of, read from the engine's wording ("Bishop's
 * simplified method: …", "Ordinary method: …"); null when it speaks of the circle as a whole.
 */
export function warningMethod(w: EngineWarning): Method | null {
  for (const m of Object.keys(METHOD_PREFIX) as Method[]) if (w.message.startsWith(METHOD_PREFIX[m])) return m;
  return null;
}

/**
 * The warnings a run keeps: the search's, then the slice-level ones of each method's critical
 * circle that concern that method (a circle's report counts negative N′ for both methods, and
 * the other method's count on a circle that is not its own critical one would be a second,
 * different count of the same thing). Each distinct message appears once.
 */
export function keptWarnings(result: GridSearchSuccess, critical: CriticalReports): EngineWarning[] {
  const out: EngineWarning[] = [];
  const seen = new Set<string>();
  const add = (w: EngineWarning) => {
    const key = `${w.code}\u0000${w.message}`;
    if (seen.has(key)) return;
    seen.add(key);
    out.push({ code: w.code, message: w.message });
  };
  for (const w of result.warnings) add(w);
  for (const method of result.methods) {
    const report = critical[method];
    if (!report) continue;
    for (const w of report.warnings) {
      if (!SLICE_LEVEL.has(w.code)) continue;
      const about = warningMethod(w);
      if (about === null || about === method) add(w);
    }
  }
  return out;
}

/** Runs the search of a run's document and reports its critical circles; engine failures pass through. */
export function searchRecord(doc: SectionDocument, opts: GridSearchOptions = {}): SearchRecord | EngineFailure {
  const water = prepareWater(doc);
  if (!water.ok) return water;
  const { document, waterField, seepage } = water;
  // A surfaces search runs the grid of circles first (its first 30 % of progress), then surfaces of any
  // shape; a circles search calls the grid search itself so that its progress runs to the end.
  const result =
    doc.analysis?.search === "surfaces"
      ? runSurfaceSearch(document, {
          waterField,
          onProgress: opts.onProgress && ((p) => opts.onProgress!(p.fraction)),
        })
      : runGridSearch(document, { ...opts, waterField });
  if (!result.ok) return result;
  const critical: CriticalReports = {};
  for (const method of result.methods) {
    const best = result.results[method];
    if (!best) continue;
    const one = analyzeCircle(document, best.circle, { waterField });
    if (one.ok) critical[method] = one;
  }
  const kept = { ...result, warnings: [...keptWarnings(result, critical), ...seepageWarnings(seepage)] };
  return { ok: true, result: kept, critical, ...(seepage ? { seepage } : {}) };
}

/** The seepage solution's own warnings (a phreatic surface that did not settle, say) travel with the run. */
function seepageWarnings(seepage: SeepageSummary | null): EngineWarning[] {
  return (seepage?.warnings ?? []).map((w) => ({ code: `seepage-${w.code}`, message: `Seepage: ${w.message}` }));
}
