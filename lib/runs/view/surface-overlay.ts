/**
 * What the run canvas draws for a slip surface and one rigorous solution on it, in metres: the
 * surface, its slice sides, the line of thrust, and a numbered mark at each warning's place.
 */
import type { RigorousFs, XY } from "@/lib/stability";
import type { RigorousRunPart } from "@/lib/runs/record/rigorous-part";
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

const RIGOROUS_NAME = { spencer: "Spencer", "morgenstern-price": "Morgenstern–Price" } as const;

/** Every rigorous solution a run holds, drawn surface first (it is what the reader drew). */
export function solutionChoices(part: RigorousRunPart | undefined): SolutionChoice[] {
  const out: SolutionChoice[] = [];
  const s = part?.surface;
  for (const m of ["spencer", "morgenstern-price"] as const) {
    const sol = s?.rigorous[m];
    if (s && sol && sol.fs !== null) {
      const label = `${RIGOROUS_NAME[m]}, drawn surface`;
      const overlay = surfaceOverlay(s.surface, sol, "Drawn slip surface", s.entry, s.exit);
      out.push({ key: `surface-${m}`, label, sol, overlay, lines: warningLines(sol, s.entry, s.exit) });
    }
  }
  const c = part?.onCircle;
  for (const m of ["spencer", "morgenstern-price"] as const) {
    const sol = c?.rigorous[m];
    if (c && sol && sol.fs !== null) {
      const label = `${RIGOROUS_NAME[m]}, critical circle`;
      const ends = sol.boundaries.length > 1 ? sol.boundaries : null;
      const a: XY | undefined = ends ? [ends[0].x, ends[0].yTop] : undefined;
      const b: XY | undefined = ends ? [ends[ends.length - 1].x, ends[ends.length - 1].yTop] : undefined;
      // Boundaries run left to right; the upper end is the higher of the two.
      const [upper, toe] = a && b && a[1] < b[1] ? [b, a] : [a, b];
      const overlay = surfaceOverlay([], sol, "Critical circle", upper, toe);
      out.push({ key: `circle-${m}`, label, sol, overlay, lines: warningLines(sol, upper, toe) });
    }
  }
  return out;
}
