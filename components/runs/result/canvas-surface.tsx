import { Circle, Group, Label, Line, Tag, Text } from "react-konva";
import type Konva from "konva";
import { SURFACE_COLOUR, THRUST_COLOUR, type SurfaceOverlay } from "@/lib/runs/view/surface-overlay";
import type { Pt } from "@/lib/runs/view/surface-draw";
import { toScreen, toWorld, type RunView } from "@/lib/runs/view/view-fit";

const HALO = "#ffffff";

const flat = (view: RunView, pts: readonly (readonly [number, number])[]) =>
  pts.flatMap((p) => toScreen(view, p[0], p[1]));

/** The surface, its slice sides, the line of thrust (dashed) and numbered warning marks. */
export function SurfaceShapes({ overlay, view }: { overlay: SurfaceOverlay; view: RunView }) {
  return (
    <Group name="slip-surface">
      {overlay.sides.map((s, i) => {
        const [x, yb] = toScreen(view, s.x, s.yBase);
        const [, yt] = toScreen(view, s.x, s.yTop);
        return (
          <Line
            key={i}
            name="surface-slice"
            points={[x, yb, x, yt]}
            stroke={SURFACE_COLOUR}
            strokeWidth={0.75}
            opacity={0.7}
          />
        );
      })}
      {overlay.line.length > 1 ? (
        <>
          <Line points={flat(view, overlay.line)} stroke={HALO} strokeWidth={5} opacity={0.85} lineJoin="round" />
          <Line
            name="surface-line"
            points={flat(view, overlay.line)}
            stroke={SURFACE_COLOUR}
            strokeWidth={2.5}
            lineJoin="round"
          />
        </>
      ) : null}
      {overlay.thrust.length > 1 ? (
        <>
          <Line points={flat(view, overlay.thrust)} stroke={HALO} strokeWidth={4} opacity={0.8} />
          <Line
            name="thrust-line"
            points={flat(view, overlay.thrust)}
            stroke={THRUST_COLOUR}
            strokeWidth={2}
            dash={[7, 4]}
          />
        </>
      ) : null}
      {overlay.marks.map((m) => {
        const [x, y] = toScreen(view, m.at[0], m.at[1]);
        return (
          <Label key={m.n} x={x + 6} y={y - 22} name="warning-mark">
            <Tag fill={HALO} stroke={THRUST_COLOUR} strokeWidth={1} cornerRadius={8} />
            <Text text={`!${m.n}`} fontSize={11} padding={3} fill={THRUST_COLOUR} fontStyle="bold" />
          </Label>
        );
      })}
    </Group>
  );
}

export interface SurfaceDrawing {
  points: Pt[];
  /** Vertex i dragged to (x, y) m. */
  onMove: (i: number, x: number, y: number) => void;
}

/** The surface being drawn: its line and a handle on each vertex (ends square, bends round). */
export function SurfaceHandles({ drawing, view }: { drawing: SurfaceDrawing; view: RunView }) {
  const pts = drawing.points;
  const drag = (i: number) => (e: Konva.KonvaEventObject<DragEvent>) => {
    const [x, y] = toWorld(view, e.target.x(), e.target.y());
    drawing.onMove(i, x, y);
  };
  return (
    <Group name="surface-drawing">
      {pts.length > 1 ? (
        <Line points={flat(view, pts)} stroke={SURFACE_COLOUR} strokeWidth={2} dash={[6, 3]} listening={false} />
      ) : null}
      {pts.map((p, i) => {
        const [x, y] = toScreen(view, p[0], p[1]);
        const end = i === 0 || i === pts.length - 1;
        return (
          <Circle
            key={`${i}-${p[0]}-${p[1]}`}
            name="surface-vertex"
            x={x}
            y={y}
            radius={end ? 6 : 5}
            fill={end ? SURFACE_COLOUR : HALO}
            stroke={SURFACE_COLOUR}
            strokeWidth={2}
            draggable
            onDragEnd={drag(i)}
          />
        );
      })}
    </Group>
  );
}
