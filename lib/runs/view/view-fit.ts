/**
 * How metres map to pixels on the run canvas. Equal scale on both axes (a section is never
 * exaggerated here, so slip surfaces keep their true shape), elevation up:
 *
 *   screenX = offsetX + x · scale
 *   screenY = offsetY − y · scale
 *
 * with screen coordinates relative to the canvas container.
 */

/** Pixels per metre and the pixel position of the world origin. */
export interface RunView {
  scale: number;
  offsetX: number;
  offsetY: number;
}

/** An axis-aligned box in metres. */
export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Space in pixels kept free around the fitted box (axes, labels, breathing room). */
export interface Padding {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export const DEFAULT_PADDING: Padding = { left: 52, right: 20, top: 20, bottom: 34 };
/** Zoom limits, pixels per metre. */
export const MIN_SCALE = 0.001;
export const MAX_SCALE = 10000;

const clampScale = (s: number) => Math.min(MAX_SCALE, Math.max(MIN_SCALE, s));

/** Smallest box holding all the given boxes (nulls skipped); null when none. */
export function unionBoxes(boxes: ReadonlyArray<Box | null | undefined>): Box | null {
  let out: Box | null = null;
  for (const b of boxes) {
    if (!b) continue;
    out = out
      ? {
          minX: Math.min(out.minX, b.minX),
          minY: Math.min(out.minY, b.minY),
          maxX: Math.max(out.maxX, b.maxX),
          maxY: Math.max(out.maxY, b.maxY),
        }
      : { ...b };
  }
  return out;
}

/** Box around a list of points; null when empty. */
export function boxOfPoints(points: ReadonlyArray<readonly [number, number]>): Box | null {
  if (points.length === 0) return null;
  let minX = Infinity,
    minY = Infinity,
    maxX = -Infinity,
    maxY = -Infinity;
  for (const [x, y] of points) {
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
  }
  return { minX, minY, maxX, maxY };
}

/**
 * The view that shows the whole box, centred, as large as fits inside the padded area.
 * @param width container width, px
 * @param height container height, px
 */
export function fitView(box: Box, width: number, height: number, pad: Padding = DEFAULT_PADDING): RunView {
  const w = Math.max(1, width - pad.left - pad.right);
  const h = Math.max(1, height - pad.top - pad.bottom);
  // A degenerate box (one point, or a flat line) still gets a finite scale.
  const bw = Math.max(box.maxX - box.minX, 1e-6);
  const bh = Math.max(box.maxY - box.minY, 1e-6);
  const scale = clampScale(Math.min(w / bw, h / bh));
  const cx = (box.minX + box.maxX) / 2;
  const cy = (box.minY + box.maxY) / 2;
  return { scale, offsetX: pad.left + w / 2 - cx * scale, offsetY: pad.top + h / 2 + cy * scale };
}

/** World (m) to screen (px). */
export function toScreen(v: RunView, x: number, y: number): [number, number] {
  return [v.offsetX + x * v.scale, v.offsetY - y * v.scale];
}

/** Screen (px) to world (m); the inverse of toScreen. */
export function toWorld(v: RunView, sx: number, sy: number): [number, number] {
  return [(sx - v.offsetX) / v.scale, (v.offsetY - sy) / v.scale];
}

/** Zooms by `factor` about a screen point, which stays over the same world point. */
export function zoomAt(v: RunView, factor: number, sx: number, sy: number): RunView {
  if (!(factor > 0) || !Number.isFinite(factor)) return v;
  const scale = clampScale(v.scale * factor);
  const [wx, wy] = toWorld(v, sx, sy);
  return { scale, offsetX: sx - wx * scale, offsetY: sy + wy * scale };
}

/** Moves the view by a pixel displacement. */
export function panBy(v: RunView, dx: number, dy: number): RunView {
  return { ...v, offsetX: v.offsetX + dx, offsetY: v.offsetY + dy };
}

/** The world box the screen shows. */
export function visibleBox(v: RunView, width: number, height: number): Box {
  const [x0, y1] = toWorld(v, 0, 0);
  const [x1, y0] = toWorld(v, width, height);
  return { minX: x0, minY: y0, maxX: x1, maxY: y1 };
}
