/**
 * The search grid follows the geometry: every job gets the automatic grid of its own section
 * (lib/analysis/auto-grid.ts, after docs/engine.md §9), is moved once by half its size when the
 * minimum lies on its edge, and reports how much one grid step changes FS near the minimum.
 */
import { suggestGrid } from "@/lib/analysis/auto-grid";
import type { FsMap, Grid, Radii, SectionDocument } from "@/lib/stability";
import type { DesignFace } from "./sweep-plan";

export interface JobGrid {
  grid: Grid;
  radii: Radii;
}

/** Upstream soil slides left (reservoir on the left), downstream soil right. */
export function slideDirection(face: DesignFace): "left" | "right" {
  return face === "upstream" ? "left" : "right";
}

export function gridForFace(
  doc: SectionDocument,
  face: DesignFace,
  density: { nx: number; ny: number; radii: number },
): JobGrid {
  const s = suggestGrid(doc, slideDirection(face), { nx: density.nx, ny: density.ny, nr: density.radii });
  return { grid: s.grid, radii: s.radii };
}

/** Row-major index of the lowest finite value of a map, or −1. */
function argmin(map: FsMap): number {
  let best = -1;
  for (let i = 0; i < map.values.length; i++) {
    const v = map.values[i];
    if (v !== null && (best < 0 || v < (map.values[best] as number))) best = i;
  }
  return best;
}

/**
 * The grid moved half its width (or height) toward the edge the minimum sits on, or null when
 * the minimum is inside. The bottom edge is not moved down below the crest: centres there give
 * circles that leave the crest almost vertically.
 */
export function shiftTowardEdge(grid: Grid, map: FsMap, crestElevation: number): Grid | null {
  const i = argmin(map);
  if (i < 0) return null;
  const ix = i % map.nx;
  const iy = Math.floor(i / map.nx);
  const w = grid.x2 - grid.x1;
  const h = grid.y2 - grid.y1;
  let dx = 0;
  let dy = 0;
  if (map.nx > 1 && ix === 0) dx = -w / 2;
  if (map.nx > 1 && ix === map.nx - 1) dx = w / 2;
  if (map.ny > 1 && iy === map.ny - 1) dy = h / 2;
  if (map.ny > 1 && iy === 0 && grid.y1 - h / 2 > crestElevation) dy = -h / 2;
  if (dx === 0 && dy === 0) return null;
  return { ...grid, x1: grid.x1 + dx, x2: grid.x2 + dx, y1: grid.y1 + dy, y2: grid.y2 + dy };
}

/**
 * How far FS may move by one grid step near the minimum: the largest rise from the lowest centre
 * to its finite neighbours (8 of them inside the grid). Null when the minimum has no neighbour.
 */
export function gridResolution(map: FsMap): number | null {
  const i = argmin(map);
  if (i < 0) return null;
  const ix = i % map.nx;
  const iy = Math.floor(i / map.nx);
  const low = map.values[i] as number;
  let rise: number | null = null;
  for (let dy = -1; dy <= 1; dy++) {
    for (let dx = -1; dx <= 1; dx++) {
      const x = ix + dx;
      const y = iy + dy;
      if ((dx === 0 && dy === 0) || x < 0 || y < 0 || x >= map.nx || y >= map.ny) continue;
      const v = map.values[y * map.nx + x];
      if (v !== null) rise = Math.max(rise ?? 0, v - low);
    }
  }
  return rise;
}
