/**
 * The map of lowest FS at each centre, turned into coloured cells. Each centre owns the
 * rectangle halfway to its neighbours; the colour range runs from the lowest FS on the map
 * to 1.5 above it, so the differences near the minimum, the ones that matter, are not
 * washed out by a few very high values. Cells above the range take the top colour.
 */
import type { FsMap } from "@/lib/stability";
import { FS_MAP_SCALE, sampleScale, rgbToHex, type ColourScale } from "./colour-scale";

/** Width of the colour range above the map's minimum FS. */
export const FS_RANGE_SPAN = 1.5;
/** The narrowest range shown, so a flat map still gets a readable legend. */
export const FS_RANGE_MIN_SPAN = 0.1;

/** The FS values the colour scale spans; `clipped` when some values lie above `hi`. */
export interface FsRange {
  lo: number;
  hi: number;
  clipped: boolean;
}

/** One centre's cell, in metres; `fs` null where no circle from that centre was valid. */
export interface FsCell {
  ix: number;
  iy: number;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  fs: number | null;
  /** `#rrggbb`, or null for an empty cell. */
  colour: string | null;
}

/**
 * The colour range of a map: [min, min + 1.5], shortened to the map's maximum when that is
 * lower, and stretched to show `requiredFs` when it lies a little above the range.
 * @returns null when the map has no value
 */
export function fsRange(values: ReadonlyArray<number | null>, requiredFs?: number): FsRange | null {
  let min = Infinity;
  let max = -Infinity;
  for (const v of values)
    if (v !== null && Number.isFinite(v)) {
      min = Math.min(min, v);
      max = Math.max(max, v);
    }
  if (!Number.isFinite(min)) return null;
  let hi = Math.min(max, min + FS_RANGE_SPAN);
  if (requiredFs !== undefined && requiredFs > hi && requiredFs <= min + 2 * FS_RANGE_SPAN)
    hi = requiredFs + FS_RANGE_MIN_SPAN;
  hi = Math.max(hi, min + FS_RANGE_MIN_SPAN);
  return { lo: min, hi, clipped: max > hi };
}

/** Position of an FS on the scale, 0 at `lo` and 1 at `hi` (clipped). */
export function fsToUnit(fs: number, range: FsRange): number {
  return Math.min(1, Math.max(0, (fs - range.lo) / (range.hi - range.lo)));
}

/** Colour of an FS value on the map's scale. */
export function fsColour(fs: number, range: FsRange, scale: ColourScale = FS_MAP_SCALE): string {
  return rgbToHex(sampleScale(scale, fsToUnit(fs, range)));
}

/** Cell edges along one axis: halfway between nodes, half a spacing beyond the end nodes. */
export function cellEdges(nodes: readonly number[], fallback: number): number[] {
  const n = nodes.length;
  if (n === 0) return [];
  if (n === 1) return [nodes[0] - fallback / 2, nodes[0] + fallback / 2];
  const edges = [nodes[0] - (nodes[1] - nodes[0]) / 2];
  for (let i = 0; i + 1 < n; i++) edges.push((nodes[i] + nodes[i + 1]) / 2);
  edges.push(nodes[n - 1] + (nodes[n - 1] - nodes[n - 2]) / 2);
  return edges;
}

/**
 * Every centre's cell with its colour.
 * @param map the engine's minimum-FS map (values row by row, values[iy·nx + ix])
 */
export function fsMapCells(map: FsMap, range: FsRange | null, scale: ColourScale = FS_MAP_SCALE): FsCell[] {
  const spanX = map.xs.length > 1 ? Math.abs(map.xs[map.xs.length - 1] - map.xs[0]) / (map.xs.length - 1) : 0;
  const spanY = map.ys.length > 1 ? Math.abs(map.ys[map.ys.length - 1] - map.ys[0]) / (map.ys.length - 1) : 0;
  // A single row or column borrows the other axis's spacing, or 1 m, so its cells stay visible.
  const fallback = spanX || spanY || 1;
  const ex = cellEdges(map.xs, spanY || fallback);
  const ey = cellEdges(map.ys, spanX || fallback);
  const cells: FsCell[] = [];
  for (let iy = 0; iy < map.ny; iy++) {
    for (let ix = 0; ix < map.nx; ix++) {
      const v = map.values[iy * map.nx + ix];
      const fs = v === null || v === undefined || !Number.isFinite(v) ? null : v;
      cells.push({
        ix,
        iy,
        x1: Math.min(ex[ix], ex[ix + 1]),
        x2: Math.max(ex[ix], ex[ix + 1]),
        y1: Math.min(ey[iy], ey[iy + 1]),
        y2: Math.max(ey[iy], ey[iy + 1]),
        fs,
        colour: fs === null || range === null ? null : fsColour(fs, range, scale),
      });
    }
  }
  return cells;
}
