"use client";

import { useCallback, useLayoutEffect, useState, type RefObject } from "react";
import type { Point } from "@/lib/stability";
import { centreOn, fitToBounds, panBy, zoomAbout, type Bounds, type ViewTransform } from "@/lib/editor/view-transform";

/** Width used before the container has been measured (and in test DOMs without layout). */
const FALLBACK_WIDTH = 800;
/** Zoom step of the +/- keys and buttons. */
export const ZOOM_STEP = 1.25;

export interface EditorView {
  view: ViewTransform | null;
  width: number;
  height: number;
  fit(): void;
  zoomBy(factor: number, sx?: number, sy?: number): void;
  pan(dx: number, dy: number): void;
  /** Centres the view on a world point (m). */
  showPoint(p: Point): void;
}

/** Adds 8 % of the span on each side so the section does not touch the axes. */
function padded(b: Bounds): Bounds {
  const px = Math.max((b.maxX - b.minX) * 0.08, 1);
  const py = Math.max((b.maxY - b.minY) * 0.08, 1);
  return { minX: b.minX - px, minY: b.minY - py, maxX: b.maxX + px, maxY: b.maxY + py };
}

/** The pan and zoom of the canvas, sized to its container; fits the section on first show. */
export function useView(
  container: RefObject<HTMLElement | null>,
  height: number,
  bounds: Bounds,
  exaggeration: number,
): EditorView {
  const [width, setWidth] = useState(0);
  const [view, setView] = useState<ViewTransform | null>(null);

  useLayoutEffect(() => {
    const el = container.current;
    if (!el) return;
    const measure = () => setWidth(el.clientWidth || FALLBACK_WIDTH);
    measure();
    if (typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, [container]);

  const fit = useCallback(() => {
    if (width > 0) setView(fitToBounds(padded(bounds), width, height, exaggeration));
  }, [bounds, width, height, exaggeration]);

  // Fit once the width is known, and again when the exaggeration changes the picture's shape.
  // Adjusting state while rendering (not in an effect) saves a frame drawn with the old fit.
  if (width > 0 && (view === null || view.exaggeration !== exaggeration)) {
    setView(fitToBounds(padded(bounds), width, height, exaggeration));
  }

  const zoomBy = useCallback(
    (factor: number, sx?: number, sy?: number) =>
      setView((v) => (v ? zoomAbout(v, factor, sx ?? width / 2, sy ?? height / 2) : v)),
    [width, height],
  );
  const pan = useCallback((dx: number, dy: number) => setView((v) => (v ? panBy(v, dx, dy) : v)), []);
  const showPoint = useCallback(
    (p: Point) => setView((v) => (v ? centreOn(v, p[0], p[1], width / 2, height / 2) : v)),
    [width, height],
  );

  return { view, width, height, fit, zoomBy, pan, showPoint };
}
