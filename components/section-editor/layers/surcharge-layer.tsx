"use client";

import { Arrow, Layer, Line, Text } from "react-konva";
import type { Point, SectionDocument } from "@/lib/stability";
import { groundAt } from "@/lib/editor/ground-surface";
import { SURCHARGE_BAND_PX } from "@/lib/editor/move-parts";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { CANVAS_COLORS } from "../palette";
import { CANVAS_FONT } from "./draw-helpers";

/** Pixels between the arrows of a surcharge band. */
const ARROW_SPACING_PX = 16;

/** The band's top edge and arrows over one strip, following the ground, in screen pixels. */
function band(ground: readonly Point[], view: ViewTransform, x1: number, x2: number) {
  const xs = [x1, ...ground.map((p) => p[0]).filter((x) => x > x1 && x < x2), x2];
  const top: number[] = [];
  for (const x of xs) {
    const y = groundAt(ground, x);
    if (y === null) continue;
    const [sx, sy] = worldToScreen(view, x, y);
    top.push(sx, sy - SURCHARGE_BAND_PX);
  }
  const [l] = worldToScreen(view, x1, 0);
  const [r] = worldToScreen(view, x2, 0);
  const n = Math.max(1, Math.round((r - l) / ARROW_SPACING_PX));
  const arrows: number[][] = [];
  for (let i = 0; i <= n; i++) {
    const x = x1 + ((x2 - x1) * i) / n;
    const y = groundAt(ground, x);
    if (y === null) continue;
    const [sx, sy] = worldToScreen(view, x, y);
    arrows.push([sx, sy - SURCHARGE_BAND_PX, sx, sy - 2]);
  }
  return { top, arrows, label: [l, (top[1] ?? 0) - 14] as const };
}

/** Surcharge strips as a band of downward arrows above the ground, with the pressure; drag one to move it. */
export function SurchargeLayer({ doc, view, ground }: { doc: SectionDocument; view: ViewTransform; ground: Point[] }) {
  const list = doc.loads?.surcharges ?? [];
  if (list.length === 0 || ground.length < 2) return null;
  return (
    <Layer listening={false}>
      {list.map((s, i) => {
        const b = band(ground, view, Math.min(s.x1, s.x2), Math.max(s.x1, s.x2));
        return [
          <Line key={`t${i}`} points={b.top} stroke={CANVAS_COLORS.inkSoft} strokeWidth={1.5} />,
          ...b.arrows.map((a, j) => (
            <Arrow
              key={`a${i}-${j}`}
              points={a}
              stroke={CANVAS_COLORS.inkSoft}
              fill={CANVAS_COLORS.inkSoft}
              strokeWidth={1}
              pointerLength={4}
              pointerWidth={4}
            />
          )),
          <Text
            key={`q${i}`}
            x={b.label[0]}
            y={b.label[1]}
            text={`${s.q} kPa`}
            fontSize={11}
            fontFamily={CANVAS_FONT}
            fill={CANVAS_COLORS.inkSoft}
          />,
        ];
      })}
    </Layer>
  );
}
