"use client";

import { Circle, Layer, Line, Rect, Text } from "react-konva";
import type { SectionDocument } from "@/lib/stability";
import type { Draft } from "@/lib/editor/drafts";
import { ownerOf, ownerPoints, type Selection } from "@/lib/editor/refs";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { CANVAS_COLORS } from "../palette";
import type { ToolName } from "../types";
import type { Hover } from "../use-canvas-pointer";
import { CANVAS_FONT, toScreenList } from "./draw-helpers";

interface OverlayLayerProps {
  doc: SectionDocument;
  view: ViewTransform;
  tool: ToolName;
  selection: Selection | null;
  draft: Draft | null;
  hover: Hover | null;
  reservoirPreview: { y: number; x1: number; x2: number } | null;
}

const HANDLE = 8;

/** What the user is working on: the selection, vertex handles, the drawing in progress and snap hints. */
export function OverlayLayer({ doc, view, tool, selection, draft, hover, reservoirPreview }: OverlayLayerProps) {
  const owner = selection ? ownerOf(selection) : null;
  const selected = owner ? ownerPoints(doc, owner) : undefined;
  const showAllVertices = tool === "select" || tool === "region" || tool === "phreatic";
  return (
    <Layer listening={false}>
      {showAllVertices &&
        doc.regions.flatMap((r, ri) =>
          r.points.map((p, pi) => {
            const [x, y] = worldToScreen(view, p[0], p[1]);
            return <Circle key={`v${ri}-${pi}`} x={x} y={y} radius={2.5} fill={CANVAS_COLORS.inkSoft} />;
          }),
        )}
      {showAllVertices &&
        (doc.water?.phreatic ?? []).map((p, i) => {
          const [x, y] = worldToScreen(view, p[0], p[1]);
          return <Circle key={`w${i}`} x={x} y={y} radius={2.5} fill={CANVAS_COLORS.waterLine} />;
        })}
      {selected && selected.length > 1 && (
        <Line
          points={toScreenList(selected, view)}
          closed={owner?.kind === "region"}
          stroke={CANVAS_COLORS.accent}
          strokeWidth={3}
          lineJoin="round"
        />
      )}
      {selected?.map((p, i) => {
        const [x, y] = worldToScreen(view, p[0], p[1]);
        const active = selection?.vertex === i;
        const size = active ? HANDLE + 4 : HANDLE;
        return (
          <Rect
            key={`h${i}`}
            x={x - size / 2}
            y={y - size / 2}
            width={size}
            height={size}
            fill={active ? CANVAS_COLORS.accent : CANVAS_COLORS.paper}
            stroke={active ? CANVAS_COLORS.ink : CANVAS_COLORS.accent}
            strokeWidth={1.5}
          />
        );
      })}
      {draft && <DraftShape draft={draft} view={view} hover={hover} />}
      {reservoirPreview && <ReservoirPreview {...reservoirPreview} view={view} />}
      {hover && hover.snap === "vertex" && (
        <Circle
          x={worldToScreen(view, ...hover.snapped)[0]}
          y={worldToScreen(view, ...hover.snapped)[1]}
          radius={7}
          stroke={CANVAS_COLORS.accent}
          strokeWidth={2}
        />
      )}
      {hover && hover.snap === "grid" && <GridCross view={view} at={hover.snapped} />}
    </Layer>
  );
}

function DraftShape({ draft, view, hover }: { draft: Draft; view: ViewTransform; hover: Hover | null }) {
  const pts = toScreenList(draft.points, view);
  const last = draft.points[draft.points.length - 1];
  const color = draft.kind === "phreatic" ? CANVAS_COLORS.waterLine : CANVAS_COLORS.accent;
  return (
    <>
      <Line
        points={pts}
        stroke={color}
        strokeWidth={2}
        closed={false}
        dash={draft.kind === "phreatic" ? [10, 6] : undefined}
      />
      {last && hover && (
        <Line points={toScreenList([last, hover.snapped], view)} stroke={color} strokeWidth={1.5} dash={[4, 4]} />
      )}
      {draft.points.map((p, i) => {
        const [x, y] = worldToScreen(view, p[0], p[1]);
        return (
          <Circle
            key={i}
            x={x}
            y={y}
            radius={i === 0 ? 6 : 4}
            fill={CANVAS_COLORS.paper}
            stroke={color}
            strokeWidth={2}
          />
        );
      })}
    </>
  );
}

function ReservoirPreview({ y, x1, x2, view }: { y: number; x1: number; x2: number; view: ViewTransform }) {
  const [ax, ay] = worldToScreen(view, x1, y);
  const [bx] = worldToScreen(view, x2, y);
  return (
    <>
      <Line points={[ax, ay, bx, ay]} stroke={CANVAS_COLORS.waterLine} strokeWidth={2} dash={[3, 3]} />
      <Text
        x={Math.min(ax, bx) + 4}
        y={ay - 16}
        text={`${y.toFixed(2)} m`}
        fontSize={11}
        fontFamily={CANVAS_FONT}
        fill={CANVAS_COLORS.waterLine}
      />
    </>
  );
}

function GridCross({ view, at }: { view: ViewTransform; at: [number, number] }) {
  const [x, y] = worldToScreen(view, at[0], at[1]);
  return (
    <>
      <Line points={[x - 5, y, x + 5, y]} stroke={CANVAS_COLORS.inkSoft} strokeWidth={1} />
      <Line points={[x, y - 5, x, y + 5]} stroke={CANVAS_COLORS.inkSoft} strokeWidth={1} />
    </>
  );
}
