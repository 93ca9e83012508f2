/**
 * What the run canvas draws for a slip surface and one rigorous solution on it, in metres: the
 * surface, its slice sides, the line of thrust, and a numbered mark at each warning's place.
 */
import { METHOD_SHORT } from "@/lib/vocabulary";
import type { RigorousFs, XY } from "@/lib/stability";
import type { RigorousOn, RigorousRunPart } from "@/lib/runs/record/rigorous-part";
import { arcPoints } from "./circle-arc";
import { rigorousWarningLines, type RigorousWarningLine } from "./rigorous-text";

/** Scarpline's own marks for a slip surface of any shape and its line of thrust. */
export const SURFACE_COLOUR = "#2b5d7a";
export const THRUST_COLOUR = "#a3471f";

export interface SurfaceOverlay {
  /** The slip surface as a polyline; empty when it is a circle already drawn by the circle layer. */
  line: XY[];
  /** Slice sides: x with the base and the ground elevations. */
  sides: { x: number; yBase: number; yTop: number }[];
  thrust: XY[];
  marks: { at: XY; n: number; text: string }[];
  label: string;
}

/**
 * The overlay of solution `sol` (its interslice boundaries give the slice sides) on `line`;
 * `upper` and `toe` place the warnings along the surface.
 */
export function surfaceOverlay(line: XY[], sol: RigorousFs | undefined, label: string, upper?: XY, toe?: XY) {
  const overlay: SurfaceOverlay = { line, sides: [], thrust: [], marks: [], label };
  if (!sol) return overlay;
  overlay.sides = sol.boundaries.map((b) => ({ x: b.x, yBase: b.yBase, yTop: b.yTop }));
  overlay.thrust = sol.thrustLine;
  warningLines(sol, upper, toe).forEach((w) => {
    if (w.at) overlay.marks.push({ at: w.at, n: w.n, text: w.headline });
  });
  return overlay;
}

/** The solution's warnings in words, numbered as their marks on the canvas. */
function warningLines(sol: RigorousFs, upper?: XY, toe?: XY) {
  return rigorousWarningLines(sol, upper, toe).map((w, i) => ({ ...w, n: i + 1 }));
}

/** One rigorous solution a reader can look at: on the drawn surface or on the critical circle. */
export interface SolutionChoice {
  key: string;
  label: string;
  sol: RigorousFs;
  overlay: SurfaceOverlay;
  /** Its warnings with their place, numbered as the canvas marks them. */
  lines: (RigorousWarningLine & { n: number })[];
}

const RIGOROUS_NAME = METHOD_SHORT;

/** Every rigorous solution a run holds: drawn surface first (what the reader drew), then searched, then circles. */
export function solutionChoices(part: RigorousRunPart | undefined): SolutionChoice[] {
  const out: SolutionChoice[] = [];
  if (!part) return out;
  const add = (key: string, label: string, sol: RigorousFs | undefined, line: XY[], upper?: XY, toe?: XY) => {
    if (!sol || sol.fs === null) return;
    const overlay = surfaceOverlay(line, sol, label, upper, toe);
    out.push({ key, label, sol, overlay, lines: warningLines(sol, upper, toe) });
  };
  const s = part.surface;
  for (const m of RIGOROUS)
    if (s) add(`surface-${m}`, `${RIGOROUS_NAME[m]}, drawn surface`, s.rigorous[m], s.surface, s.entry, s.exit);
  for (const m of RIGOROUS) {
    const on = part.searched[m];
    if (on?.surface)
      add(`searched-${m}`, `${RIGOROUS_NAME[m]}, searched surface`, on.solution, on.surface, on.entry, on.exit);
  }
  for (const m of RIGOROUS) {
    const on = part.circles[m];
    if (on) add(`circle-${m}`, `${RIGOROUS_NAME[m]}, critical circle`, on.solution, circleLine(on), on.entry, on.exit);
  }
  return out;
}

const RIGOROUS = ["spencer", "morgenstern-price"] as const;

/** The arc of a rigorous method's own critical circle from entry to exit, as a polyline. */
function circleLine(on: RigorousOn): XY[] {
  const flat = arcPoints(on.circle, on.entry, on.exit);
  const pts: XY[] = [];
  for (let i = 0; i + 1 < flat.length; i += 2) pts.push([flat[i], flat[i + 1]]);
  return pts;
}
