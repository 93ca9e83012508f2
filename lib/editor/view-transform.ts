/**
 * The editor's view: how metres map to pixels on the canvas. x grows to the right and
 * elevation grows upward, so the screen y axis is flipped. Vertical exaggeration scales
 * elevations in the view only; the document always keeps true coordinates.
 *
 *   screenX = offsetX + x · scale
 *   screenY = offsetY − y · scale · exaggeration
 */

/** Pixels per metre (`scale`), the pixel position of the world origin and the V:H stretch. */
export interface ViewTransform {
  scale: number;
  offsetX: number;
  offsetY: number;
  exaggeration: number;
}

/** An axis-aligned box in metres. */
export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Zoom limits in pixels per metre: from a 100 km wide view down to a few millimetres. */
export const MIN_SCALE = 0.01;
export const MAX_SCALE = 5000;

export function clampScale(scale: number): number {
  return Math.min(MAX_SCALE, Math.max(MIN_SCALE, scale));
}

/** World (m) to screen (px, relative to the canvas container). */
export function worldToScreen(view: ViewTransform, x: number, y: number): [number, number] {
  return [view.offsetX + x * view.scale, view.offsetY - y * view.scale * view.exaggeration];
}

/** Screen (px) to world (m); the inverse of worldToScreen. */
export function screenToWorld(view: ViewTransform, sx: number, sy: number): [number, number] {
  return [(sx - view.offsetX) / view.scale, (view.offsetY - sy) / (view.scale * view.exaggeration)];
}

/**
 * Zooms by `factor` keeping the world point under (sx, sy) fixed on screen, so the wheel
 * zooms toward the cursor. The factor is trimmed so the scale stays within its limits.
 */
export function zoomAbout(view: ViewTransform, factor: number, sx: number, sy: number): ViewTransform {
  if (!(factor > 0) || !Number.isFinite(factor)) return view;
  const scale = clampScale(view.scale * factor);
  const [wx, wy] = screenToWorld(view, sx, sy);
  return {
    ...view,
    scale,
    offsetX: sx - wx * scale,
    offsetY: sy + wy * scale * view.exaggeration,
  };
}

/** Moves the view by a pixel displacement (drag to pan). */
export function panBy(view: ViewTransform, dx: number, dy: number): ViewTransform {
  return { ...view, offsetX: view.offsetX + dx, offsetY: view.offsetY + dy };
}

/** Pans so the world point (x, y) sits at the screen point (sx, sy), scale unchanged. */
export function centreOn(view: ViewTransform, x: number, y: number, sx: number, sy: number): ViewTransform {
  return { ...view, offsetX: sx - x * view.scale, offsetY: sy + y * view.scale * view.exaggeration };
}

/** Margins around the fitted drawing in px: the left and bottom leave room for the axes. */
export interface FitMargins {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export const DEFAULT_FIT_MARGINS: FitMargins = { left: 56, right: 24, top: 24, bottom: 40 };

/**
 * The view that shows `bounds` as large as possible inside a width × height canvas,
 * centred, with the given margins. Degenerate bounds (a point, a flat line) still fit.
 */
export function fitToBounds(
  bounds: Bounds,
  width: number,
  height: number,
  exaggeration = 1,
  margins: FitMargins = DEFAULT_FIT_MARGINS,
): ViewTransform {
  const spanX = Math.max(bounds.maxX - bounds.minX, 1e-6);
  const spanY = Math.max((bounds.maxY - bounds.minY) * exaggeration, 1e-6);
  const availW = Math.max(width - margins.left - margins.right, 1);
  const availH = Math.max(height - margins.top - margins.bottom, 1);
  const scale = clampScale(Math.min(availW / spanX, availH / spanY));
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  const sx = margins.left + availW / 2;
  const sy = margins.top + availH / 2;
  return centreOn({ scale, offsetX: 0, offsetY: 0, exaggeration }, cx, cy, sx, sy);
}

/** The world box visible in a width × height canvas. */
export function visibleBounds(view: ViewTransform, width: number, height: number): Bounds {
  const [x0, y0] = screenToWorld(view, 0, height);
  const [x1, y1] = screenToWorld(view, width, 0);
  return { minX: x0, minY: y0, maxX: x1, maxY: y1 };
}
