/**
 * Choosing things in the drawing without a pointer. Tab walks the items (each region in the
 * order the side panel numbers them, then the phreatic line); an arrow key on an item with no
 * vertex chosen picks the vertex furthest that way, which is where an eye looking at the
 * drawing would expect the arrow to land.
 */
import type { Point, SectionDocument } from "@/lib/stability";
import { ownerOf, ownerPoints, type Owner, type Selection } from "./refs";

/** Everything Tab can stop on, in order. */
export function selectableItems(doc: SectionDocument): Owner[] {
  const items: Owner[] = doc.regions.map((_, region) => ({ kind: "region", region }));
  if ((doc.water?.phreatic?.length ?? 0) > 0) items.push({ kind: "phreatic" });
  return items;
}

function itemIndex(items: readonly Owner[], sel: Selection | null): number {
  if (!sel) return -1;
  const owner = ownerOf(sel);
  return items.findIndex((o) =>
    o.kind === "phreatic" ? owner.kind === "phreatic" : owner.kind === "region" && owner.region === o.region,
  );
}

/**
 * The item after (delta = 1) or before (delta = -1) the selected one, as a whole-item selection.
 * "leave" means the walk ran off an end: focus should move on from the drawing, so the drawing
 * never traps the keyboard. "clear" means stepping back before the first item: nothing selected.
 */
export function stepItem(doc: SectionDocument, sel: Selection | null, delta: 1 | -1): Selection | "leave" | "clear" {
  const items = selectableItems(doc);
  const at = itemIndex(items, sel);
  if (delta > 0) {
    const next = items[at + 1];
    if (!next) return "leave";
    return next.kind === "region" ? { kind: "region", region: next.region, vertex: null } : { ...next, vertex: null };
  }
  if (at < 0) return "leave";
  if (at === 0) return "clear";
  const prev = items[at - 1];
  return prev.kind === "region" ? { kind: "region", region: prev.region, vertex: null } : { ...prev, vertex: null };
}

/** Index of the point furthest along direction (dx, dy); the first such point on a tie. */
export function extremeVertex(points: readonly Point[], dx: number, dy: number): number {
  let best = -1;
  let bestValue = -Infinity;
  points.forEach((p, i) => {
    const value = p[0] * dx + p[1] * dy;
    if (value > bestValue + 1e-12) {
      best = i;
      bestValue = value;
    }
  });
  return best;
}

/** The selection with the vertex furthest along (dx, dy) of the selected item chosen. */
export function pickVertexToward(doc: SectionDocument, sel: Selection, dx: number, dy: number): Selection {
  const pts = ownerPoints(doc, ownerOf(sel)) ?? [];
  const i = extremeVertex(pts, dx, dy);
  return i < 0 ? sel : { ...sel, vertex: i };
}
