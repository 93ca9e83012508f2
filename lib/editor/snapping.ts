/**
 * Snapping for drawn and dragged points: first to an existing vertex within a few screen
 * pixels (so neighbouring regions share edges exactly), otherwise to the grid.
 */
import type { Point } from "@/lib/stability";
import { worldToScreen, type ViewTransform } from "./view-transform";

/** Default grid step in metres and the pixel radius that catches a vertex. */
export const DEFAULT_GRID_STEP = 0.5;
export const VERTEX_SNAP_PX = 8;
/** Arrow keys move by this much when the grid is off (m). */
export const FREE_NUDGE_STEP = 0.1;

export interface SnapOptions {
  /** Grid step in metres; 0 or less turns grid snapping off. */
  gridStep: number;
  /** Points that attract the cursor (world, m). */
  vertices: readonly Point[];
  view: ViewTransform;
  tolerancePx: number;
}

export type SnapKind = "vertex" | "grid" | "none";

export interface SnapResult {
  point: Point;
  kind: SnapKind;
  /** Index into `vertices` when kind is "vertex". */
  vertexIndex?: number;
}

/** Drops float dust such as 0.30000000000000004 that grid arithmetic leaves behind. */
function tidy(v: number): number {
  const r = Math.round(v * 1e9) / 1e9;
  return Object.is(r, -0) ? 0 : r;
}

/** Rounds both coordinates to the nearest multiple of `step` (m); step ≤ 0 leaves p as is. */
export function snapToGrid(p: Point, step: number): Point {
  if (!(step > 0)) return [p[0], p[1]];
  return [tidy(Math.round(p[0] / step) * step), tidy(Math.round(p[1] / step) * step)];
}

/**
 * Index of the vertex nearest to p on screen, if it lies within tolerancePx pixels;
 * otherwise -1. Distances are measured on screen so the catch radius feels the same
 * at every zoom and exaggeration.
 */
export function nearestVertexWithin(
  p: Point,
  vertices: readonly Point[],
  view: ViewTransform,
  tolerancePx: number,
): number {
  const [sx, sy] = worldToScreen(view, p[0], p[1]);
  let best = -1;
  let bestD = tolerancePx;
  for (let i = 0; i < vertices.length; i++) {
    const [vx, vy] = worldToScreen(view, vertices[i][0], vertices[i][1]);
    const d = Math.hypot(vx - sx, vy - sy);
    if (d <= bestD) {
      best = i;
      bestD = d;
    }
  }
  return best;
}

/** Snaps p to a nearby vertex, else to the grid, else leaves it. */
export function snapPoint(p: Point, opts: SnapOptions): SnapResult {
  const i = nearestVertexWithin(p, opts.vertices, opts.view, opts.tolerancePx);
  if (i >= 0) return { point: [opts.vertices[i][0], opts.vertices[i][1]], kind: "vertex", vertexIndex: i };
  if (opts.gridStep > 0) return { point: snapToGrid(p, opts.gridStep), kind: "grid" };
  return { point: [p[0], p[1]], kind: "none" };
}

/** The distance arrow keys move a vertex: the grid step, or a fine step with the grid off. */
export function nudgeStep(gridStep: number): number {
  return gridStep > 0 ? gridStep : FREE_NUDGE_STEP;
}
