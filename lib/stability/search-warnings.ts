/**
 * Warnings about a search's result (docs/engine.md §5 "Warnings", §4 "mα guard"): the minimum
 * on the grid's edge or at an end of the radius range, a critical mass near a section side,
 * a low mα, and methods without any valid circle.
 */
import { METHOD_LABEL } from "./method-labels";
import type { EngineWarning } from "./issues";
import { fmt } from "./issues";
import type { PreparedSection } from "./prepare";
import type { CircleFs } from "./results";
import type { AnalysisMethod, Grid } from "./schema";
import type { Scratch } from "./scratch";
import type { MethodState } from "./search-state";
import { evaluateCircle } from "./evaluate-circle";
import { circleRigorous } from "./rigorous-circle";

const LABEL = METHOD_LABEL;
/** Bishop's mα below this flags a suspect result (after Whitman & Bailey 1967). */
export const M_ALPHA_WARN = 0.2;

/** Edge warnings from the coarse-grid best of one method. */
export function gridEdgeWarnings(M: MethodState, grid: Grid, nr: number, out: EngineWarning[]): void {
  if (M.coarseIx < 0) return;
  const sides: string[] = [];
  const w = grid.x2 - grid.x1;
  const h = grid.y2 - grid.y1;
  if (grid.nx > 1 && M.coarseIx === 0) sides.push(`left (move the grid about ${fmt(w / 2)} m left)`);
  if (grid.nx > 1 && M.coarseIx === grid.nx - 1) sides.push(`right (move the grid about ${fmt(w / 2)} m right)`);
  if (grid.ny > 1 && M.coarseIy === 0) sides.push(`bottom (move the grid about ${fmt(h / 2)} m down)`);
  if (grid.ny > 1 && M.coarseIy === grid.ny - 1) sides.push(`top (move the grid about ${fmt(h / 2)} m up)`);
  if (sides.length > 0) {
    out.push({
      code: "minimum-on-grid-edge",
      message: `${LABEL[M.method]}: the lowest factor of safety lies on the ${sides.join(" and ")} edge of the centre grid; a lower one may lie outside it. Move the grid and run again.`,
    });
  }
  if (nr > 1 && (M.coarseIr === 0 || M.coarseIr === nr - 1)) {
    out.push({
      code: "minimum-at-radius-limit",
      message: `${LABEL[M.method]}: the lowest factor of safety uses the ${M.coarseIr === 0 ? "first" : "last"} radius of the range; widen the radii and run again.`,
    });
  }
}

/** Warnings about a method's critical circle itself. */
export function criticalWarnings(
  P: PreparedSection,
  S: Scratch,
  method: AnalysisMethod,
  crit: CircleFs | null,
  out: EngineWarning[],
): void {
  if (!crit) {
    out.push({
      code: "no-valid-circle",
      message: `${LABEL[method]}: no trial circle gave a factor of safety. Check that the grid lies above the slope and the radii reach the ground.`,
    });
    return;
  }
  const width = P.xmax - P.xmin;
  const lo = Math.min(crit.entry[0], crit.exit[0]);
  const hi = Math.max(crit.entry[0], crit.exit[0]);
  if (lo - P.xmin < 0.01 * width || P.xmax - hi < 0.01 * width) {
    out.push({
      code: "mass-near-section-side",
      message: `${LABEL[method]}: the critical slip mass comes within 1% of a side of the section; extend the section so the side does not limit the circle.`,
    });
  }
  if ((method === "spencer" || method === "morgenstern-price") && !crit.surface) {
    // The acceptability of the critical circle's solution: thrust line, tension, mα, with their places.
    if (evaluateCircle(P, S, crit.circle.xc, crit.circle.yc, crit.circle.r, true) === 0) {
      const r = circleRigorous(P, S, crit.circle, [method], P.analysis.interslice);
      for (const w of r.warnings) out.push({ code: w.code, message: `${w.message} (critical circle)` });
    }
  }
  if (method === "bishop") {
    evaluateCircle(P, S, crit.circle.xc, crit.circle.yc, crit.circle.r, true);
    if (S.minMa < M_ALPHA_WARN) {
      out.push({
        code: "m-alpha-low",
        message: `Bishop's simplified method: mα falls to ${S.minMa.toFixed(3)} (below ${M_ALPHA_WARN}) at x = ${fmt(S.minMaX)} m, base angle ${S.minMaAlpha.toFixed(1)}°, on the critical circle: exit too steep; move the grid or check with a method that satisfies force equilibrium.`,
      });
    }
  }
}
