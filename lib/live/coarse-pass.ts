/**
 * The coarse pass of a live search: the same section and set-up on a grid of about half the
 * centres each way and half the radii, over the same area and radius range, without refinement
 * (about an eighth of the circles). Its answer is shown only as "settling" while the drawing
 * moves; the full set-up's answer is the final one (lib/live/live-scheduler.ts).
 */
import type { SectionDocument } from "@/lib/stability";

/** Below this many circles the full search is quick enough to go first. */
export const COARSE_FROM_CIRCLES = 1500;

const half = (n: number) => Math.max(2, Math.ceil(n / 2));

/** The coarse document of an engine document, or null when its search is small enough to run in full at once. */
export function coarseDocument(doc: SectionDocument): SectionDocument | null {
  const a = doc.analysis;
  if (!a?.grid || !a.radii) return null;
  if (a.grid.nx * a.grid.ny * a.radii.n < COARSE_FROM_CIRCLES) return null;
  return {
    ...doc,
    analysis: {
      ...a,
      grid: { ...a.grid, nx: half(a.grid.nx), ny: half(a.grid.ny) },
      radii: { ...a.radii, n: half(a.radii.n) },
      refine: false,
      lowestCount: 0,
    },
  };
}
