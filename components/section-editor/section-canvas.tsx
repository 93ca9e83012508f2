"use client";

/**
 * The konva drawing of the section. It only draws: pointer events are read by the
 * container in section-editor.tsx, which keeps this file free of editing logic. Konva
 * needs a browser, so this module is loaded through next/dynamic with ssr: false.
 */
import { useMemo } from "react";
import { Stage } from "react-konva";
import type { Point, SectionDocument } from "@/lib/stability";
import type { Draft } from "@/lib/editor/drafts";
import type { Selection } from "@/lib/editor/refs";
import type { ViewTransform } from "@/lib/editor/view-transform";
import { AxesLayer } from "./layers/axes-layer";
import { GridLayer } from "./layers/grid-layer";
import { IssueMarkersLayer } from "./layers/issue-markers-layer";
import { LiveGhostLayer } from "./layers/live-ghost-layer";
import type { LiveGhost } from "@/lib/live/live-ghosts";
import { OverlayLayer } from "./layers/overlay-layer";
import { SectionLayer } from "./layers/section-layer";
import { SurchargeLayer } from "./layers/surcharge-layer";
import { CANVAS_COLORS } from "./palette";
import { materialColorMap } from "@/lib/sections/material-palette";
import type { EditorIssue, MaterialSwatch, ToolName } from "./types";
import type { Hover } from "./use-canvas-pointer";

export interface SectionCanvasProps {
  width: number;
  height: number;
  view: ViewTransform;
  doc: SectionDocument;
  materials: MaterialSwatch[];
  ground: Point[];
  ponds: Point[][];
  tool: ToolName;
  selection: Selection | null;
  draft: Draft | null;
  hover: Hover | null;
  issues: EditorIssue[];
  focusedIssue: number | null;
  reservoirPreview: { y: number; x1: number; x2: number } | null;
  /** Live mode's critical circles; settling ones are drawn fainter. */
  live?: { ghosts: LiveGhost[]; settling: boolean } | null;
}

export default function SectionCanvas(props: SectionCanvasProps) {
  const { width, height, view, doc, materials } = props;
  const colorOf = useMemo(() => {
    const known = new Map(materials.map((m) => [m.key, m.color]));
    const own = materialColorMap(doc.materials);
    return (key: string) => known.get(key) ?? own[key] ?? CANVAS_COLORS.unknownMaterial;
  }, [materials, doc.materials]);

  return (
    <Stage width={width} height={height} listening={false}>
      <GridLayer view={view} width={width} height={height} />
      <SectionLayer doc={doc} view={view} colorOf={colorOf} ground={props.ground} ponds={props.ponds} />
      <SurchargeLayer doc={doc} view={view} ground={props.ground} />
      <OverlayLayer
        doc={doc}
        view={view}
        tool={props.tool}
        selection={props.selection}
        draft={props.draft}
        hover={props.hover}
        reservoirPreview={props.reservoirPreview}
      />
      {props.live ? <LiveGhostLayer ghosts={props.live.ghosts} view={view} settling={props.live.settling} /> : null}
      <IssueMarkersLayer issues={props.issues} view={view} focused={props.focusedIssue} />
      <AxesLayer view={view} width={width} height={height} />
    </Stage>
  );
}
