/**
 * A first search grid for a face, so a new run starts somewhere sensible: centres above the
 * face from a little beyond its toe to past the crest, tangent elevations from just below the
 * toe down to the section's base (after the automatic grid of docs/engine.md §9). The engineer moves
 * it; the search warns when its minimum sits on the grid's edge.
 */
import type { SectionDocument } from "../stability";
import { baseElevation, groundProfile, type XY } from "./ground-profile";
import type { Side } from "./face";

export interface GridSuggestion {
  grid: { x1: number; y1: number; x2: number; y2: number; nx: number; ny: number };
  radii: { tangentY1: number; tangentY2: number; n: number };
}

const round = (v: number, step = 0.5) => Math.round(v / step) * step;

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
  const base = baseElevation(doc);
  const tangentY1 = round(toe[1] - 0.25);
  const tangentY2 = round(Math.max(base + 0.5, toe[1] - H));
  return {
    grid: { x1, y1, x2: Math.max(x2, x1 + 1), y2: Math.max(y2, y1 + 1), nx: density.nx, ny: density.ny },
    radii: { tangentY1, tangentY2: Math.min(tangentY2, tangentY1 - 0.5), n: density.nr },
  };
}
