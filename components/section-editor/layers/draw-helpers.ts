import type { Point } from "@/lib/stability";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";

/** Flattens world points into Konva's [x0, y0, x1, y1, …] screen list. */
export function toScreenList(points: readonly Point[], view: ViewTransform): number[] {
  const out: number[] = [];
  for (const p of points) out.push(...worldToScreen(view, p[0], p[1]));
  return out;
}

/** `#rrggbb` (or `#rgb`) with an alpha, as an rgba() string; other colour strings pass through. */
export function withAlpha(color: string, alpha: number): string {
  const m = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(color.trim());
  if (!m) return color;
  const hex = m[1].length === 3 ? [...m[1]].map((c) => c + c).join("") : m[1];
  const [r, g, b] = [0, 2, 4].map((i) => parseInt(hex.slice(i, i + 2), 16));
  return `rgba(${r}, ${g}, ${b}, ${alpha})`;
}

export const CANVAS_FONT = "Inter, system-ui, sans-serif";

/** Plot area inside the axis bands (px). */
export const AXIS_BAND = { left: 52, bottom: 30 } as const;
