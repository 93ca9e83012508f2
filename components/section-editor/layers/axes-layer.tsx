"use client";

import { Layer, Line, Rect, Text } from "react-konva";
import { axisTicks, formatTick, niceLengthBelow } from "@/lib/scales";
import { visibleBounds, worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { CANVAS_COLORS } from "../palette";
import { AXIS_BAND, CANVAS_FONT } from "./draw-helpers";

interface AxesLayerProps {
  view: ViewTransform;
  width: number;
  height: number;
}

const TICK = 5;
const LABEL = { fontSize: 10, fontFamily: CANVAS_FONT, fill: CANVAS_COLORS.inkSoft };

/**
 * Axes held at the canvas edges, so they stay readable while panning: x along the bottom,
 * elevation on the left, both in metres, plus a scale bar with the vertical exaggeration.
 */
export function AxesLayer({ view, width, height }: AxesLayerProps) {
  const b = visibleBounds(view, width, height);
  const x = axisTicks(b.minX, b.maxX, view.scale, 70);
  const y = axisTicks(b.minY, b.maxY, view.scale * view.exaggeration, 44);
  const base = height - AXIS_BAND.bottom;
  return (
    <Layer listening={false}>
      <Rect x={0} y={base} width={width} height={AXIS_BAND.bottom} fill={CANVAS_COLORS.axisBand} />
      <Rect x={0} y={0} width={AXIS_BAND.left} height={height} fill={CANVAS_COLORS.axisBand} />
      <Line
        points={[AXIS_BAND.left, 0, AXIS_BAND.left, base, width, base]}
        stroke={CANVAS_COLORS.inkSoft}
        strokeWidth={1}
      />
      {x.values.map((v) => {
        const sx = worldToScreen(view, v, 0)[0];
        if (sx < AXIS_BAND.left) return null;
        return (
          <Line key={`xt${v}`} points={[sx, base, sx, base + TICK]} stroke={CANVAS_COLORS.inkSoft} strokeWidth={1} />
        );
      })}
      {x.values.map((v) => {
        const sx = worldToScreen(view, v, 0)[0];
        if (sx < AXIS_BAND.left + 8) return null;
        return (
          <Text
            key={`xl${v}`}
            x={sx - 30}
            y={base + TICK + 3}
            width={60}
            align="center"
            text={formatTick(v, x.step)}
            {...LABEL}
          />
        );
      })}
      {y.values.map((v) => {
        const sy = worldToScreen(view, 0, v)[1];
        if (sy > base) return null;
        return (
          <Line
            key={`yt${v}`}
            points={[AXIS_BAND.left - TICK, sy, AXIS_BAND.left, sy]}
            stroke={CANVAS_COLORS.inkSoft}
            strokeWidth={1}
          />
        );
      })}
      {y.values.map((v) => {
        const sy = worldToScreen(view, 0, v)[1];
        if (sy > base - 6 || sy < 8) return null;
        return (
          <Text
            key={`yl${v}`}
            x={2}
            y={sy - 6}
            width={AXIS_BAND.left - TICK - 5}
            align="right"
            text={formatTick(v, y.step)}
            {...LABEL}
          />
        );
      })}
      <Text x={width - 60} y={base + TICK + 3 + 11} width={56} align="right" text="x (m)" {...LABEL} fontSize={9} />
      <Text x={4} y={base + 6} text="elev. (m)" {...LABEL} fontSize={9} />
      <ScaleBar view={view} width={width} />
    </Layer>
  );
}

/** A bar of a round length no longer than about 120 px, top right. */
function ScaleBar({ view, width }: { view: ViewTransform; width: number }) {
  const metres = niceLengthBelow(120 / view.scale);
  const px = metres * view.scale;
  const right = width - 14;
  const top = 12;
  const note = view.exaggeration === 1 ? "no exaggeration" : `vertical ×${view.exaggeration}`;
  const boxW = Math.max(px, 100) + 16;
  return (
    <>
      <Rect
        x={right - boxW + 8}
        y={top - 6}
        width={boxW}
        height={46}
        fill={CANVAS_COLORS.paper}
        opacity={0.9}
        cornerRadius={4}
      />
      <Line
        points={[right - px, top + 4, right - px, top + 10, right, top + 10, right, top + 4]}
        stroke={CANVAS_COLORS.ink}
        strokeWidth={1.5}
      />
      <Line points={[right - px / 2, top + 7, right - px / 2, top + 10]} stroke={CANVAS_COLORS.ink} strokeWidth={1} />
      <Text
        x={right - boxW + 8}
        y={top + 14}
        width={boxW - 8}
        align="right"
        text={`${formatTick(metres, metres)} m`}
        {...LABEL}
      />
      <Text x={right - boxW + 8} y={top + 26} width={boxW - 8} align="right" text={note} {...LABEL} />
    </>
  );
}
