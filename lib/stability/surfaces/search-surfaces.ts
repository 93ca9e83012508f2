/**
 * The surfaces search (`analysis.search: "surfaces"`, docs/engine.md §12 "Search"): the grid search of
 * circles runs first; then, for Spencer and Morgenstern–Price, surfaces of any shape start from each
 * method's critical and lowest circles, from those circles made composite against impenetrable
 * material, and from wedges along the weakest layers, and are improved by moving their vertices
 * (Nelder–Mead) while they stay admissible. Each rigorous method reports its lowest surface when it is
 * lower than its critical circle, with `"surface"` beside the circle it started from.
 */
import { groundAt } from "../ground";
import type { EngineWarning } from "../issues";
import { runGridSearch, type GridSearchResult } from "../grid-search";
import { prepareSection, type PreparedSection } from "../prepare";
import type { WaterFieldOptions } from "../water-field";
import type { CircleFs } from "../results";
import type { RigorousMethod } from "../schema";
import type { SurfaceSearchProgress, XY } from "../rigorous-types";
import { M_ALPHA_WARN } from "../search-warnings";
import { validateSection } from "../validate";
import { checkSurface } from "./check-surface";
import { createSurfaceEvaluator, evaluateSurface, type SurfaceEvaluator } from "./evaluate-surface";
import { nelderMead } from "./nelder-mead";
import { circlePolyline, layerWedge, weakestMaterials } from "./start-surfaces";

export interface SurfaceSearchOptions extends WaterFieldOptions {
  /** Progress (fraction done, lowest FS so far); return false to cancel. */
  onProgress?: (p: SurfaceSearchProgress) => boolean | void;
}

/** Evaluations of the factor per start, and in the final polish of the best. */
const START_BUDGET = 1200;
const POLISH_BUDGET = 2000;
/** Largest interslice tension a searched surface may carry, as a share of the mass's vertical load. */
const TENSION_SHARE = 0.1;

/** A grid search of circles, then (analysis.search "surfaces") the search of surfaces of any shape. */
export function runSurfaceSearch(doc: unknown, opts: SurfaceSearchOptions = {}): GridSearchResult {
  let stop = false;
  const report = (fraction: number, bestFs: number | null) => {
    if (opts.onProgress && opts.onProgress({ fraction, bestFs }) === false) stop = true;
    return !stop;
  };
  const v = validateSection(doc);
  if (!v.ok) return v;
  // The circles take the first 30 % of the bar only when surfaces follow them; otherwise all of it.
  const share = v.section.analysis?.search === "surfaces" ? 0.3 : 1;
  const grid = runGridSearch(doc, { onProgress: (f) => report(share * f, null), waterField: opts.waterField });
  if (!grid.ok || grid.cancelled) return grid;
  const P = prepareSection(v.section, undefined, opts.waterField);
  if (P.analysis.search !== "surfaces") return grid;
  const methods = P.analysis.rigorous;
  const warnings: EngineWarning[] = grid.warnings;
  if (methods.length === 0 || P.staged !== null) {
    warnings.push({
      code: "surfaces-need-rigorous",
      message:
        "A surfaces search runs Spencer's or the Morgenstern–Price method (add them to analysis.methods; " +
        "not in a staged drawdown); the circles' results are shown.",
    });
    return grid;
  }
  const E = createSurfaceEvaluator();
  let tried = 0;
  let done = 0;
  for (const m of methods) {
    const crit = grid.results[m];
    if (!crit) continue;
    const starts = startSurfaces(P, crit, grid.lowest[m] ?? []);
    let best: { fs: number; pts: XY[]; lambda: number; dir: number } | null = null;
    for (const s of starts) {
      if (stop) break;
      const r = improve(P, E, m, s, START_BUDGET, best?.fs ?? crit.fs);
      tried += r.evaluations;
      if (r.fs < (best?.fs ?? Infinity)) best = { fs: r.fs, pts: r.pts, lambda: r.lambda, dir: r.dir };
      done++;
      report(0.3 + (0.7 * done) / (methods.length * (starts.length + 1)), best?.fs ?? null);
    }
    if (best && !stop) {
      const r = improve(P, E, m, best.pts, POLISH_BUDGET, best.fs);
      tried += r.evaluations;
      if (r.fs < best.fs) best = { fs: r.fs, pts: r.pts, lambda: r.lambda, dir: r.dir };
    }
    done++;
    if (best && best.fs < crit.fs) grid.results[m] = surfaceResult(crit, best);
  }
  warnings.push({
    code: "surfaces-searched",
    message: `The surfaces search evaluated ${tried} surfaces of any shape for ${methods.join(" and ")}.`,
  });
  if (stop)
    warnings.push({
      code: "search-cancelled",
      message: "The surfaces search was cancelled; results so far are shown.",
    });
  report(1, null);
  return { ...grid, cancelled: grid.cancelled || stop };
}

/**
 * Whether the solution pulls the slices apart with more than a tenth of the mass's whole vertical load
 * somewhere (docs/engine.md §12 "Search"): soil carries no such tension, and such a root of the
 * equations (a strongly negative λ) can sit far below the physical one.
 */
function tensile(E: SurfaceEvaluator): boolean {
  const G = E.G;
  let load = 0;
  for (let i = 0; i < G.n; i++) load += G.V[i];
  for (let i = 0; i <= G.n; i++) if (G.E[i] < -TENSION_SHARE * load) return true;
  return false;
}

function surfaceResult(crit: CircleFs, best: { fs: number; pts: XY[]; lambda: number; dir: number }): CircleFs {
  const a = best.pts[0];
  const b = best.pts[best.pts.length - 1];
  return {
    fs: best.fs,
    circle: { ...crit.circle },
    entry: best.dir > 0 ? a : b,
    exit: best.dir > 0 ? b : a,
    direction: best.dir > 0 ? "right" : "left",
    lambda: best.lambda,
    surface: best.pts,
  };
}

/** The starting polylines of one method (each x increasing). */
function startSurfaces(P: PreparedSection, crit: CircleFs, lowest: CircleFs[]): XY[][] {
  const out: XY[][] = [];
  const span = (c: CircleFs): [number, number] => [Math.min(c.entry[0], c.exit[0]), Math.max(c.entry[0], c.exit[0])];
  const seen = new Set<string>();
  for (const c of [crit, ...lowest.slice(0, 3)]) {
    const key = `${c.circle.xc.toFixed(2)},${c.circle.yc.toFixed(2)},${c.circle.r.toFixed(2)}`;
    if (seen.has(key)) continue;
    seen.add(key);
    const [xa, xb] = span(c);
    out.push(circlePolyline(P, c.circle, xa, xb));
  }
  // The critical circle and deeper ones about the same centre, following the top of impenetrable
  // material or of a much stronger layer where they meet it (the critical one only if it does).
  const [xa, xb] = span(crit);
  const composite = circlePolyline(P, crit.circle, xa, xb, true);
  if (composite.some((p, i) => p[1] !== out[0][i][1])) out.push(composite);
  for (const k of [1.1, 1.25]) {
    const c = { ...crit.circle, r: crit.circle.r * k };
    const h = Math.sqrt(Math.max(0, c.r * c.r - (crit.circle.yc - groundAt(P.ground, xa)) ** 2));
    const ya = Math.max(P.xmin, c.xc - h);
    const yb = Math.min(P.xmax, c.xc + Math.sqrt(Math.max(0, c.r * c.r - (c.yc - groundAt(P.ground, xb)) ** 2)));
    if (yb > ya) out.push(circlePolyline(P, c, ya, yb, true));
  }
  const dir = crit.direction === "right" ? 1 : -1;
  for (const mat of weakestMaterials(P, 2))
    for (const reach of [1, 1.3, 1.7]) {
      const w = layerWedge(P, mat, xa, xb, dir, reach);
      if (w) out.push(w);
    }
  return out.filter((pts) => checkSurface(P, pts).ok);
}

/**
 * Moves the vertices of `pts` (the ends along the ground, the interior in x and y) to lower the
 * factor of `method`; inadmissible positions count as +Infinity.
 */
function improve(
  P: PreparedSection,
  E: SurfaceEvaluator,
  method: RigorousMethod,
  pts: XY[],
  budget: number,
  scale: number,
): { fs: number; pts: XY[]; lambda: number; dir: number; evaluations: number } {
  const n = pts.length;
  const width = pts[n - 1][0] - pts[0][0];
  const x0: number[] = [];
  const steps: number[] = [];
  x0.push(pts[0][0]);
  steps.push(0.05 * width);
  for (let i = 1; i + 1 < n; i++) {
    x0.push(pts[i][0], pts[i][1]);
    steps.push(0.03 * width, 0.04 * width);
  }
  x0.push(pts[n - 1][0]);
  steps.push(0.05 * width);
  const halfSine = P.analysis.interslice === "half-sine";
  const toPts = (p: number[]): XY[] => {
    const out: XY[] = [[p[0], groundAt(P.ground, p[0])]];
    for (let i = 1; i + 1 < n; i++) out.push([p[2 * i - 1], p[2 * i]]);
    out.push([p[p.length - 1], groundAt(P.ground, p[p.length - 1])]);
    return out;
  };
  let best = Infinity;
  let bestPts = pts;
  let bestLambda = NaN;
  let bestDir = 1;
  const f = (p: number[]): number => {
    const cand = toPts(p);
    const ok = checkSurface(P, cand);
    if (!ok.ok) return Infinity;
    // The same start for every surface (not the best so far), so that where the equations have more
    // than one root the search does not wander onto another; a solution with mα < 0.2 is not accepted.
    const fs = evaluateSurface(P, E, ok.px, ok.py, method, halfSine);
    if (!(fs > 0) || E.G.minMa < M_ALPHA_WARN || tensile(E)) return Infinity;
    if (fs < best) {
      best = fs;
      bestPts = Array.from(ok.px, (x, i) => [x, ok.py[i]] as XY);
      bestLambda = E.lambda;
      bestDir = E.dir;
    }
    return fs;
  };
  const r = nelderMead(f, x0, { steps, maxEvaluations: budget, tolerance: 1e-5 * scale });
  return { fs: best, pts: bestPts, lambda: bestLambda, dir: bestDir, evaluations: r.evaluations };
}
