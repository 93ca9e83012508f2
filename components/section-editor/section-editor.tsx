"use client";

import dynamic from "next/dynamic";
import { useEffect, useEffectEvent, useMemo, useRef, useState, type MouseEvent } from "react";
import type { SectionDocument } from "@/lib/stability";
import { documentBounds } from "@/lib/editor/bounds";
import type { Draft } from "@/lib/editor/drafts";
import { groundSurface } from "@/lib/editor/ground-surface";
import { pondedWater } from "@/lib/editor/ponded-water";
import { clampSelection, type Selection } from "@/lib/editor/refs";
import { reservoirSpan, sideOf } from "@/lib/editor/reservoir-level";
import { DEFAULT_GRID_STEP } from "@/lib/editor/snapping";
import { createEditorActions } from "./editor-actions";
import { IssueList } from "./issue-list";
import { SelectionPanel } from "./selection-panel";
import { ShortcutHelp } from "./shortcut-help";
import { describeSelection, StatusBar } from "./status-bar";
import { Toolbar } from "./toolbar";
import type { CanvasPointer, SectionEditorProps, ToolName } from "./types";
import { useCanvasPointer } from "./use-canvas-pointer";
import { useEditorDocument } from "./use-editor-document";
import { useEditorKeys } from "./use-editor-keys";
import { useView, ZOOM_STEP } from "./use-view";
import { VertexTable } from "./vertex-table";
import { LiveBar } from "./live-bar";
import { useLiveSearch } from "@/components/runs/setup/use-live-search";
import { keptSection, liveCircleCount, liveDocument, liveSetupFor, type LiveSetup } from "@/lib/live/live-setup";
import { WaterPanel } from "./water-panel";
import { WaterConditionsPanel } from "./water-conditions-panel";
import {
  addWaterCondition,
  drawnConditionId,
  removeWaterCondition,
  showWaterCondition,
  storeDrawnWater,
  updateWaterCondition,
} from "@/lib/sections/water-condition-edits";
import { waterConditionsOf } from "@/lib/sections/water-conditions";

export type { SectionEditorProps, MaterialSwatch, EditorIssue } from "./types";

// Konva needs a browser canvas, so the drawing is never rendered on the server.
const SectionCanvas = dynamic(() => import("./section-canvas"), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-ink-faint">Loading the drawing…</p>,
});

/**
 * The cross-section editor: a controlled component over the engine's section document.
 * The parent owns the document; the editor keeps its own undo history of documents and
 * reports every change through onChange.
 */
export function SectionEditor({
  document,
  onChange,
  materials,
  issues = [],
  readOnly = false,
  height = 520,
  live,
}: SectionEditorProps) {
  const history = useEditorDocument(document, onChange);
  const stored = history.current();
  const [chosenWater, setChosenWater] = useState<string | null>(null);
  // The editor draws and edits one water condition at a time. Choosing which is a view, not an
  // edit: the stored document only changes when the drawing does.
  const activeWater = waterConditionsOf(stored).some((c) => c.id === chosenWater)
    ? chosenWater!
    : drawnConditionId(stored);
  const doc = useMemo(() => showWaterCondition(stored, activeWater), [stored, activeWater]);
  const [tool, setToolState] = useState<ToolName>("select");
  const [rawSelection, setSelection] = useState<Selection | null>(null);
  const [draft, setDraft] = useState<Draft | null>(null);
  const [preview, setPreview] = useState<SectionDocument | null>(null);
  const [gridStep, setGridStep] = useState<number>(DEFAULT_GRID_STEP);
  const [exaggeration, setExaggeration] = useState(1);
  const [message, setMessage] = useState<string | null>(null);
  const [focusedIssue, setFocusedIssue] = useState<number | null>(null);
  const [newRegionMaterial, setNewRegionMaterial] = useState(materials[0]?.key ?? doc.materials[0]?.id ?? "");
  const containerRef = useRef<HTMLDivElement>(null);
  const rootRef = useRef<HTMLDivElement>(null);
  const commit = (next: SectionDocument) => history.commit(storeDrawnWater(stored, next, activeWater));

  // Undo or a deletion can leave the selection pointing past the end.
  const selection = clampSelection(doc, rawSelection);
  const shown = preview ?? doc;
  const bounds = useMemo(() => documentBounds(doc), [doc]);
  const ground = useMemo(() => groundSurface(shown.regions), [shown.regions]);
  const ponds = useMemo(() => pondedWater(shown.water?.phreatic ?? [], ground), [shown.water?.phreatic, ground]);
  const view = useView(containerRef, height, bounds, exaggeration);
  // Live mode: the search set-up is fixed when it starts, so the grid does not move under the pointer.
  const [liveSetup, setLiveSetup] = useState<LiveSetup | null>(null);
  const liveDoc = useMemo(
    () => (liveSetup ? liveDocument(keptSection(stored, shown, activeWater), liveSetup.setup, activeWater) : null),
    [liveSetup, stored, shown, activeWater],
  );
  const liveDisplay = useLiveSearch(liveDoc);
  const liveAnswer =
    liveDisplay.state === "settling" || liveDisplay.state === "final"
      ? { ghosts: liveDisplay.result.outcome.ghosts, settling: liveDisplay.state === "settling" }
      : null;

  const setTool = (t: ToolName) => {
    if (t !== tool) setDraft(null);
    setToolState(t);
    setMessage(null);
  };
  // What the actions and the pointer both need to read and change the drawing.
  const editing = {
    doc,
    readOnly,
    selection,
    setSelection,
    draft,
    setDraft,
    newRegionMaterial,
    gridStep,
    commit,
    say: setMessage,
    showPoint: view.showPoint,
  };
  const actions = createEditorActions(editing);
  const historyStep = (go: () => void) => () => {
    setDraft(null);
    setMessage(null);
    if (!readOnly) go();
  };
  const undo = historyStep(history.undo);
  const redo = historyStep(history.redo);
  const keys = useEditorKeys({
    actions,
    draft,
    setDraft,
    selection,
    setSelection,
    tool,
    setTool,
    undo,
    redo,
    zoomBy: (f) => view.zoomBy(f),
    fit: view.fit,
    readOnly,
    doc,
    bounds,
    gridStep,
    rootRef,
    canvasRef: containerRef,
  });
  const pointer = useCanvasPointer({
    ...editing,
    view: view.view,
    tool,
    actions,
    spaceHeld: keys.spaceHeld,
    pan: view.pan,
    zoomBy: view.zoomBy,
    setPreview,
  });

  // The keyboard's cursor stands in for the pointer while a drawing tool is active.
  const hover = pointer.hover ?? keys.cursor;

  // React's wheel listener is passive; zooming must stop the page from scrolling.
  const handleWheel = useEffectEvent((e: Parameters<typeof pointer.handle>[0]) => pointer.handle(e));
  useEffect(() => {
    const el = containerRef.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      handleWheel({
        type: "wheel",
        sx: e.clientX - r.left,
        sy: e.clientY - r.top,
        button: 0,
        altKey: e.altKey,
        shiftKey: e.shiftKey,
        deltaY: e.deltaY,
      });
    };
    el.addEventListener("wheel", onWheel, { passive: false });
    return () => el.removeEventListener("wheel", onWheel);
  }, []);

  const forward = (type: CanvasPointer["type"]) => (e: MouseEvent<HTMLDivElement>) => {
    const r = e.currentTarget.getBoundingClientRect();
    if (type === "down") {
      // Middle-button autoscroll would fight the pan.
      if (e.button === 1) e.preventDefault();
      e.currentTarget.focus({ preventScroll: true });
    }
    pointer.handle({
      type,
      sx: e.clientX - r.left,
      sy: e.clientY - r.top,
      button: e.button,
      altKey: e.altKey,
      shiftKey: e.shiftKey,
      deltaY: 0,
    });
  };

  const reservoirPreview = useMemo(() => {
    if (tool !== "reservoir" || !hover || readOnly) return null;
    const y = hover.snapped[1];
    const span = reservoirSpan(ground, sideOf(ground, hover.snapped[0]), y);
    return span ? { y, ...span } : null;
  }, [tool, hover, ground, readOnly]);

  const cursor =
    pointer.gesture === "pan"
      ? "grabbing"
      : tool === "pan"
        ? "grab"
        : tool !== "select"
          ? "crosshair"
          : pointer.hover?.overVertex
            ? "move"
            : "default";
  const v = view.view;

  return (
    <div
      ref={rootRef}
      data-testid="section-editor"
      className="flex flex-col gap-3"
      onKeyDown={keys.onKeyDown}
      onKeyUp={keys.onKeyUp}
    >
      <Toolbar
        tool={tool}
        onTool={setTool}
        readOnly={readOnly}
        canUndo={history.canUndo}
        canRedo={history.canRedo}
        onUndo={undo}
        onRedo={redo}
        onZoomIn={() => view.zoomBy(ZOOM_STEP)}
        onZoomOut={() => view.zoomBy(1 / ZOOM_STEP)}
        onFit={view.fit}
        gridStep={gridStep}
        onGridStep={setGridStep}
        exaggeration={exaggeration}
        onExaggeration={setExaggeration}
      />
      <div className="flex flex-col gap-3 lg:flex-row">
        <div className="min-w-0 flex-1">
          {/* The border sits on a wrapper so the canvas container's own box starts where the drawing does. */}
          <div className="rounded-lg border border-rule bg-paper-raised">
            <div
              ref={containerRef}
              data-testid="editor-canvas"
              data-view={
                v
                  ? JSON.stringify({
                      scale: v.scale,
                      offsetX: v.offsetX,
                      offsetY: v.offsetY,
                      exaggeration: v.exaggeration,
                    })
                  : undefined
              }
              tabIndex={0}
              role="application"
              aria-label="Section drawing. Tab chooses a region, arrows choose and move a vertex, Enter types its coordinates, question mark lists every key."
              aria-describedby="editor-chosen"
              className="relative overflow-hidden rounded-lg outline-none focus:ring-2 focus:ring-clay-600 focus:ring-offset-2"
              style={{ height, cursor }}
              onMouseDown={forward("down")}
              onMouseMove={forward("move")}
              onMouseUp={forward("up")}
              onMouseLeave={forward("leave")}
              onDoubleClick={forward("dblclick")}
              onContextMenu={(e) => e.preventDefault()}
            >
              {v && view.width > 0 && (
                <SectionCanvas
                  width={view.width}
                  height={height}
                  view={v}
                  doc={shown}
                  materials={materials}
                  ground={ground}
                  ponds={ponds}
                  tool={tool}
                  selection={selection}
                  draft={draft}
                  hover={hover}
                  issues={issues}
                  focusedIssue={focusedIssue}
                  reservoirPreview={reservoirPreview}
                  live={liveAnswer}
                />
              )}
            </div>
          </div>
          {live ? (
            <LiveBar
              on={liveSetup !== null}
              onToggle={() => setLiveSetup(liveSetup ? null : liveSetupFor(stored, live.lastRunSetup))}
              display={liveDisplay}
              setup={liveSetup}
              circles={liveSetup ? liveCircleCount(liveSetup.setup) : 0}
              onKeep={readOnly ? undefined : live.onKeep}
              canKeep={live.canKeep ?? false}
              keepLabel={live.keepLabel}
            />
          ) : null}
          <StatusBar
            tool={tool}
            hover={hover}
            message={message}
            chosen={describeSelection(doc, selection, materials)}
          />
          <ShortcutHelp open={keys.helpOpen} onToggle={() => keys.setHelpOpen(!keys.helpOpen)} />
        </div>
        <aside className="flex w-full flex-col gap-3 lg:w-80" aria-label="Section details">
          <SelectionPanel
            doc={doc}
            materials={materials}
            selection={selection}
            tool={tool}
            readOnly={readOnly}
            newRegionMaterial={newRegionMaterial}
            onNewRegionMaterial={setNewRegionMaterial}
            onSetMaterial={actions.setMaterial}
            onDeleteSelection={actions.deleteSelection}
            onInsertAfterSelection={actions.insertAfterSelection}
          />
          <VertexTable
            doc={doc}
            selection={selection}
            readOnly={readOnly}
            onSelectVertex={setSelection}
            onMove={actions.moveTo}
            onInsertAfter={actions.insertPointAfter}
            onDelete={actions.deletePointAt}
          />
          <IssueList
            issues={issues}
            focused={focusedIssue}
            onPick={(i) => {
              setFocusedIssue(i);
              setToolState("select");
              setDraft(null);
              actions.focusIssue(issues[i]);
            }}
          />
          <WaterConditionsPanel
            doc={doc}
            activeId={activeWater}
            readOnly={readOnly}
            onShow={setChosenWater}
            onAdd={(name) => {
              const added = addWaterCondition(doc, name);
              setChosenWater(added.id);
              history.commit(storeDrawnWater(stored, added.doc, activeWater));
            }}
            onUpdate={(id, patch) => history.commit(updateWaterCondition(stored, id, patch))}
            onRemove={(id) => {
              const r = removeWaterCondition(stored, id);
              if (!r) return;
              setChosenWater(r.shown);
              history.commit(r.doc);
            }}
          />
          <WaterPanel doc={doc} readOnly={readOnly} onApply={actions.applyReservoir} />
        </aside>
      </div>
    </div>
  );
}
