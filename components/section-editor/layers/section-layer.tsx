"use client";

import { Layer, Line } from "react-konva";
import type { Point, SectionDocument } from "@/lib/stability";
import type { ViewTransform } from "@/lib/editor/view-transform";
import { CANVAS_COLORS, POND_FILL_OPACITY, REGION_FILL_OPACITY } from "../palette";
import { toScreenList, withAlpha } from "./draw-helpers";

interface SectionLayerProps {
  doc: SectionDocument;
  view: ViewTransform;
  /** Material key → fill colour. */
  colorOf(material: string): string;
  ground: Point[];
  ponds: Point[][];
}

/** The section itself: regions, reservoir water, the ground surface and the phreatic line. */
export function SectionLayer({ doc, view, colorOf, ground, ponds }: SectionLayerProps) {
  const phreatic = doc.water?.phreatic;
  return (
    <Layer listening={false}>
      {doc.regions.map((r, i) => (
        <Line
          key={`r${i}`}
          points={toScreenList(r.points, view)}
          closed
          fill={withAlpha(colorOf(r.material), REGION_FILL_OPACITY)}
          stroke={CANVAS_COLORS.ink}
          strokeWidth={1}
          lineJoin="round"
        />
      ))}
      {ponds.map((p, i) => (
        <Line
          key={`p${i}`}
          points={toScreenList(p, view)}
          closed
          fill={withAlpha(CANVAS_COLORS.pondFill, POND_FILL_OPACITY)}
        />
      ))}
      {ground.length > 1 && (
        <Line
          points={toScreenList(ground, view)}
          stroke={CANVAS_COLORS.ink}
          strokeWidth={2.75}
          lineJoin="round"
          lineCap="round"
        />
      )}
      {phreatic && phreatic.length > 1 && (
        <Line
          points={toScreenList(phreatic, view)}
          stroke={CANVAS_COLORS.waterLine}
          strokeWidth={2}
          dash={[10, 6]}
          lineJoin="round"
        />
      )}
    </Layer>
  );
}
