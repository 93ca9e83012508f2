/**
 * Spencer and Morgenstern–Price in the grid search of circles (docs/engine.md §11): each method
 * keeps its own critical circle, map and lowest circles, like Bishop's, from the same trial circles.
 */
import { createGleSlices } from "./methods/gle";
import type { PreparedSection } from "./prepare";
import { createRigorousPick, rigorousOnCircle } from "./rigorous-circle";
import type { RigorousMethod } from "./schema";
import type { Scratch } from "./scratch";
import { createMethodState, recordFs, type MethodState } from "./search-state";

export interface RigorousSearch {
  methods: RigorousMethod[];
  states: MethodState[];
  /** Solves every rigorous method on the circle evaluateCircle has just accepted, and records each FS. */
  visit(S: Scratch, xc: number, yc: number, r: number, cell: number, ix: number, iy: number, ir: number): void;
  /** The last visited circle's FS of a method (NaN when none). */
  fsOf(method: RigorousMethod): number;
}

/** The rigorous part of a grid search, or null when the analysis asks for no rigorous method. */
export function createRigorousSearch(P: PreparedSection, cells: number, lowestCount: number): RigorousSearch | null {
  const methods = P.analysis.rigorous;
  if (methods.length === 0 || P.staged !== null) return null;
  const G = createGleSlices();
  const pick = createRigorousPick();
  const halfSine = P.analysis.interslice === "half-sine";
  const states = methods.map((m) => createMethodState(m, cells, lowestCount));
  const last = new Float64Array(methods.length).fill(NaN);
  return {
    methods,
    states,
    visit(S, xc, yc, r, cell, ix, iy, ir) {
      for (let k = 0; k < methods.length; k++) {
        const f = rigorousOnCircle(P, S, G, xc, yc, r, methods[k], halfSine, pick);
        last[k] = f;
        if (f > 0) recordFs(states[k], f, xc, yc, r, cell, ix, iy, ir);
      }
    },
    fsOf(method) {
      const k = methods.indexOf(method);
      return k >= 0 ? last[k] : NaN;
    },
  };
}
