/**
 * Which face is which. Scarpline names faces as the trade does: the upstream face holds the
 * reservoir, the downstream face is dry. The reservoir side is read off the phreatic line
 * (higher water on the reservoir side); sliding on a face moves soil away from the crest.
 */
import type { SectionDocument, Water } from "@/lib/stability";
import { waterConditionsOf } from "@/lib/sections/water-conditions";

export type Face = "upstream" | "downstream";
export type Side = "left" | "right";

/**
 * The side of the reservoir, or null when no water of the section has a phreatic line to tell
 * (the drawn water first, then each named water condition).
 */
export function reservoirSide(doc: SectionDocument): Side | null {
  for (const water of [doc.water, ...waterConditionsOf(doc).map((c) => c.water)]) {
    const side = sideOfLine(water);
    if (side) return side;
  }
  return null;
}

function sideOfLine(water: Water | undefined): Side | null {
  const line = water?.phreatic;
  if (!line || line.length < 2) return null;
  const first = line[0][1];
  const last = line[line.length - 1][1];
  if (Math.abs(first - last) < 1e-6) return null;
  return first > last ? "left" : "right";
}

/**
 * The engine's sliding direction for a face (docs/engine.md §1: reservoir on the left means
 * downstream = right, upstream = left). Without a reservoir the left face is called upstream.
 */
export function directionForFace(doc: SectionDocument, face: Face): Side {
  const side = reservoirSide(doc) ?? "left";
  const upstreamSlidesToward: Side = side;
  if (face === "upstream") return upstreamSlidesToward;
  return side === "left" ? "right" : "left";
}
