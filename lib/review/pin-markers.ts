/**
 * Where each comment's numbered marker sits on the section (m): at its pin, or at the middle of
 * its slice's base on the critical circle. Comments pinned to nothing get no marker.
 */
import type { SliceRow } from "@/lib/stability";

export interface PinMarker {
  /** The comment's number, 1-based in the order written. */
  n: number;
  x: number;
  y: number;
  label: string;
}

interface PinnedComment {
  body: string;
  pin: { x: number; y: number } | null;
  slice: { number: number; method: "bishop" | "fellenius" } | null;
}

export function pinMarkers(
  comments: readonly PinnedComment[],
  tables: Partial<Record<"bishop" | "fellenius", { slices: readonly SliceRow[] }>>,
): PinMarker[] {
  const out: PinMarker[] = [];
  comments.forEach((c, i) => {
    if (c.pin) out.push({ n: i + 1, x: c.pin.x, y: c.pin.y, label: c.body });
    else if (c.slice) {
      const s = tables[c.slice.method]?.slices[c.slice.number - 1];
      if (s) out.push({ n: i + 1, x: (s.xLeft + s.xRight) / 2, y: s.baseY, label: c.body });
    }
  });
  return out;
}

/** Screen ↔ world for RunCanvas's view (its data-view): screenX = offsetX + x·scale, screenY = offsetY − y·scale. */
export interface CanvasView {
  scale: number;
  offsetX: number;
  offsetY: number;
}

export function toWorld(view: CanvasView, px: number, py: number): { x: number; y: number } {
  return { x: (px - view.offsetX) / view.scale, y: (view.offsetY - py) / view.scale };
}

export function toScreen(view: CanvasView, x: number, y: number): { left: number; top: number } {
  return { left: view.offsetX + x * view.scale, top: view.offsetY - y * view.scale };
}
