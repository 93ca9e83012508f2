"use client";

import dynamic from "next/dynamic";
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import type { Grid, GridSearchSuccess, Radii, SectionDocument, SliceRow } from "@/lib/stability";
import { Caution } from "@/components/ui/caution";
import { criticalAttribute } from "@/lib/runs/view/circle-styles";
import { buildRunScene, type CircleOverlay, type RunMethod } from "@/lib/runs/view/run-scene";
import { fitView, panBy, zoomAt, type Box, type RunView } from "@/lib/runs/view/view-fit";
import { FsMapLegend } from "@/components/runs/result/fs-map-legend";
import { CanvasKey } from "@/components/runs/result/canvas-key";
import { SURFACE_COLOUR, THRUST_COLOUR, type SurfaceOverlay } from "@/lib/runs/view/surface-overlay";
import type { RunCanvasStageProps } from "@/components/runs/result/run-canvas-stage";

// Konva needs a browser canvas: the stage loads on the client only.
const RunCanvasStage = dynamic(() => import("@/components/runs/result/run-canvas-stage"), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-ink-faint">Drawing the section…</p>,
});

export interface RunCanvasProps {
  document: SectionDocument;
  /** Fill per material id; falls back to the document's colours, then to earth tones. */
  materialsColors?: Record<string, string>;
  /** Same as materialsColors (either spelling is accepted). */
  materialColors?: Record<string, string>;
  /** Trial centres; with onGridChange the rectangle can be dragged and resized. */
  grid?: Grid;
  radii?: Radii;
  /** Present = set-up mode: grid corners and band lines are handles, snapped to 0.5 m. */
  onGridChange?: (grid: Grid, radii: Radii) => void;
  result?: GridSearchSuccess;
  /** Method whose FS map and lowest circles are shown; defaults to Bishop when present. */
  method?: RunMethod;
  /** Slices of that method's critical circle, drawn as thin verticals. */
  slices?: readonly SliceRow[];
  /** Compare mode: critical circles of several runs on one section. */
  overlays?: readonly CircleOverlay[];
  /** Pool level after drawdown (m), drawn dotted over the reservoir. */
  drawdownTo?: number;
  /** Marked on the FS map's colour bar. */
  requiredFs?: number;
  /** Canvas height, px (the width follows the container). */
  height?: number;
  /** Show the engineering caution under a result view (default true). */
  caution?: boolean;
  /** A slip surface of any shape with its slices, line of thrust and warning marks. */
  surface?: SurfaceOverlay;
  /** Drawing a slip surface: background clicks add vertices (the view still zooms with the wheel). */
  drawing?: RunCanvasStageProps["drawing"];
}

const WHEEL_ZOOM = 0.0015;

/**
 * The section with a run drawn over it: set-up handles, or the FS map and critical circles,
 * or several runs' circles for comparison. Equal scale, fitted to the section and grid.
 */
export function RunCanvas(props: RunCanvasProps) {
  const { document: doc, result, overlays, height = 440, caution = true } = props;
  const containerRef = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(800);
  const scene = useMemo(
    () =>
      buildRunScene({
        document: doc,
        materialsColors: props.materialsColors ?? props.materialColors,
        grid: props.grid,
        radii: props.radii,
        result,
        method: props.method,
        slices: props.slices,
        overlays,
        drawdownTo: props.drawdownTo,
        requiredFs: props.requiredFs,
      }),
    [
      doc,
      props.materialsColors,
      props.materialColors,
      props.grid,
      props.radii,
      result,
      props.method,
      props.slices,
      overlays,
      props.drawdownTo,
      props.requiredFs,
    ],
  );

  // The fitted box is kept until what it depends on changes, so dragging the grid does not rescale the view.
  const [fit, setFit] = useState<{ key: string; box: Box }>({ key: scene.fitKey, box: scene.fitBox });
  const [manual, setManual] = useState<RunView | null>(null);
  if (fit.key !== scene.fitKey) {
    setFit({ key: scene.fitKey, box: scene.fitBox });
    setManual(null);
  }
  const view = manual ?? fitView(fit.box, width, height);
  // Wheel and pan handlers read the view as last drawn; it is updated after each commit, never during render.
  const viewRef = useRef(view);
  useLayoutEffect(() => {
    viewRef.current = view;
  });

  useEffect(() => {
    const el = containerRef.current;
    if (!el) return;
    const measure = () => setWidth(Math.max(200, Math.round(el.getBoundingClientRect().width) || 800));
    measure();
    if (typeof ResizeObserver === "undefined") return;
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  useEffect(() => {
    const el = containerRef.current;
    if (!el) return;
    // A native listener, because React's wheel handler is passive and cannot stop the page scrolling.
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      setManual(zoomAt(viewRef.current, Math.exp(-e.deltaY * WHEEL_ZOOM), e.clientX - r.left, e.clientY - r.top));
    };
    el.addEventListener("wheel", onWheel, { passive: false });
    return () => el.removeEventListener("wheel", onWheel);
  }, []);

  const onPan = useCallback((dx: number, dy: number) => setManual(panBy(viewRef.current, dx, dy)), []);
  const refit = () => {
    setFit({ key: scene.fitKey, box: scene.fitBox });
    setManual(null);
  };
  const zoomBy = (f: number) => setManual(zoomAt(view, f, width / 2, height / 2));

  const setup =
    props.onGridChange && props.grid && props.radii
      ? { grid: props.grid, radii: props.radii, onGridChange: props.onGridChange }
      : undefined;
  const showsResult = Boolean(result) || Boolean(overlays && overlays.length > 0);
  const viewAttr = JSON.stringify({ scale: view.scale, offsetX: view.offsetX, offsetY: view.offsetY });

  return (
    <figure className="panel overflow-hidden" data-testid="run-canvas-figure">
      <div
        ref={containerRef}
        className="relative w-full touch-none select-none bg-paper-raised"
        style={{ height }}
        data-testid="run-canvas"
        data-view={viewAttr}
        data-critical={criticalAttribute(scene.critical)}
        data-mode={
          props.drawing
            ? "drawing"
            : setup
              ? "set-up"
              : overlays && overlays.length > 0
                ? "compare"
                : result
                  ? "result"
                  : "section"
        }
        role="img"
        aria-label={describeCanvas(
          scene.critical.map((c) => c.label),
          Boolean(setup),
        )}
      >
        <RunCanvasStage
          scene={scene}
          view={view}
          width={width}
          height={height}
          setup={props.drawing ? undefined : setup}
          onPan={onPan}
          surface={props.surface}
          drawing={props.drawing}
        />
        <div className="absolute right-2 top-2 flex gap-1">
          <button
            type="button"
            className="btn-quiet px-2 py-0.5 text-xs"
            onClick={() => zoomBy(1.25)}
            aria-label="Zoom in"
          >
            +
          </button>
          <button
            type="button"
            className="btn-quiet px-2 py-0.5 text-xs"
            onClick={() => zoomBy(0.8)}
            aria-label="Zoom out"
          >
            −
          </button>
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={refit} data-testid="run-canvas-fit">
            Whole section
          </button>
        </div>
      </div>
      <figcaption className="space-y-2 border-t border-rule px-3 py-2">
        {scene.range && scene.method ? (
          <FsMapLegend range={scene.range} method={scene.method} requiredFs={props.requiredFs} />
        ) : null}
        <CanvasKey scene={scene} setup={Boolean(setup)} />
        {props.surface ? <SurfaceKey overlay={props.surface} /> : null}
        {showsResult && caution ? <Caution compact /> : null}
      </figcaption>
    </figure>
  );
}

function describeCanvas(labels: string[], setup: boolean): string {
  const base = "Cross-section of the slope drawn to equal scale";
  if (setup) return `${base}, with the grid of trial centres and the tangent band as handles`;
  return labels.length > 0 ? `${base}, with critical circles: ${labels.join("; ")}` : base;
}

/** The surface's own key: what the solid and the dashed line are, and the numbered warnings. */
function SurfaceKey({ overlay }: { overlay: SurfaceOverlay }) {
  return (
    <div className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft" data-testid="surface-key">
      {overlay.line.length > 1 ? (
        <span>
          <span
            aria-hidden
            className="mr-1 inline-block h-0.5 w-5 align-middle"
            style={{ background: SURFACE_COLOUR }}
          />
          {overlay.label}
        </span>
      ) : null}
      {overlay.thrust.length > 1 ? (
        <span data-testid="thrust-key">
          <span
            aria-hidden
            className="mr-1 inline-block w-5 border-t-2 border-dashed align-middle"
            style={{ borderColor: THRUST_COLOUR }}
          />
          Line of thrust (where the force between slices acts)
        </span>
      ) : null}
      {overlay.marks.map((m) => (
        <span key={m.n}>
          !{m.n} {m.text}
        </span>
      ))}
    </div>
  );
}
