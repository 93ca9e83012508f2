"use client";

import { useRef, type KeyboardEvent } from "react";
import type { Draft } from "@/lib/editor/drafts";
import { dropLastDraftPoint } from "@/lib/editor/drafts";
import type { Selection } from "@/lib/editor/refs";
import type { EditorActions } from "./editor-actions";
import { toolByKey } from "./tools";
import type { ToolName } from "./types";
import { ZOOM_STEP } from "./use-view";

interface KeyDeps {
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
}

/** Keys typed into a field belong to the field, not to the drawing. */
function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ["INPUT", "SELECT", "TEXTAREA"].includes(target.tagName);
}

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
export function useEditorKeys(deps: KeyDeps) {
  const space = useRef(false);

  const onKeyDown = (e: KeyboardEvent<HTMLElement>) => {
    if (isTyping(e.target)) return;
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
    else if (key === " ") space.current = true;
    else if (key === "Escape") {
      if (d.draft) d.setDraft(null);
      else if (d.selection?.kind && d.selection.vertex !== null) d.setSelection({ ...d.selection, vertex: null });
      else if (d.selection) d.setSelection(null);
      else d.setTool("select");
    } else if (key === "Enter") d.actions.finishDraft();
    else if (key === "Delete" || key === "Backspace") {
      if (d.draft) d.setDraft(d.draft.points.length > 1 ? dropLastDraftPoint(d.draft) : null);
      else d.actions.deleteSelection();
    } else if (key in ARROWS && d.selection?.vertex != null) {
      const [dx, dy] = ARROWS[key];
      const times = e.shiftKey ? 10 : 1;
      d.actions.nudge(dx * times, dy * times);
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

  return { onKeyDown, onKeyUp, spaceHeld: () => space.current };
}

/** Shortcut list shown in the editor's help. */
export const SHORTCUTS: readonly [string, string][] = [
  ["S R W L H", "tools: select, region, water line, reservoir level, pan"],
  ["Enter / Esc", "finish / drop a drawing; Esc also clears the selection"],
  ["Delete", "delete the selected vertex (or region, or line)"],
  ["Arrows", "move the selected vertex one snap step (Shift: ten)"],
  ["[ ]", "previous / next vertex"],
  ["I", "add a vertex after the selected one"],
  ["+ − F", "zoom in, zoom out, fit"],
  ["Ctrl+Z / Ctrl+Shift+Z", "undo / redo (Ctrl+Y also redoes)"],
];
