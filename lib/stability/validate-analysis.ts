/**
 * Analysis checks: slice count, grid and radii shapes, and the load case's own needs
 * (a drawdown needs a pre-drawdown phreatic line with a pool, and from ≥ to).
 */
import { MAX_SLICES } from "./defaults";
import type { GroundLine } from "./ground";
import { interpolatePolyline } from "./geometry";
import { fmt, issue, type Issue } from "./issues";
import type { Analysis, Water } from "./schema";
import { findPoolSide } from "./water";

const MAX_CIRCLES = 2_000_000;

/** Checks the analysis block, if any; `ground` is null when the regions are invalid. */
export function checkAnalysis(
  a: Analysis | undefined,
  water: Water | undefined,
  ground: GroundLine | null,
  errors: Issue[],
  warnings: Issue[],
): void {
  if (!a) return;
  if (a.slices !== undefined && !(a.slices >= 1 && a.slices <= MAX_SLICES)) {
    errors.push(
      issue(
        "slices-out-of-range",
        "analysis.slices",
        `analysis.slices = ${a.slices} must be a whole number from 1 to ${MAX_SLICES} (50 is usual).`,
      ),
    );
  }
  if (a.grid) {
    const g = a.grid;
    if (g.x2 < g.x1)
      errors.push(
        issue(
          "grid-order",
          "analysis.grid",
          `analysis.grid: x2 = ${fmt(g.x2)} is left of x1 = ${fmt(g.x1)}; swap them.`,
          [g.x1, g.y1],
        ),
      );
    if (g.y2 < g.y1)
      errors.push(
        issue(
          "grid-order",
          "analysis.grid",
          `analysis.grid: y2 = ${fmt(g.y2)} is below y1 = ${fmt(g.y1)}; swap them.`,
          [g.x1, g.y1],
        ),
      );
  }
  if (a.radii) {
    const r = a.radii;
    if ("r1" in r) {
      if (!(r.r1 > 0) || !(r.r2 > 0))
        errors.push(issue("radius-not-positive", "analysis.radii", "analysis.radii: r1 and r2 must be positive (m)."));
      else if (r.r2 < r.r1)
        errors.push(
          issue(
            "radii-order",
            "analysis.radii",
            `analysis.radii: r2 = ${fmt(r.r2)} is below r1 = ${fmt(r.r1)}; swap them.`,
          ),
        );
    } else if (a.grid && Math.max(r.tangentY1, r.tangentY2) >= a.grid.y2) {
      warnings.push(
        issue(
          "tangent-above-grid",
          "analysis.radii",
          "Some tangent elevations are above grid centres; those circles are skipped.",
        ),
      );
    }
    if (a.grid && a.grid.nx * a.grid.ny * r.n > MAX_CIRCLES) {
      errors.push(
        issue(
          "too-many-circles",
          "analysis",
          `The search would try ${a.grid.nx * a.grid.ny * r.n} circles; keep it under ${MAX_CIRCLES}.`,
        ),
      );
    }
  }
  if (a.case === "drawdown") checkDrawdown(a, water, ground, errors, warnings);
  if (a.case !== "drawdown" && a.drawdown)
    warnings.push(
      issue("drawdown-unused", "analysis.drawdown", 'analysis.drawdown is ignored unless analysis.case is "drawdown".'),
    );
}

function checkDrawdown(
  a: Analysis,
  water: Water | undefined,
  ground: GroundLine | null,
  errors: Issue[],
  warnings: Issue[],
): void {
  const d = a.drawdown;
  if (!d) {
    errors.push(
      issue(
        "drawdown-missing",
        "analysis.drawdown",
        "A drawdown case needs analysis.drawdown = {from, to}: the pool levels (m) before and after drawdown.",
      ),
    );
    return;
  }
  if (d.to > d.from)
    errors.push(
      issue(
        "drawdown-order",
        "analysis.drawdown",
        `analysis.drawdown: to = ${fmt(d.to)} m is above from = ${fmt(d.from)} m; the pool must fall.`,
      ),
    );
  const line = water?.phreatic;
  // Seepage water brings its line when solved (docs/engine.md §3(d)); the run itself refuses it unsolved.
  if (!line && water?.source === "seepage") return;
  if (!line) {
    errors.push(
      issue(
        "drawdown-needs-phreatic",
        "water.phreatic",
        "A drawdown case needs water.phreatic: the steady-seepage line before drawdown.",
      ),
    );
    return;
  }
  if (!ground) return;
  const pool = findPoolSide(line, ground, d.from);
  if (!pool) {
    errors.push(
      issue(
        "drawdown-no-pool",
        "water.phreatic",
        "Drawdown: the phreatic line is above the ground at neither side of the section, so there is no pool to draw down. Draw the line at the pool level over the upstream ground.",
      ),
    );
    return;
  }
  const xEdge = pool.side === "left" ? ground.x[0] : ground.x[ground.x.length - 1];
  const yEdge = interpolatePolyline(line, xEdge);
  if (Math.abs(yEdge - d.from) > 0.05) {
    warnings.push(
      issue(
        "drawdown-level-mismatch",
        "analysis.drawdown.from",
        `analysis.drawdown.from = ${fmt(d.from)} m but the phreatic line stands at ${fmt(yEdge)} m at the pool side; the line is used as drawn.`,
        [xEdge, yEdge],
      ),
    );
  }
}

/** Errors when the analysis lacks what a grid search needs (grid and radii). */
export function checkSearchSettings(a: Analysis | undefined): Issue[] {
  const out: Issue[] = [];
  if (!a) return [issue("analysis-missing", "analysis", "A grid search needs an analysis block with grid and radii.")];
  if (!a.grid)
    out.push(issue("grid-missing", "analysis.grid", "A grid search needs analysis.grid = {x1, y1, x2, y2, nx, ny}."));
  if (!a.radii)
    out.push(
      issue(
        "radii-missing",
        "analysis.radii",
        "A grid search needs analysis.radii: {tangentY1, tangentY2, n} or {r1, r2, n}.",
      ),
    );
  return out;
}
