/**
 * What a run keeps of the methods that satisfy force and moment equilibrium (Spencer,
 * Morgenstern–Price) and of slip surfaces of any shape (docs/engine-io.md "Methods and slip surfaces
 * of any shape"): each rigorous method on its own critical circle and on the surface a surfaces
 * search found, and every method asked for on a surface the user drew. The browser's preview and the
 * server's save build it with this one function from the same search result, so the two agree.
 */
import {
  type Circle,
  type GridSearchSuccess,
  type IntersliceFunction,
  type RigorousFs,
  type RigorousMethod,
  type SectionDocument,
  type SurfaceSuccess,
  type XY,
} from "@/lib/stability";
import { refusalText } from "@/lib/runs/view/rigorous-text";
// The re-analyses go through the water orchestrator so that a run on seepage water is judged on the same field.
import { circleOnWater, surfaceOnWater } from "@/lib/seepage-stability";

/** One rigorous method's solution on a slip surface: its critical circle or a searched surface. */
export interface RigorousOn {
  circle: Circle;
  /** The searched surface ([x, y] m, x increasing); absent on the circle itself. */
  surface?: XY[];
  entry: XY;
  exit: XY;
  solution: RigorousFs;
}

export interface RigorousRunPart {
  interslice: IntersliceFunction;
  /** What the search tried: circles on the grid, or then surfaces of any shape. */
  search: "circles" | "surfaces";
  /** Each rigorous method on its own critical circle of the grid search. */
  circles: Partial<Record<RigorousMethod, RigorousOn>>;
  /** A surfaces search: each rigorous method's lowest surface, when lower than its circle. */
  searched: Partial<Record<RigorousMethod, RigorousOn>>;
  /** The drawn surface's analysis; null when the set-up had none. */
  surface: SurfaceSuccess | null;
}

/** A drawn surface the engine refuses: its reason in words and where, with no factor. */
export interface SurfaceRefused {
  reason: string;
  reasonText: string;
  at: XY | null;
}

/** The engine's refusal of a surface result, or null when it was analysed. */
export function surfaceRefusal(s: SurfaceSuccess): SurfaceRefused | null {
  if (!s.reason) return null;
  return { reason: s.reason, reasonText: s.reasonText ?? s.reason, at: s.at ?? null };
}

/** Analyses a drawn surface of a run's document; an engine failure (bad document) gives null. */
export function analyzeDrawnSurface(doc: SectionDocument, surface: readonly XY[]): SurfaceSuccess | null {
  const r = surfaceOnWater(doc, surface);
  return r.ok ? r : null;
}

/**
 * The rigorous part of a run: each rigorous method's solution (interslice forces, line of thrust,
 * placed warnings) on its own critical circle and on its searched surface, re-analysed from the
 * search's result, and the drawn surface's analysis. null when the run asked for neither.
 */
export function rigorousPart(
  doc: SectionDocument,
  result: GridSearchSuccess,
  surface: SurfaceSuccess | null,
): RigorousRunPart | null {
  const methods = result.rigorousMethods ?? [];
  if (methods.length === 0 && !surface) return null;
  const part: RigorousRunPart = {
    interslice: doc.analysis?.interslice ?? "half-sine",
    search: doc.analysis?.search ?? "circles",
    circles: {},
    searched: {},
    surface,
  };
  for (const m of methods) {
    const best = result.results[m];
    if (!best) continue;
    const one = circleOnWater(doc, best.circle);
    const onCircle = one.ok ? one.rigorous?.[m] : undefined;
    if (one.ok && onCircle && one.entry && one.exit)
      part.circles[m] = { circle: best.circle, entry: one.entry, exit: one.exit, solution: onCircle };
    if (best.surface) {
      const s = surfaceOnWater(doc, best.surface);
      const sol = s.ok ? s.rigorous[m] : undefined;
      if (sol) part.searched[m] = { ...best, surface: best.surface, solution: sol };
    }
  }
  return part;
}

export type SurfaceCheck = { ok: true; surface: SurfaceSuccess } | { ok: false; text: string; at: XY | null };

/**
 * Whether a drawn surface is admissible on a document, as the save will judge it: the engine's
 * reason and place when it is refused (Spencer is run so that a surface without a solution says so).
 */
export function checkDrawnSurface(doc: SectionDocument, points: readonly XY[]): SurfaceCheck {
  const s = analyzeDrawnSurface({ ...doc, analysis: { ...doc.analysis, methods: ["spencer"] } }, points);
  if (!s) return { ok: false, text: "The section does not validate, so no surface can be checked on it.", at: null };
  const refused = surfaceRefusal(s);
  if (refused) return { ok: false, text: refusalText(refused), at: refused.at };
  return { ok: true, surface: s };
}
