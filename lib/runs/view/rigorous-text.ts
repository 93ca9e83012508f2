/**
 * The four methods side by side, and the rigorous methods' warnings, in the reader's words: the
 * engine's codes (circular-only, thrust-outside, tension, m-alpha-low) become sentences with the
 * place they concern, measured along the slip surface from its upper end to its toe.
 */
import type {
  AnalysisMethod,
  GridSearchSuccess,
  RigorousFs,
  RigorousMethod,
  RigorousWarning,
  SurfaceSuccess,
  XY,
} from "@/lib/stability";
import { METHOD_NAME } from "@/lib/vocabulary";
import type { RigorousRunPart, SurfaceRefused } from "@/lib/runs/record/rigorous-part";

export const ALL_METHODS: readonly AnalysisMethod[] = ["bishop", "fellenius", "spencer", "morgenstern-price"];

export const ANY_METHOD_NAME: Record<AnalysisMethod, string> = METHOD_NAME;

export const INTERSLICE_NAME = { "half-sine": "half-sine f(x)", constant: "constant f(x)" } as const;

const m2 = (v: number) => v.toFixed(2);

/** "(x, y) m" to centimetres. */
export function placeText(at: readonly [number, number]): string {
  return `(${m2(at[0])}, ${m2(at[1])}) m`;
}

/** A refused surface's reason and where, as one sentence. */
export function refusalText(r: SurfaceRefused): string {
  return r.at ? `${r.reasonText} Near ${placeText(r.at)}.` : r.reasonText;
}

/** One cell of the side-by-side table: a factor (with λ for the rigorous methods) or why there is none. */
export type MethodCell = { fs: number; lambda: number | null } | { note: string } | null;

export interface MethodRow {
  method: AnalysisMethod;
  name: string;
  /** On each method's own critical circle of the grid. */
  circle: MethodCell;
  /** A surfaces search's lowest surface; null when the search tried circles only. */
  searched: MethodCell;
  /** On the drawn surface; null when the run has none. */
  surface: MethodCell;
}

const REASON_WORDS: Record<string, string> = {
  "circular-only": "circle only",
  "not-converged": "no solution found",
  "rigorous-not-staged": "not in a staged drawdown",
};

function noteOf(reason: string | undefined, text: string | undefined): { note: string } {
  return { note: (reason && REASON_WORDS[reason]) || text || "no factor" };
}

const isRigorous = (m: AnalysisMethod): m is RigorousMethod => m === "spencer" || m === "morgenstern-price";

/**
 * The rows of the side-by-side table: every method the run asked for, on its critical circle, on
 * the surface a surfaces search found and on the drawn surface. Bishop and the ordinary method read
 * "circle only" off circles.
 */
export function methodRows(result: GridSearchSuccess, part: RigorousRunPart | undefined): MethodRow[] {
  const asked = new Set<AnalysisMethod>([...result.methods, ...(result.rigorousMethods ?? [])]);
  for (const k of Object.keys(part?.surface?.fs ?? {})) asked.add(k as AnalysisMethod);
  const rows: MethodRow[] = [];
  for (const method of ALL_METHODS) {
    if (!asked.has(method)) continue;
    rows.push({
      method,
      name: ANY_METHOD_NAME[method],
      circle: circleCell(result, part, method),
      searched: part?.search === "surfaces" ? searchedCell(part, method) : null,
      surface: part?.surface ? drawnCell(part.surface, method) : null,
    });
  }
  return rows;
}

function drawnCell(s: SurfaceSuccess, method: AnalysisMethod): MethodCell {
  const fs = s.fs[method];
  const why = s.reasons[method];
  const lambda = isRigorous(method) ? (s.lambda[method] ?? null) : null;
  return typeof fs === "number" ? { fs, lambda } : noteOf(why?.reason, why?.reasonText);
}

function searchedCell(part: RigorousRunPart, method: AnalysisMethod): MethodCell {
  if (!isRigorous(method)) return { note: "circle only" };
  const on = part.searched[method];
  if (!on) return { note: "no surface below its circle" };
  return on.solution.fs !== null
    ? { fs: on.solution.fs, lambda: on.solution.lambda }
    : noteOf(on.solution.reason, on.solution.reasonText);
}

function circleCell(result: GridSearchSuccess, part: RigorousRunPart | undefined, method: AnalysisMethod): MethodCell {
  if (!isRigorous(method)) {
    const own = result.results[method];
    return own ? { fs: own.fs, lambda: null } : { note: "no valid circle" };
  }
  const sol = part?.circles[method]?.solution;
  if (!sol) return { note: "no valid circle" };
  return sol.fs !== null ? { fs: sol.fs, lambda: sol.lambda } : noteOf(sol.reason, sol.reasonText);
}

const WARNING_WORDS: Record<RigorousWarning["code"], string> = {
  "thrust-outside": "The line of thrust leaves the sliding mass",
  tension: "The soil between slices would be in tension",
  "m-alpha-low": "mα is small where the surface exits steeply",
  "negative-normal": "A slice base carries a negative effective normal force",
};

/** Where along the surface a point lies, in words: near its upper end, near the toe, or part-way. */
export function placeAlong(x: number, upper: XY | undefined, toe: XY | undefined): string {
  if (!upper || !toe || upper[0] === toe[0]) return "";
  const t = (x - upper[0]) / (toe[0] - upper[0]);
  if (t <= 0.3) return "near the crest end";
  if (t >= 0.7) return "near the toe";
  return "part-way along";
}

export interface RigorousWarningLine {
  code: RigorousWarning["code"];
  headline: string;
  /** Where: "near the toe, at (x, y) m". */
  place: string;
  at: XY | null;
  detail: string;
}

/** One method's warnings on one surface as sentences with their place. */
export function rigorousWarningLines(sol: RigorousFs, upper?: XY, toe?: XY): RigorousWarningLine[] {
  return sol.warnings.map((w) => {
    const along = w.at ? placeAlong(w.at[0], upper, toe) : "";
    const place = w.at ? [along, `at ${placeText(w.at)}`].filter(Boolean).join(", ") : "";
    return { code: w.code, headline: WARNING_WORDS[w.code] ?? w.message, place, at: w.at, detail: w.message };
  });
}
