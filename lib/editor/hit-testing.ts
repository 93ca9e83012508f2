/**
 * Hit testing in screen pixels, so a click catches a vertex or an edge within the same
 * distance at any zoom, plus point-in-polygon in metres for picking a region.
 */
import type { Point, SectionDocument } from "@/lib/stability";
import { allVertices, isClosed, ownerPoints, sameOwner, type Owner, type VertexRef } from "./refs";
import { screenToWorld, worldToScreen, type ViewTransform } from "./view-transform";

/** Distance from p to segment ab, and the parameter t in [0, 1] of the closest point. */
export function distanceToSegment(p: Point, a: Point, b: Point): { distance: number; t: number } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.min(1, Math.max(0, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return { distance: Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy)), t };
}

/** Even-odd rule; points on the boundary may fall either way. */
export function pointInPolygon(p: Point, poly: readonly Point[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [xi, yi] = poly[i];
    const [xj, yj] = poly[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/**
 * The vertex under the screen point (sx, sy) within tolerancePx. Where vertices coincide
 * (shared by two regions) the one of `prefer` wins, so the selected region keeps its grip.
 */
export function hitVertex(
  doc: SectionDocument,
  view: ViewTransform,
  sx: number,
  sy: number,
  tolerancePx: number,
  prefer?: Owner | null,
): VertexRef | null {
  let best: VertexRef | null = null;
  let bestD = Infinity;
  for (const { ref, point } of allVertices(doc)) {
    const [vx, vy] = worldToScreen(view, point[0], point[1]);
    const d = Math.hypot(vx - sx, vy - sy);
    if (d > tolerancePx) continue;
    const owner: Owner = ref.kind === "region" ? { kind: "region", region: ref.region } : { kind: "phreatic" };
    // Half a pixel of bias decides ties between coincident vertices.
    const biased = prefer && sameOwner(owner, prefer) ? d - 0.5 : d;
    if (biased < bestD) {
      best = ref;
      bestD = biased;
    }
  }
  return best;
}

/** An edge hit: the new vertex would go after index `after`, at `point` (m). */
export interface EdgeHit {
  after: number;
  point: Point;
  distancePx: number;
}

/** The edge of `owner` nearest to (sx, sy) within tolerancePx, with the projected point. */
export function hitEdge(
  doc: SectionDocument,
  owner: Owner,
  view: ViewTransform,
  sx: number,
  sy: number,
  tolerancePx: number,
): EdgeHit | null {
  const pts = ownerPoints(doc, owner);
  if (!pts || pts.length < 2) return null;
  const screen = pts.map((p) => worldToScreen(view, p[0], p[1]));
  const edges = isClosed(owner) ? pts.length : pts.length - 1;
  let best: EdgeHit | null = null;
  for (let i = 0; i < edges; i++) {
    const a = screen[i];
    const b = screen[(i + 1) % pts.length];
    const { distance, t } = distanceToSegment([sx, sy], a, b);
    if (distance > tolerancePx || (best && distance >= best.distancePx)) continue;
    const point = screenToWorld(view, a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1]));
    best = { after: i, point, distancePx: distance };
  }
  return best;
}

/** The topmost region (last drawn) containing the world point, or -1. */
export function hitRegion(doc: SectionDocument, p: Point): number {
  for (let i = doc.regions.length - 1; i >= 0; i--) {
    if (pointInPolygon(p, doc.regions[i].points)) return i;
  }
  return -1;
}
