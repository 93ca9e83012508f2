"use client";

import { Layer, Line, Rect } from "react-konva";
import { axisTicks } from "@/lib/scales";
import { visibleBounds, worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { CANVAS_COLORS } from "../palette";

interface GridLayerProps {
  view: ViewTransform;
  width: number;
  height: number;
}

/** Paper background and faint grid lines on the axis ticks, behind everything else. */
export function GridLayer({ view, width, height }: GridLayerProps) {
  const b = visibleBounds(view, width, height);
  const xs = axisTicks(b.minX, b.maxX, view.scale, 70).values;
  const ys = axisTicks(b.minY, b.maxY, view.scale * view.exaggeration, 44).values;
  return (
    <Layer listening={false}>
      <Rect x={0} y={0} width={width} height={height} fill={CANVAS_COLORS.paper} />
      {xs.map((x) => {
        const sx = worldToScreen(view, x, 0)[0];
        return (
          <Line
            key={`x${x}`}
            points={[sx, 0, sx, height]}
            stroke={x === 0 ? CANVAS_COLORS.gridStrong : CANVAS_COLORS.grid}
            strokeWidth={1}
          />
        );
      })}
      {ys.map((y) => {
        const sy = worldToScreen(view, 0, y)[1];
        return (
          <Line
            key={`y${y}`}
            points={[0, sy, width, sy]}
            stroke={y === 0 ? CANVAS_COLORS.gridStrong : CANVAS_COLORS.grid}
            strokeWidth={1}
          />
        );
      })}
    </Layer>
  );
}
