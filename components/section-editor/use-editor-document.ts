"use client";
/* eslint-disable react-hooks/refs -- the history lives in a ref on purpose: it is adopted from the prop during
   render (an idempotent sync) so an edit the parent has not passed back yet is never drawn over. */

import { useCallback, useRef, useState } from "react";
import { canRedo, canUndo, createHistory, historyReducer, type History } from "@/lib/editor/history";
import type { SectionDocument } from "@/lib/stability";

export interface EditorDocument {
  /** The latest document, including an edit the parent has not passed back yet. */
  current(): SectionDocument;
  commit(next: SectionDocument): void;
  undo(): void;
  redo(): void;
  canUndo: boolean;
  canRedo: boolean;
}

/**
 * The editor's own undo history over the parent's document. The parent stays the owner:
 * every edit, undo and redo goes out through onChange, and a document that arrives from
 * outside (a reload, a revert) is adopted as the present without an undo step.
 */
export function useEditorDocument(document: SectionDocument, onChange: (doc: SectionDocument) => void): EditorDocument {
  const historyRef = useRef<History<SectionDocument> | null>(null);
  // The prop as it was when the editor last sent a document out: while the parent still
  // passes that same prop it has not caught up yet, and the sent document stays shown.
  const waitingOnRef = useRef<SectionDocument | null>(null);
  const propRef = useRef(document);
  const onChangeRef = useRef(onChange);
  const [, setVersion] = useState(0);

  propRef.current = document;
  onChangeRef.current = onChange;
  if (historyRef.current === null) historyRef.current = createHistory(document);
  if (waitingOnRef.current !== document) {
    waitingOnRef.current = null;
    // Idempotent, so doing it during render is safe.
    historyRef.current = historyReducer(historyRef.current, { type: "sync", present: document });
  }

  const apply = useCallback((h: History<SectionDocument>) => {
    if (h === historyRef.current) return;
    historyRef.current = h;
    waitingOnRef.current = propRef.current;
    setVersion((v) => v + 1);
    onChangeRef.current(h.present);
  }, []);

  const commit = useCallback(
    (next: SectionDocument) => apply(historyReducer(historyRef.current!, { type: "commit", next })),
    [apply],
  );
  const undo = useCallback(() => apply(historyReducer(historyRef.current!, { type: "undo" })), [apply]);
  const redo = useCallback(() => apply(historyReducer(historyRef.current!, { type: "redo" })), [apply]);
  const current = useCallback(() => historyRef.current!.present, []);

  return { current, commit, undo, redo, canUndo: canUndo(historyRef.current), canRedo: canRedo(historyRef.current) };
}
