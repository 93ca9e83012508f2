"use client";

import { useRef } from "react";
import type Konva from "konva";
import { Layer, Stage } from "react-konva";
import type { Grid, Radii } from "@/lib/stability";
import type { RunScene } from "@/lib/runs/view/run-scene";
import type { RunView } from "@/lib/runs/view/view-fit";
import { SectionShapes } from "@/components/runs/result/canvas-section";
import { AxisMarks } from "@/components/runs/result/canvas-axes";
import { CentreGridShapes } from "@/components/runs/result/canvas-centre-grid";
import { CircleShapes } from "@/components/runs/result/canvas-circles";
import { SetupHandles } from "@/components/runs/result/canvas-setup-handles";
import { SurfaceHandles, SurfaceShapes, type SurfaceDrawing } from "@/components/runs/result/canvas-surface";
import type { SurfaceOverlay } from "@/lib/runs/view/surface-overlay";
import { toWorld } from "@/lib/runs/view/view-fit";

export interface RunCanvasStageProps {
  scene: RunScene;
  view: RunView;
  width: number;
  height: number;
  setup?: { grid: Grid; radii: Radii; onGridChange: (grid: Grid, radii: Radii) => void };
  /** Called with pixel moves while the background is dragged. */
  onPan: (dx: number, dy: number) => void;
  /** A slip surface of any shape with its line of thrust, drawn over the circles. */
  surface?: SurfaceOverlay;
  /** Drawing mode: a click on the background is a vertex at (x, y) m instead of a pan. */
  drawing?: SurfaceDrawing & { onClick: (x: number, y: number, metresPerPixel: number) => void };
}

/**
 * The konva stage of the run canvas. Loaded only in the browser (next/dynamic, ssr: false).
 * Drawing layers do not listen to events, so a press anywhere but on a set-up handle lands
 * on the stage itself and pans the view.
 */
export default function RunCanvasStage(props: RunCanvasStageProps) {
  const { scene, view, width, height, setup, onPan, surface, drawing } = props;
  const last = useRef<{ x: number; y: number } | null>(null);

  const onDown = (e: Konva.KonvaEventObject<PointerEvent>) => {
    const stage = e.target.getStage();
    if (!stage || e.target !== stage) return;
    const p = stage.getPointerPosition();
    if (drawing && p) {
      const [x, y] = toWorld(view, p.x, p.y);
      drawing.onClick(x, y, 1 / view.scale);
      return;
    }
    last.current = p ? { x: p.x, y: p.y } : null;
  };
  const onMove = (e: Konva.KonvaEventObject<PointerEvent>) => {
    const p = e.target.getStage()?.getPointerPosition();
    if (!last.current || !p) return;
    onPan(p.x - last.current.x, p.y - last.current.y);
    last.current = { x: p.x, y: p.y };
  };
  const onUp = () => {
    last.current = null;
  };

  return (
    <Stage
      width={width}
      height={height}
      onPointerDown={onDown}
      onPointerMove={onMove}
      onPointerUp={onUp}
      onPointerLeave={onUp}
    >
      <Layer listening={false}>
        <AxisMarks view={view} width={width} height={height} />
        <SectionShapes scene={scene} view={view} />
        <CentreGridShapes scene={scene} view={view} setup={Boolean(setup)} />
        <CircleShapes scene={scene} view={view} />
        {surface ? <SurfaceShapes overlay={surface} view={view} /> : null}
      </Layer>
      {drawing ? (
        <Layer>
          <SurfaceHandles drawing={drawing} view={view} />
        </Layer>
      ) : null}
      {setup ? (
        <Layer>
          <SetupHandles {...setup} view={view} sectionBox={scene.fitBox} />
        </Layer>
      ) : null}
    </Stage>
  );
}
