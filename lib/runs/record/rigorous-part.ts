/**
 * What a run keeps of the methods that satisfy force and moment equilibrium (Spencer,
 * Morgenstern–Price) and of a slip surface the user drew (docs/engine-io.md "Methods and slip
 * surfaces of any shape"): the rigorous methods on the governing critical circle, and every method
 * asked for on the drawn surface. The browser's preview and the server's save build it with this
 * one function from the same engine results, so the two agree.
 */
import type {
  AnalysisFsRecord,
  Circle,
  IntersliceFunction,
  LambdaRecord,
  Method,
  RigorousRecord,
  SectionDocument,
  SurfaceSuccess,
  XY,
} from "@/lib/stability";
import { analyzeSurface } from "@/lib/stability/surfaces/analyze-surface";
import type { CriticalReports } from "./search-record";
import { refusalText } from "@/lib/runs/view/rigorous-text";

/** Spencer and Morgenstern–Price on one circle: the critical circle of `basis`. */
export interface RigorousOnCircle {
  basis: Method;
  circle: Circle;
  fs: AnalysisFsRecord;
  lambda: LambdaRecord;
  rigorous: RigorousRecord;
}

export interface RigorousRunPart {
  interslice: IntersliceFunction;
  /** null when no rigorous method was asked for or no circle gave a factor. */
  onCircle: RigorousOnCircle | null;
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
  const r = analyzeSurface(doc, surface);
  return r.ok ? r : null;
}

/**
 * The rigorous part of a run from the critical circles' reports (which carry Spencer and
 * Morgenstern–Price when the document asks for them) and the drawn surface's analysis.
 * null when the run asked for neither.
 */
export function rigorousPart(
  doc: SectionDocument,
  critical: CriticalReports,
  surface: SurfaceSuccess | null,
): RigorousRunPart | null {
  const methods = doc.analysis?.methods ?? [];
  const wantsRigorous = methods.includes("spencer") || methods.includes("morgenstern-price");
  if (!wantsRigorous && !surface) return null;
  const basis: Method | undefined = critical.bishop ? "bishop" : critical.fellenius ? "fellenius" : undefined;
  const report = basis ? critical[basis] : undefined;
  const onCircle: RigorousOnCircle | null =
    wantsRigorous && basis && report?.rigorous
      ? {
          basis,
          circle: report.circle,
          fs: pickRigorous(report.fs),
          lambda: report.lambda ?? {},
          rigorous: report.rigorous,
        }
      : null;
  return { interslice: doc.analysis?.interslice ?? "half-sine", onCircle, surface };
}

function pickRigorous(fs: AnalysisFsRecord): AnalysisFsRecord {
  const out: AnalysisFsRecord = {};
  if ("spencer" in fs) out.spencer = fs.spencer;
  if ("morgenstern-price" in fs) out["morgenstern-price"] = fs["morgenstern-price"];
  return out;
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
