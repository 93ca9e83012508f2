/**
 * Editing the search set-up on the canvas: the rectangle of trial centres moved or resized
 * by its corners, and the band of tangent elevations (or radii) moved by its two lines.
 * Every value lands on a 0.5 m step so run settings stay easy to read and to repeat.
 */
import type { Grid, Radii } from "@/lib/stability";

/** Snap step for grid corners and band lines, m. */
export const SNAP_STEP = 0.5;

/** Rounds to the nearest multiple of `step` (no negative zero). */
export function snap(v: number, step = SNAP_STEP): number {
  const s = Math.round(v / step) * step;
  return s === 0 ? 0 : Number(s.toFixed(6));
}

/** The grid with x1 ≤ x2 and y1 ≤ y2. */
export function normaliseGrid(g: Grid): Grid {
  return {
    ...g,
    x1: Math.min(g.x1, g.x2),
    x2: Math.max(g.x1, g.x2),
    y1: Math.min(g.y1, g.y2),
    y2: Math.max(g.y1, g.y2),
  };
}

export type GridCorner = "lower-left" | "lower-right" | "upper-left" | "upper-right";

export const GRID_CORNERS: readonly GridCorner[] = ["lower-left", "lower-right", "upper-left", "upper-right"];

/** Position (m) of a corner of the normalised grid. */
export function cornerPoint(g: Grid, corner: GridCorner): [number, number] {
  const n = normaliseGrid(g);
  return [corner.endsWith("left") ? n.x1 : n.x2, corner.startsWith("lower") ? n.y1 : n.y2];
}

/** The grid moved so its lower-left corner sits at the snapped (x, y); size unchanged. */
export function moveGrid(g: Grid, x: number, y: number): Grid {
  const n = normaliseGrid(g);
  const x1 = snap(x);
  const y1 = snap(y);
  return { ...n, x1, y1, x2: Number((x1 + (n.x2 - n.x1)).toFixed(6)), y2: Number((y1 + (n.y2 - n.y1)).toFixed(6)) };
}

/**
 * The grid with one corner dragged to (x, y), snapped; the opposite corner stays put and
 * the rectangle keeps at least one snap step in each direction.
 */
export function dragCorner(g: Grid, corner: GridCorner, x: number, y: number): Grid {
  const n = normaliseGrid(g);
  const sx = snap(x);
  const sy = snap(y);
  const out = { ...n };
  if (corner.endsWith("left")) out.x1 = Math.min(sx, n.x2 - SNAP_STEP);
  else out.x2 = Math.max(sx, n.x1 + SNAP_STEP);
  if (corner.startsWith("lower")) out.y1 = Math.min(sy, n.y2 - SNAP_STEP);
  else out.y2 = Math.max(sy, n.y1 + SNAP_STEP);
  return out;
}

export type BandKey = "tangentY1" | "tangentY2" | "r1" | "r2";

/** One line of the band: which setting it shows and at what elevation (m). */
export interface BandLine {
  key: BandKey;
  y: number;
}

/**
 * The band as two horizontal lines. Tangent elevations are drawn where they are; a radius
 * range is drawn as the lowest points of circles of those radii centred mid-grid, which is
 * where such circles reach deepest.
 */
export function bandLines(radii: Radii, g: Grid): BandLine[] {
  if ("tangentY1" in radii)
    return [
      { key: "tangentY1", y: radii.tangentY1 },
      { key: "tangentY2", y: radii.tangentY2 },
    ];
  const yMid = (g.y1 + g.y2) / 2;
  return [
    { key: "r1", y: yMid - radii.r1 },
    { key: "r2", y: yMid - radii.r2 },
  ];
}

/** The radii with one band line dragged to elevation y (m), snapped; a radius stays ≥ one step. */
export function dragBandLine(radii: Radii, g: Grid, key: BandKey, y: number): Radii {
  if ("tangentY1" in radii) {
    if (key !== "tangentY1" && key !== "tangentY2") return radii;
    return { ...radii, [key]: snap(y) };
  }
  if (key !== "r1" && key !== "r2") return radii;
  const yMid = (g.y1 + g.y2) / 2;
  return { ...radii, [key]: Math.max(SNAP_STEP, snap(yMid - y)) };
}

/** Plain words for a band line, for its label and its accessible name. */
export function bandLineLabel(line: BandLine): string {
  switch (line.key) {
    case "tangentY1":
      return `tangent level 1: ${line.y.toFixed(1)} m`;
    case "tangentY2":
      return `tangent level 2: ${line.y.toFixed(1)} m`;
    case "r1":
      return `deepest reach of radius 1: ${line.y.toFixed(1)} m`;
    case "r2":
      return `deepest reach of radius 2: ${line.y.toFixed(1)} m`;
  }
}
