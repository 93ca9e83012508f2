/**
 * Reservoir levels. The document has no separate pool: water standing above the ground is
 * simply the part of the phreatic line that lies above the ground surface. Setting a
 * reservoir level on one side rewrites the phreatic line on that side to run level at
 * that elevation from the section's edge to where it meets the face rising out of the pool.
 */
import type { Point, SectionDocument } from "@/lib/stability";
import type { EditResult } from "./document-edits";
import { setPhreatic } from "./document-edits";
import { groundAt, groundSurface } from "./ground-surface";

export type Side = "left" | "right";

/**
 * Where the ground, walked inward from the `side` edge, first reaches elevation y (m);
 * the section edge itself when the ground there already stands at or above y; null when
 * the ground never reaches y.
 */
export function shoreX(ground: readonly Point[], side: Side, y: number): number | null {
  const pts = side === "left" ? ground : [...ground].reverse();
  if (pts.length === 0) return null;
  if (pts[0][1] >= y) return pts[0][0];
  for (let i = 0; i + 1 < pts.length; i++) {
    const [a, b] = [pts[i], pts[i + 1]];
    if (b[1] >= y) return a[0] + ((b[0] - a[0]) * (y - a[1])) / (b[1] - a[1] || 1);
  }
  return null;
}

/**
 * Sets a level reservoir at elevation y (m) against the `side` edge of the section.
 * Phreatic points beyond the shore line on the far side are kept; without a phreatic
 * line, one is started that falls to the ground at the far edge.
 */
export function setReservoirLevel(doc: SectionDocument, side: Side, y: number): EditResult {
  if (!Number.isFinite(y)) return { ok: false, reason: "Type a reservoir level in metres." };
  const ground = groundSurface(doc.regions);
  if (ground.length < 2) return { ok: false, reason: "Draw the regions first: a reservoir needs a ground surface." };
  const shore = shoreX(ground, side, y);
  if (shore === null) {
    return { ok: false, reason: `At ${y.toFixed(2)} m the water would cover the whole section. Choose a lower level.` };
  }
  const xmin = ground[0][0];
  const xmax = ground[ground.length - 1][0];
  const edge = side === "left" ? xmin : xmax;
  const far = side === "left" ? xmax : xmin;
  const beyond = (x: number) => (side === "left" ? x > shore : x < shore);
  const old = doc.water?.phreatic ?? [];
  let rest = old.filter((p) => beyond(p[0]));
  if (rest.length === 0) {
    const farGround = groundAt(ground, far) ?? y;
    rest = shore === far ? [] : [[far, Math.min(y, farGround)]];
  }
  const pool: Point[] =
    shore === edge
      ? [[edge, y]]
      : [
          [edge, y],
          [shore, y],
        ];
  const line = side === "left" ? [...pool, ...rest] : [...rest.slice().sort((a, b) => a[0] - b[0]), ...pool.reverse()];
  if (line.length < 2)
    return { ok: false, reason: "The level leaves no room for a phreatic line. Choose another level." };
  return { ok: true, doc: setPhreatic(doc, line) };
}

/** The reservoir level currently set on a side: the phreatic elevation at that edge if it is ponded. */
export function reservoirLevel(doc: SectionDocument, side: Side): number | null {
  const line = doc.water?.phreatic;
  const ground = groundSurface(doc.regions);
  if (!line || line.length < 2 || ground.length < 2) return null;
  const p = side === "left" ? line[0] : line[line.length - 1];
  const g = groundAt(ground, p[0]);
  return g !== null && p[1] > g ? p[1] : null;
}

/** Which side a click at x sets the reservoir on: the half of the section it falls in. */
export function sideOf(ground: readonly Point[], x: number): Side {
  if (ground.length === 0) return "left";
  return x <= (ground[0][0] + ground[ground.length - 1][0]) / 2 ? "left" : "right";
}

/** The stretch a reservoir at y on `side` would cover (from the edge to the shore), or null. */
export function reservoirSpan(ground: readonly Point[], side: Side, y: number): { x1: number; x2: number } | null {
  const shore = shoreX(ground, side, y);
  if (shore === null || ground.length < 2) return null;
  const edge = side === "left" ? ground[0][0] : ground[ground.length - 1][0];
  return { x1: Math.min(edge, shore), x2: Math.max(edge, shore) };
}
