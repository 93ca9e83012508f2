/**
 * Spencer and Morgenstern–Price in the grid search of circles (docs/engine.md §11): each method
 * keeps its own critical circle, map and lowest circles, like Bishop's, from the same trial circles.
 */
import { METHOD_LABEL } from "./method-labels";
import { createGleSlices } from "./methods/gle";
import type { PreparedSection } from "./prepare";
import { createRigorousPick, rigorousOnCircle } from "./rigorous-circle";
import type { RigorousMethod } from "./schema";
import type { Scratch } from "./scratch";
import { createMethodState, recordFs, type MethodState } from "./search-state";
import { REASONS } from "./status";
import { M_ALPHA_WARN } from "./search-warnings";
import type { EngineWarning } from "./issues";

const LABEL = METHOD_LABEL;

/** One warning per method that found no solution on some circles Bishop's method accepted. */
export function rigorousFailureWarnings(rig: RigorousSearch, out: EngineWarning[]): void {
  rig.methods.forEach((m, k) => {
    const parts = Object.entries(rig.failures[k]).map(([why, n]) => `${n} ${why}`);
    if (parts.length === 0) return;
    out.push({
      code: "rigorous-no-solution",
      message:
        `${LABEL[m]}: no acceptable solution on some circles that have a Bishop factor (${parts.join(", ")}); ` +
        "they are left out of its search.",
    });
  });
}

export interface RigorousSearch {
  methods: RigorousMethod[];
  states: MethodState[];
  /** Solves every rigorous method on the circle evaluateCircle has just accepted, and records each FS. */
  visit(S: Scratch, xc: number, yc: number, r: number, cell: number, ix: number, iy: number, ir: number): void;
  /** The last visited circle's FS of a method (NaN when none). */
  fsOf(method: RigorousMethod): number;
  /** Circles Bishop accepted on which a method found no solution, per method and reason. */
  failures: Record<string, number>[];
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
  const failures = methods.map(() => ({}) as Record<string, number>);
  return {
    methods,
    states,
    failures,
    visit(S, xc, yc, r, cell, ix, iy, ir) {
      for (let k = 0; k < methods.length; k++) {
        const f = rigorousOnCircle(P, S, G, xc, yc, r, methods[k], halfSine, pick);
        last[k] = f > 0 && pick.minMa >= M_ALPHA_WARN ? f : NaN;
        // A search keeps no solution whose mα falls below 0.2: there the equations admit spurious
        // roots with huge base forces (the same guard as the surfaces search).
        if (f > 0 && pick.minMa >= M_ALPHA_WARN) recordFs(states[k], f, xc, yc, r, cell, ix, iy, ir);
        else if (f > 0) failures[k]["m-alpha-below-0.2"] = (failures[k]["m-alpha-below-0.2"] ?? 0) + 1;
        else if (S.fsB > 0) {
          const why = REASONS[pick.status] ?? "not-converged";
          failures[k][why] = (failures[k][why] ?? 0) + 1;
        }
      }
    },
    fsOf(method) {
      const k = methods.indexOf(method);
      return k >= 0 ? last[k] : NaN;
    },
  };
}
