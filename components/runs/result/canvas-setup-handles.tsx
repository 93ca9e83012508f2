import { useRef, useState } from "react";
import type Konva from "konva";
import { Group, Line, Rect, Text } from "react-konva";
import type { Grid, Radii } from "@/lib/stability";
import {
  GRID_CORNERS,
  bandLineLabel,
  bandLines,
  cornerPoint,
  dragBandLine,
  dragCorner,
  moveGrid,
  normaliseGrid,
  type BandKey,
  type GridCorner,
} from "@/lib/runs/view/grid-edit";
import { toScreen, toWorld, type Box, type RunView } from "@/lib/runs/view/view-fit";
import { SETUP_ACCENT } from "@/components/runs/result/canvas-centre-grid";

export interface SetupHandlesProps {
  grid: Grid;
  radii: Radii;
  onGridChange: (grid: Grid, radii: Radii) => void;
  view: RunView;
  /** Horizontal extent of the band lines, m. */
  sectionBox: Box;
}

const HANDLE = 10;
// Lower-left and upper-right sit on the rising diagonal of the screen.
const CURSOR: Record<GridCorner, string> = {
  "lower-left": "nesw-resize",
  "upper-right": "nesw-resize",
  "upper-left": "nwse-resize",
  "lower-right": "nwse-resize",
};

function setCursor(e: Konva.KonvaEventObject<MouseEvent>, cursor: string) {
  const c = e.target.getStage()?.container();
  if (c) c.style.cursor = cursor;
}

/**
 * Set-up handles: the grid rectangle moves when dragged, its corners resize it, and the two
 * band lines move up and down. Each drag reports snapped values at once; after the drag the
 * shapes are remounted from the props, so a parent that refuses a change snaps them back.
 */
export function SetupHandles({ grid, radii, onGridChange, view, sectionBox }: SetupHandlesProps) {
  const [epoch, setEpoch] = useState(0);
  const start = useRef<{ grid: Grid; x: number; y: number } | null>(null);
  const g = normaliseGrid(grid);
  const [gx1, gy1] = toScreen(view, g.x1, g.y2);
  const [gx2, gy2] = toScreen(view, g.x2, g.y1);
  const end = () => setEpoch((n) => n + 1);

  const onBodyMove = (e: Konva.KonvaEventObject<DragEvent>) => {
    const s = start.current;
    if (!s) return;
    const node = e.target;
    const moved = moveGrid(
      s.grid,
      s.grid.x1 + (node.x() - s.x) / view.scale,
      s.grid.y1 - (node.y() - s.y) / view.scale,
    );
    const [sx, sy] = toScreen(view, moved.x1, moved.y2);
    node.position({ x: sx, y: sy });
    onGridChange(moved, radii);
  };

  const onCornerMove = (corner: GridCorner) => (e: Konva.KonvaEventObject<DragEvent>) => {
    const node = e.target;
    const [wx, wy] = toWorld(view, node.x() + HANDLE / 2, node.y() + HANDLE / 2);
    const next = dragCorner(grid, corner, wx, wy);
    const [cx, cy] = cornerPoint(next, corner);
    const [sx, sy] = toScreen(view, cx, cy);
    node.position({ x: sx - HANDLE / 2, y: sy - HANDLE / 2 });
    onGridChange(next, radii);
  };

  const onBandMove = (key: BandKey, baseY: number) => (e: Konva.KonvaEventObject<DragEvent>) => {
    const node = e.target;
    const [, wy] = toWorld(view, 0, baseY + node.y());
    const next = dragBandLine(radii, grid, key, wy);
    const line = bandLines(next, grid).find((l) => l.key === key);
    if (line) node.y(toScreen(view, 0, line.y)[1] - baseY);
    onGridChange(grid, next);
  };

  const [bx1] = toScreen(view, sectionBox.minX, 0);
  const [bx2] = toScreen(view, sectionBox.maxX, 0);
  const lines = bandLines(radii, grid);

  return (
    <Group key={epoch} name="set-up-handles">
      <Rect
        name="grid-body"
        x={gx1}
        y={gy1}
        width={gx2 - gx1}
        height={gy2 - gy1}
        fill={SETUP_ACCENT}
        opacity={0.12}
        stroke={SETUP_ACCENT}
        strokeWidth={1.25}
        dash={[5, 3]}
        draggable
        onDragStart={(e) => {
          start.current = { grid: g, x: e.target.x(), y: e.target.y() };
        }}
        onDragMove={onBodyMove}
        onDragEnd={() => {
          start.current = null;
          end();
        }}
        onMouseEnter={(e) => setCursor(e, "move")}
        onMouseLeave={(e) => setCursor(e, "")}
      />
      <Text
        x={gx1}
        y={gy1 - 15}
        text={`${g.nx} × ${g.ny} trial centres`}
        fontSize={11}
        fill={SETUP_ACCENT}
        listening={false}
      />
      {GRID_CORNERS.map((corner) => {
        const [cx, cy] = toScreen(view, ...cornerPoint(g, corner));
        return (
          <Rect
            key={corner}
            name={`grid-corner-${corner}`}
            x={cx - HANDLE / 2}
            y={cy - HANDLE / 2}
            width={HANDLE}
            height={HANDLE}
            fill="#ffffff"
            stroke={SETUP_ACCENT}
            strokeWidth={1.5}
            draggable
            onDragMove={onCornerMove(corner)}
            onDragEnd={end}
            onMouseEnter={(e) => setCursor(e, CURSOR[corner])}
            onMouseLeave={(e) => setCursor(e, "")}
          />
        );
      })}
      {lines.map((l, i) => {
        const [, sy] = toScreen(view, 0, l.y);
        const upper = l.y >= lines[1 - i].y;
        return (
          <Group key={l.key}>
            <Line
              name={`band-line-${l.key}`}
              x={0}
              y={0}
              points={[bx1, sy, bx2, sy]}
              stroke={SETUP_ACCENT}
              strokeWidth={1.5}
              dash={[7, 4]}
              hitStrokeWidth={12}
              draggable
              dragBoundFunc={function (this: Konva.Node, pos) {
                return { x: this.absolutePosition().x, y: pos.y };
              }}
              onDragMove={onBandMove(l.key, sy)}
              onDragEnd={end}
              onMouseEnter={(e) => setCursor(e, "ns-resize")}
              onMouseLeave={(e) => setCursor(e, "")}
            />
            <Text
              x={bx2 - 264}
              y={upper ? sy - 14 : sy + 3}
              width={258}
              align="right"
              text={bandLineLabel(l)}
              fontSize={10}
              fill={SETUP_ACCENT}
              listening={false}
            />
          </Group>
        );
      })}
    </Group>
  );
}
