"use client";

import { useRef, useState, type KeyboardEvent, type RefObject } from "react";
import type { Draft } from "@/lib/editor/drafts";
import { dropLastDraftPoint } from "@/lib/editor/drafts";
import { pickVertexToward, stepItem } from "@/lib/editor/keyboard-selection";
import type { Selection } from "@/lib/editor/refs";
import type { Point, SectionDocument } from "@/lib/stability";
import { nudgeStep, snapToGrid } from "@/lib/editor/snapping";
import type { Bounds } from "@/lib/editor/view-transform";
import type { Hover } from "./use-canvas-pointer";
import type { EditorActions } from "./editor-actions";
import { toolByKey } from "./tools";
import type { ToolName } from "./types";
import { ZOOM_STEP } from "./use-view";

interface KeyDeps {
  doc: SectionDocument;
  actions: EditorActions;
  draft: Draft | null;
  setDraft(d: Draft | null): void;
  selection: Selection | null;
  setSelection(s: Selection | null): void;
  tool: ToolName;
  setTool(t: ToolName): void;
  undo(): void;
  redo(): void;
  zoomBy(factor: number): void;
  fit(): void;
  readOnly: boolean;
  /** The drawing's extent: the keyboard's cursor starts in its middle. */
  bounds: Bounds;
  gridStep: number;
  /** The editor's root (where the coordinate fields are) and the drawing (where Escape returns). */
  rootRef: RefObject<HTMLElement | null>;
  canvasRef: RefObject<HTMLElement | null>;
}

const DRAWING_TOOLS = ["region", "phreatic", "reservoir"] as const;
type DrawingTool = (typeof DRAWING_TOOLS)[number];
const isDrawingTool = (t: ToolName): t is DrawingTool => (DRAWING_TOOLS as readonly string[]).includes(t);

/** Keys typed into a field belong to the field, not to the drawing. */
function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ["INPUT", "SELECT", "TEXTAREA"].includes(target.tagName);
}

/** Shift with an arrow moves this many grid steps at once. */
export const BIG_STEPS = 10;

const ARROWS: Record<string, [number, number]> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, 1],
  ArrowDown: [0, -1],
};

/**
 * Keyboard use of the editor. Returns handlers for the editor's root element and a probe
 * telling whether Space is held (Space-drag pans with any tool).
 */
export function useEditorKeys(input: KeyDeps) {
  const space = useRef(false);
  const [helpOpen, setHelpOpen] = useState(false);
  // The keyboard's cursor for the drawing tools, in metres; null until an arrow moves it.
  const [keyPoint, setKeyPoint] = useState<Point | null>(null);
  const { selection, setSelection, bounds, gridStep } = input;
  const deps = {
    ...input,
    helpOpen,
    setHelpOpen,
    keyPoint,
    setKeyPoint,
    /** Where the keyboard's cursor starts: the last point drawn, or the middle of the section. */
    startPoint: (): Point =>
      input.draft?.points.at(-1) ??
      snapToGrid([(bounds.minX + bounds.maxX) / 2, (bounds.minY + bounds.maxY) / 2], gridStep),
    /** Puts the keyboard in the coordinate fields of the selected vertex. */
    openCoordinates: () => {
      const vertex = selection?.vertex ?? 0;
      if (selection && selection.vertex === null) setSelection({ ...selection, vertex });
      // The table renders the row on the next frame when the selection has just changed.
      requestAnimationFrame(() => {
        const field = input.rootRef.current?.querySelector<HTMLInputElement>(`[data-testid='vertex-x-${vertex}']`);
        field?.focus();
        field?.select();
      });
    },
    focusCanvas: () => input.canvasRef.current?.focus(),
  };

  const onKeyDown = (e: KeyboardEvent<HTMLElement>) => {
    if (isTyping(e.target)) {
      // Escape in a coordinate field goes back to the drawing, where the keyboard came from.
      const inTable = e.target instanceof HTMLElement && e.target.closest("[data-testid='vertex-table']");
      if (e.key === "Escape" && inTable) deps.focusCanvas();
      return;
    }
    // "?" opens the shortcut list from anywhere in the editor; Escape closes it first.
    if (e.key === "?") {
      deps.setHelpOpen(!deps.helpOpen);
      return e.preventDefault();
    }
    if (e.key === "Escape" && deps.helpOpen) {
      deps.setHelpOpen(false);
      return e.preventDefault();
    }
    // The drawing's own keys act only while the drawing has the focus; elsewhere Tab and the
    // arrows keep their usual meaning.
    if (!(e.target instanceof HTMLElement) || e.target.dataset.testid !== "editor-canvas") {
      if (e.key === "Tab" || e.key in ARROWS) return;
    }
    // Space and Enter on a focused button press the button.
    if ((e.key === " " || e.key === "Enter") && e.target instanceof HTMLButtonElement) return;
    const d = deps;
    const mod = e.ctrlKey || e.metaKey;
    const key = e.key;
    let handled = true;
    if (mod && key.toLowerCase() === "z") {
      if (e.shiftKey) d.redo();
      else d.undo();
    } else if (mod && key.toLowerCase() === "y") d.redo();
    else if (mod || e.altKey) handled = false;
    else if (key === "Tab") {
      // Tab walks regions then the phreatic line; off either end the focus moves on as usual.
      const next = stepItem(d.doc, d.selection, e.shiftKey ? -1 : 1);
      if (next === "leave") handled = false;
      else d.setSelection(next === "clear" ? null : next);
    } else if (key === " ") space.current = true;
    else if (key === "Escape") {
      if (d.draft) d.setDraft(null);
      else if (d.selection?.kind && d.selection.vertex !== null) d.setSelection({ ...d.selection, vertex: null });
      else if (d.selection) d.setSelection(null);
      else d.setTool("select");
    } else if (key === "Enter") {
      if (d.draft) d.actions.finishDraft();
      else if (d.selection) d.openCoordinates();
      else handled = false;
    } else if (key === "Delete" || key === "Backspace") {
      if (d.draft) d.setDraft(d.draft.points.length > 1 ? dropLastDraftPoint(d.draft) : null);
      else d.actions.deleteSelection();
    } else if (key in ARROWS && isDrawingTool(d.tool) && !d.readOnly) {
      // With a drawing tool the arrows move a cursor; A puts a point where it stands.
      const [dx, dy] = ARROWS[key];
      const step = nudgeStep(d.gridStep) * (e.shiftKey ? BIG_STEPS : 1);
      const from = d.keyPoint ?? d.startPoint();
      const tidy = (v: number) => Math.round(v * 1e9) / 1e9;
      d.setKeyPoint(d.keyPoint ? [tidy(from[0] + dx * step), tidy(from[1] + dy * step)] : from);
    } else if ((key === "a" || key === "A") && isDrawingTool(d.tool)) {
      d.actions.placeAt(d.tool, d.keyPoint ?? d.startPoint());
    } else if (key in ARROWS && d.selection) {
      const [dx, dy] = ARROWS[key];
      if (d.selection.vertex === null) d.setSelection(pickVertexToward(d.doc, d.selection, dx, dy));
      else d.actions.nudge(dx * (e.shiftKey ? BIG_STEPS : 1), dy * (e.shiftKey ? BIG_STEPS : 1));
    } else if (key === "+" || key === "=") d.zoomBy(ZOOM_STEP);
    else if (key === "-" || key === "_") d.zoomBy(1 / ZOOM_STEP);
    else if (key === "f" || key === "F") d.fit();
    else if (key === "i" || key === "I") d.actions.insertAfterSelection();
    else if (key === "]") d.actions.stepVertex(1);
    else if (key === "[") d.actions.stepVertex(-1);
    else {
      const tool = toolByKey(key);
      if (tool && !(d.readOnly && tool.name !== "select" && tool.name !== "pan")) d.setTool(tool.name);
      else handled = false;
    }
    if (handled) e.preventDefault();
  };

  const onKeyUp = (e: KeyboardEvent<HTMLElement>) => {
    if (e.key === " ") space.current = false;
  };

  const drawing = keyPoint !== null && isDrawingTool(input.tool);
  const cursor: Hover | null = drawing ? { world: keyPoint, snapped: keyPoint, snap: "grid", overVertex: false } : null;
  return { onKeyDown, onKeyUp, spaceHeld: () => space.current, helpOpen, setHelpOpen, cursor };
}

/** Shortcut list shown in the editor's help panel, grouped as a user looks for them. */
export const SHORTCUTS: readonly { group: string; keys: readonly [string, string][] }[] = [
  {
    group: "Choosing",
    keys: [
      ["Tab / Shift+Tab", "next / previous region, then the phreatic line (the drawing must have the focus)"],
      ["Arrows", "with a whole region or line chosen: pick its vertex furthest that way"],
      ["[ ]", "previous / next vertex of the chosen region or line"],
      ["Esc", "step back: vertex → region → nothing; also closes this list"],
    ],
  },
  {
    group: "Editing",
    keys: [
      ["Arrows", "move the chosen vertex one grid step (Shift: ten steps)"],
      ["Enter", "type the chosen vertex's coordinates; Enter applies, Esc returns to the drawing"],
      ["I", "add a vertex halfway along the edge after the chosen one"],
      ["Delete", "delete the chosen vertex, or the whole region or line"],
      ["Ctrl+Z / Ctrl+Shift+Z", "undo / redo (Ctrl+Y also redoes)"],
    ],
  },
  {
    group: "Drawing and view",
    keys: [
      ["S R W L H", "tools: select, draw region, draw phreatic line, reservoir level, pan"],
      ["Arrows", "with a drawing tool: move the keyboard cursor one grid step (Shift: ten)"],
      ["A", "put a point at the cursor (on the first corner it closes the outline); sets the reservoir level"],
      ["Backspace", "while drawing: take back the last point"],
      ["Enter / Esc", "while drawing: finish / drop the outline"],
      ["+ − F", "zoom in, zoom out, fit the section"],
      ["?", "show or hide this list"],
    ],
  },
];
