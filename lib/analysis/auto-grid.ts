/**
 * A first search grid for a face, so a new run starts somewhere sensible: centres above the
 * face from a little beyond its toe to past the crest, tangent elevations from just below the
 * toe down to the foundation base (after the automatic grid of docs/engine.md §9): the top of any
 * impenetrable material under the face, else the section's base. A tangent inside impenetrable
 * material only gives circles the engine rejects. The engineer moves the grid; the search warns
 * when its minimum sits on the grid's edge.
 */
import type { SectionDocument } from "@/lib/stability";
import { baseElevation, groundProfile, type XY } from "./ground-profile";
import type { Side } from "./face";

export interface GridSuggestion {
  grid: { x1: number; y1: number; x2: number; y2: number; nx: number; ny: number };
  radii: { tangentY1: number; tangentY2: number; n: number };
}

const round = (v: number, step = 0.5) => Math.round(v / step) * step;
/** Clearance kept above impenetrable material (m), so a circle grazing it is not rejected on round-off. */
const ROCK_CLEARANCE = 0.25;

/**
 * The highest point of impenetrable material between xa and xb (m), or null when there is none.
 * Every edge of an impenetrable region is clipped to the band; its highest end counts.
 */
export function impenetrableTop(doc: SectionDocument, xa: number, xb: number): number | null {
  const rigid = new Set(doc.materials.filter((m) => m.model === "impenetrable").map((m) => m.id));
  let top: number | null = null;
  for (const region of doc.regions) {
    if (!rigid.has(region.material)) continue;
    const pts = region.points;
    for (let i = 0; i < pts.length; i++) {
      const [x1, y1] = pts[i];
      const [x2, y2] = pts[(i + 1) % pts.length];
      const lo = Math.max(Math.min(x1, x2), xa);
      const hi = Math.min(Math.max(x1, x2), xb);
      if (lo > hi) continue;
      const yAt = (x: number) => (x1 === x2 ? Math.max(y1, y2) : y1 + ((y2 - y1) * (x - x1)) / (x2 - x1));
      const y = Math.max(yAt(lo), yAt(hi));
      if (top === null || y > top) top = y;
    }
  }
  return top;
}

/** Crest (highest ground) and the toe on the side the soil slides toward. */
export function faceExtent(ground: XY[], direction: Side): { crest: XY; toe: XY } {
  let top = 0;
  for (let i = 1; i < ground.length; i++) if (ground[i][1] > ground[top][1]) top = i;
  // On a flat crest take the edge nearest the face.
  if (direction === "right") while (top + 1 < ground.length && ground[top + 1][1] >= ground[top][1] - 1e-9) top++;
  else while (top - 1 >= 0 && ground[top - 1][1] >= ground[top][1] - 1e-9) top--;
  const crest = ground[top];
  let toe = crest;
  const step = direction === "right" ? 1 : -1;
  for (let i = top + step; i >= 0 && i < ground.length; i += step) {
    if (ground[i][1] < toe[1] - 1e-9) toe = ground[i];
    else if (ground[i][1] > toe[1] + 1e-9) break;
  }
  return { crest, toe };
}

export function suggestGrid(
  doc: SectionDocument,
  direction: Side,
  density = { nx: 15, ny: 15, nr: 10 },
): GridSuggestion {
  const ground = groundProfile(doc);
  const { crest, toe } = faceExtent(ground, direction);
  const H = Math.max(crest[1] - toe[1], 1);
  const faceLength = Math.abs(crest[0] - toe[0]);
  // Centres lie above the face, shifted toward the side the soil moves from.
  const beyondToe = toe[0] + (direction === "right" ? 0.25 : -0.25) * faceLength;
  const pastCrest = crest[0] + (direction === "right" ? -0.5 : 0.5) * H;
  const x1 = round(Math.min(beyondToe, pastCrest));
  const x2 = round(Math.max(beyondToe, pastCrest));
  const y1 = round(crest[1] + 0.1 * H);
  const y2 = round(crest[1] + 1.5 * H);
  // Circles from this grid reach from beyond the toe to beyond the crest: look for rock across that width and H more.
  const rock = impenetrableTop(doc, Math.min(x1, toe[0], crest[0]) - H, Math.max(x2, toe[0], crest[0]) + H);
  const floor = rock !== null ? rock + ROCK_CLEARANCE : baseElevation(doc) + 0.5;
  const tangentY1 = round(toe[1] - 0.25);
  const tangentY2 = Math.ceil(Math.max(floor, toe[1] - H) / 0.5) * 0.5;
  return {
    grid: { x1, y1, x2: Math.max(x2, x1 + 1), y2: Math.max(y2, y1 + 1), nx: density.nx, ny: density.ny },
    // Rock standing up to the toe: the band keeps clear of it and rises above the toe instead.
    radii: { tangentY1: Math.max(tangentY1, tangentY2 + 0.5), tangentY2, n: density.nr },
  };
}
