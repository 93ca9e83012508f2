/** The extent of a section, for fitting it into the view. */
import type { Point, SectionDocument } from "@/lib/stability";
import type { Bounds } from "./view-transform";

/** Shown when there is nothing to fit yet: a 60 m × 30 m sheet. */
export const EMPTY_BOUNDS: Bounds = { minX: 0, minY: 0, maxX: 60, maxY: 30 };

export function pointsBounds(points: Iterable<Point>): Bounds | null {
  let b: Bounds | null = null;
  for (const [x, y] of points) {
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    if (!b) b = { minX: x, minY: y, maxX: x, maxY: y };
    else
      b = {
        minX: Math.min(b.minX, x),
        minY: Math.min(b.minY, y),
        maxX: Math.max(b.maxX, x),
        maxY: Math.max(b.maxY, y),
      };
  }
  return b;
}

/** Bounds of every region and the phreatic line, or EMPTY_BOUNDS when there are none. */
export function documentBounds(doc: SectionDocument): Bounds {
  const pts: Point[] = [...doc.regions.flatMap((r) => r.points), ...(doc.water?.phreatic ?? [])];
  return pointsBounds(pts) ?? EMPTY_BOUNDS;
}
