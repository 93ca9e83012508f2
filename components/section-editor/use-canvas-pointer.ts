"use client";

import { useEffect, useEffectEvent, useLayoutEffect, useRef, useState } from "react";
import type { Point, SectionDocument } from "@/lib/stability";
import { moveSharedVertex, moveVertex } from "@/lib/editor/document-edits";
import { appendDraftPoint, closesDraft, type Draft } from "@/lib/editor/drafts";
import { groundSurface } from "@/lib/editor/ground-surface";
import { hitEdge, hitRegion, hitVertex } from "@/lib/editor/hit-testing";
import { allVertices, ownerOf, pointAt, type Owner, type VertexRef } from "@/lib/editor/refs";
import { setReservoirLevel, sideOf } from "@/lib/editor/reservoir-level";
import { snapPoint, VERTEX_SNAP_PX, type SnapKind } from "@/lib/editor/snapping";
import { screenToWorld, type ViewTransform } from "@/lib/editor/view-transform";
import type { EditorActions, EditorContext } from "./editor-actions";
import { dragPart, partMessage, pressRegion, pressSurcharge, type PartDrag } from "./part-drag";
import type { CanvasPointer, ToolName } from "./types";

/** Where the pointer is: raw and snapped (m), and whether it is over a vertex. */
export interface Hover {
  world: Point;
  snapped: Point;
  snap: SnapKind;
  overVertex: boolean;
}

interface PointerDeps extends EditorContext {
  view: ViewTransform | null;
  tool: ToolName;
  actions: EditorActions;
  spaceHeld(): boolean;
  pan(dx: number, dy: number): void;
  zoomBy(factor: number, sx: number, sy: number): void;
  setPreview(doc: SectionDocument | null): void;
}

type Gesture =
  | { kind: "pan"; lastX: number; lastY: number }
  | {
      kind: "drag";
      ref: VertexRef;
      from: Point;
      startX: number;
      startY: number;
      moved: boolean;
      detach: boolean;
      result: SectionDocument | null;
    }
  // The reservoir tool: a click sets the level; a press dragged up or down moves it, shown live, committed on release.
  | {
      kind: "pool";
      side: "left" | "right";
      y: number;
      startY: number;
      moved: boolean;
      result: SectionDocument | null;
    }
  // A whole region or a surcharge moved with the select tool (./part-drag.ts).
  | PartDrag;

/** Pixels the pointer must travel before a press on a vertex becomes a drag. */
const DRAG_THRESHOLD_PX = 3;
/** Pixels from a line that still count as a click on it. */
const EDGE_HIT_PX = 6;

function snapCandidates(doc: SectionDocument, draft: Draft | null, skip?: Point): Point[] {
  const pts = allVertices(doc).map((v) => v.point);
  const all = draft ? [...pts, ...draft.points] : pts;
  return skip ? all.filter((p) => p[0] !== skip[0] || p[1] !== skip[1]) : all;
}

/**
 * Turns canvas pointer events into editor actions: selecting, dragging vertices, whole regions and
 * surcharges (one undo step per drag, committed on release), drawing, setting the reservoir,
 * panning and zooming.
 */
export function useCanvasPointer(deps: PointerDeps): {
  handle(e: CanvasPointer): void;
  hover: Hover | null;
  gesture: Gesture["kind"] | null;
} {
  const gestureRef = useRef<Gesture | null>(null);
  const [gestureKind, setGestureKind] = useState<Gesture["kind"] | null>(null);
  const [hover, setHover] = useState<Hover | null>(null);
  // Handlers run after a commit, so the deps they read are refreshed then rather than during render.
  const depsRef = useRef(deps);
  useLayoutEffect(() => {
    depsRef.current = deps;
  });

  const start = (g: Gesture | null) => {
    gestureRef.current = g;
    setGestureKind(g?.kind ?? null);
  };

  const finish = () => {
    const g = gestureRef.current;
    const d = depsRef.current;
    if (g?.kind === "drag") {
      if (g.moved && g.result) d.commit(g.result);
      d.setPreview(null);
    }
    if (g?.kind === "part") {
      d.setPreview(null);
      if (g.moved && g.result) {
        d.commit(g.result);
        d.say(partMessage(g));
      }
    }
    if (g?.kind === "pool") {
      d.setPreview(null);
      if (g.moved && g.result) {
        d.commit(g.result);
        d.say(`Reservoir set at ${g.y.toFixed(2)} m on the ${g.side}.`);
      } else d.actions.applyReservoir(g.side, g.y);
    }
    start(null);
  };

  // A release outside the canvas still ends the gesture.
  const finishOutside = useEffectEvent(finish);
  useEffect(() => {
    const up = () => gestureRef.current && finishOutside();
    window.addEventListener("mouseup", up);
    return () => window.removeEventListener("mouseup", up);
  }, []);

  const snapped = (d: PointerDeps, view: ViewTransform, sx: number, sy: number, skip?: Point) => {
    const world = screenToWorld(view, sx, sy);
    const r = snapPoint(world, {
      gridStep: d.gridStep,
      vertices: snapCandidates(d.doc, d.draft, skip),
      view,
      tolerancePx: VERTEX_SNAP_PX,
    });
    return { world, ...r };
  };

  const press = (d: PointerDeps, view: ViewTransform, e: CanvasPointer) => {
    if (e.button === 1 || d.tool === "pan" || d.spaceHeld()) return start({ kind: "pan", lastX: e.sx, lastY: e.sy });
    if (e.button !== 0) return;
    const prefer: Owner | null = d.selection ? ownerOf(d.selection) : null;
    if (d.tool === "select") {
      const v = hitVertex(d.doc, view, e.sx, e.sy, VERTEX_SNAP_PX, prefer);
      if (v) {
        d.setSelection({
          ...(v.kind === "region" ? { kind: "region", region: v.region } : { kind: "phreatic" }),
          vertex: v.index,
        });
        const from = pointAt(d.doc, v);
        if (!d.readOnly && from)
          start({
            kind: "drag",
            ref: v,
            from,
            startX: e.sx,
            startY: e.sy,
            moved: false,
            detach: e.altKey,
            result: null,
          });
        return;
      }
      if (hitEdge(d.doc, { kind: "phreatic" }, view, e.sx, e.sy, EDGE_HIT_PX))
        return d.setSelection({ kind: "phreatic", vertex: null });
      const load = pressSurcharge(d.doc, view, e.sx, e.sy);
      if (load) {
        d.setSelection(null);
        d.say(`Surcharge ${load.index + 1}: drag it along the ground to move it.`);
        if (!d.readOnly) start(load.drag);
        return;
      }
      const region = hitRegion(d.doc, screenToWorld(view, e.sx, e.sy));
      d.setSelection(region >= 0 ? { kind: "region", region, vertex: null } : null);
      if (region >= 0 && !d.readOnly) start(pressRegion(region, view, e.sx, e.sy, e.altKey));
      return;
    }
    if (d.readOnly) return d.say("This section is read-only.");
    const s = snapped(d, view, e.sx, e.sy);
    if (d.tool === "region" || d.tool === "phreatic") {
      const draft = d.draft?.kind === d.tool ? d.draft : { kind: d.tool, points: [] };
      if (closesDraft(draft, s.point)) return d.actions.finishDraft();
      const step = appendDraftPoint(draft, s.point);
      if (!step.ok) return d.say(step.reason);
      d.setDraft(step.draft);
      d.say(null);
    } else if (d.tool === "reservoir") {
      const side = sideOf(groundSurface(d.doc.regions), s.point[0]);
      start({ kind: "pool", side, y: s.point[1], startY: e.sy, moved: false, result: null });
    }
  };

  const move = (d: PointerDeps, view: ViewTransform, e: CanvasPointer) => {
    const g = gestureRef.current;
    if (g?.kind === "pan") {
      d.pan(e.sx - g.lastX, e.sy - g.lastY);
      gestureRef.current = { ...g, lastX: e.sx, lastY: e.sy };
      return;
    }
    if (g?.kind === "pool") {
      if (!g.moved && Math.abs(e.sy - g.startY) < DRAG_THRESHOLD_PX) return;
      const s = snapped(d, view, e.sx, e.sy);
      const r = setReservoirLevel(d.doc, g.side, s.point[1]);
      gestureRef.current = r.ok ? { ...g, moved: true, y: s.point[1], result: r.doc } : { ...g, moved: true };
      if (r.ok) d.setPreview(r.doc);
      setHover({ world: s.world, snapped: s.point, snap: s.kind, overVertex: false });
      return;
    }
    if (g?.kind === "part") {
      const next = dragPart(g, d.doc, view, e.sx, e.sy, d.gridStep, e.altKey);
      if (next === g) return;
      gestureRef.current = next;
      if (next.result) d.setPreview(next.result);
      const w = screenToWorld(view, e.sx, e.sy);
      setHover({ world: w, snapped: w, snap: "none", overVertex: false });
      return;
    }
    if (g?.kind === "drag") {
      if (!g.moved && Math.hypot(e.sx - g.startX, e.sy - g.startY) < DRAG_THRESHOLD_PX) return;
      // The dragged corner must not snap to itself or to the corners that travel with it.
      const s = snapped(d, view, e.sx, e.sy, g.from);
      const base = d.doc;
      const result = g.detach || e.altKey ? moveVertex(base, g.ref, s.point) : moveSharedVertex(base, g.ref, s.point);
      gestureRef.current = { ...g, moved: true, result };
      d.setPreview(result);
      setHover({ world: s.world, snapped: s.point, snap: s.kind, overVertex: true });
      return;
    }
    const s = snapped(d, view, e.sx, e.sy);
    const overVertex = d.tool === "select" && hitVertex(d.doc, view, e.sx, e.sy, VERTEX_SNAP_PX) !== null;
    setHover({
      world: s.world,
      snapped: d.tool === "select" ? s.world : s.point,
      snap: d.tool === "select" ? "none" : s.kind,
      overVertex,
    });
  };

  const doubleClick = (d: PointerDeps, view: ViewTransform, e: CanvasPointer) => {
    if ((d.tool === "region" || d.tool === "phreatic") && d.draft) return d.actions.finishDraft();
    if (d.tool !== "select" || d.readOnly) return;
    if (hitVertex(d.doc, view, e.sx, e.sy, VERTEX_SNAP_PX)) return;
    const owners: Owner[] = [
      ...(d.selection ? [ownerOf(d.selection)] : []),
      { kind: "phreatic" },
      ...d.doc.regions.map((_, region): Owner => ({ kind: "region", region })).reverse(),
    ];
    for (const owner of owners) {
      const hit = hitEdge(d.doc, owner, view, e.sx, e.sy, EDGE_HIT_PX);
      if (hit) return d.actions.insertPointAfter(owner, hit.after, hit.point);
    }
  };

  const handle = (e: CanvasPointer) => {
    const d = depsRef.current;
    const view = d.view;
    if (!view) return;
    if (e.type === "down") press(d, view, e);
    else if (e.type === "move") move(d, view, e);
    else if (e.type === "up") finish();
    else if (e.type === "dblclick") doubleClick(d, view, e);
    else if (e.type === "wheel") d.zoomBy(Math.exp(-e.deltaY * 0.0015), e.sx, e.sy);
    else if (e.type === "leave" && !gestureRef.current) setHover(null);
  };

  return { handle, hover, gesture: gestureKind };
}
