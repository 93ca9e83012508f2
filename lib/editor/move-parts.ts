/**
 * Whole parts of a section moved by a drag: a region, and a surcharge strip along the ground.
 * Pure: each returns a new document and leaves the one given untouched.
 */
import type { Point, SectionDocument } from "@/lib/stability";
import { groundAt } from "./ground-surface";
import { screenToWorld, worldToScreen, type ViewTransform } from "./view-transform";

/** Two coordinates within this (m) are one shared corner (as document-edits.ts's shared-vertex rule). */
const SAME_POINT_M = 1e-9;
/** How far above the ground (px) a surcharge's band is drawn and can be picked up. */
export const SURCHARGE_BAND_PX = 22;

/**
 * Moves region `index` by (dx, dy) (m). Corners of other regions that lie on one of its corners
 * move with it, so shared boundaries stay shared and the neighbours stretch to follow; with
 * `detach` the region moves alone.
 */
export function moveRegion(
  doc: SectionDocument,
  index: number,
  dx: number,
  dy: number,
  detach = false,
): SectionDocument {
  const region = doc.regions[index];
  if (!region) throw new Error(`region ${index} does not exist`);
  const corners = region.points;
  const onCorner = (q: Point) =>
    corners.some((c) => Math.abs(q[0] - c[0]) <= SAME_POINT_M && Math.abs(q[1] - c[1]) <= SAME_POINT_M);
  const shift = (q: Point): Point => [q[0] + dx, q[1] + dy];
  return {
    ...doc,
    regions: doc.regions.map((r, i) => {
      if (i === index) return { ...r, points: r.points.map(shift) };
      if (detach || !r.points.some(onCorner)) return r;
      return { ...r, points: r.points.map((q) => (onCorner(q) ? shift(q) : q)) };
    }),
  };
}

/** The x range (m) the section's regions span, or null without regions. */
function sectionSpan(doc: SectionDocument): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const r of doc.regions)
    for (const p of r.points) {
      if (p[0] < lo) lo = p[0];
      if (p[0] > hi) hi = p[0];
    }
  return lo < hi ? [lo, hi] : null;
}

/**
 * Moves surcharge `index` by dx (m) along the section, keeping its width and pressure; it stops
 * at the section's sides, since a load beyond them would act on nothing.
 */
export function moveSurcharge(doc: SectionDocument, index: number, dx: number): SectionDocument {
  const list = doc.loads?.surcharges ?? [];
  const s = list[index];
  if (!s) throw new Error(`surcharge ${index} does not exist`);
  const span = sectionSpan(doc);
  const left = Math.min(s.x1, s.x2);
  const right = Math.max(s.x1, s.x2);
  let d = dx;
  if (span) d = Math.min(Math.max(d, span[0] - left), span[1] - right);
  const moved = { ...s, x1: s.x1 + d, x2: s.x2 + d };
  return { ...doc, loads: { ...doc.loads, surcharges: list.map((t, i) => (i === index ? moved : t)) } };
}

/**
 * The surcharge whose band (drawn SURCHARGE_BAND_PX above the ground over its strip) holds the
 * screen point (sx, sy), the last drawn first; −1 when none.
 */
export function hitSurcharge(
  doc: SectionDocument,
  ground: readonly Point[],
  view: ViewTransform,
  sx: number,
  sy: number,
): number {
  const list = doc.loads?.surcharges ?? [];
  const [x] = screenToWorld(view, sx, sy);
  const inBand = (gy: number) => sy <= gy + 2 && sy >= gy - SURCHARGE_BAND_PX - 2;
  for (let i = list.length - 1; i >= 0; i--) {
    const s = list[i];
    if (x < Math.min(s.x1, s.x2) || x > Math.max(s.x1, s.x2)) continue;
    const yg = groundAt(ground, x);
    if (yg === null) continue;
    // Screen y grows downward: the band runs from the ground up to SURCHARGE_BAND_PX above it.
    if (inBand(worldToScreen(view, x, yg)[1])) return i;
  }
  return -1;
}
