/**
 * Undo and redo as a reducer over whole documents. Documents are never mutated (see
 * document-edits.ts), so keeping references is cheap and exact.
 */

export interface History<T> {
  past: T[];
  present: T;
  future: T[];
}

export type HistoryAction<T> =
  | { type: "commit"; next: T }
  | { type: "undo" }
  | { type: "redo" }
  /** The owner replaced the document from outside: adopt it without an undo step. */
  | { type: "sync"; present: T }
  | { type: "reset"; present: T };

/** How many steps back the editor remembers. */
export const HISTORY_LIMIT = 200;

export function createHistory<T>(present: T): History<T> {
  return { past: [], present, future: [] };
}

export function canUndo<T>(h: History<T>): boolean {
  return h.past.length > 0;
}

export function canRedo<T>(h: History<T>): boolean {
  return h.future.length > 0;
}

export function historyReducer<T>(h: History<T>, action: HistoryAction<T>, limit = HISTORY_LIMIT): History<T> {
  switch (action.type) {
    case "commit": {
      if (action.next === h.present) return h;
      const past = [...h.past, h.present];
      return { past: past.length > limit ? past.slice(past.length - limit) : past, present: action.next, future: [] };
    }
    case "undo": {
      if (h.past.length === 0) return h;
      return { past: h.past.slice(0, -1), present: h.past[h.past.length - 1], future: [h.present, ...h.future] };
    }
    case "redo": {
      if (h.future.length === 0) return h;
      return { past: [...h.past, h.present], present: h.future[0], future: h.future.slice(1) };
    }
    case "sync":
      return action.present === h.present ? h : { ...h, present: action.present };
    case "reset":
      return createHistory(action.present);
  }
}
