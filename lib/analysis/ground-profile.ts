/**
 * A light ground profile for set-up helpers (grid suggestion, face detection): the highest
 * polygon edge at every vertex x. The engine derives the exact ground itself; this only has
 * to be good enough to place a search grid.
 */
import type { SectionDocument } from "@/lib/stability";

export type XY = [number, number];

function topAt(doc: SectionDocument, x: number): number {
  let best = -Infinity;
  for (const region of doc.regions) {
    const pts = region.points;
    for (let i = 0; i < pts.length; i++) {
      const [x1, y1] = pts[i];
      const [x2, y2] = pts[(i + 1) % pts.length];
      if (x < Math.min(x1, x2) || x > Math.max(x1, x2)) continue;
      const y = x1 === x2 ? Math.max(y1, y2) : y1 + ((y2 - y1) * (x - x1)) / (x2 - x1);
      if (y > best) best = y;
    }
  }
  return best;
}

/** Ground points left to right (m). */
export function groundProfile(doc: SectionDocument): XY[] {
  const xs = [...new Set(doc.regions.flatMap((r) => r.points.map((p) => p[0])))].sort((a, b) => a - b);
  return xs.map((x) => [x, topAt(doc, x)] as XY).filter((p) => Number.isFinite(p[1]));
}

/** Lowest elevation of any region (the section's base), m. */
export function baseElevation(doc: SectionDocument): number {
  return Math.min(...doc.regions.flatMap((r) => r.points.map((p) => p[1])));
}
