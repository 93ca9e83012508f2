/**
 * Shapes being drawn click by click, before they join the document: a region outline
 * or a phreatic line. Kept apart from the document so Escape can drop them cleanly.
 */
import type { Point } from "@/lib/stability";

export type DraftKind = "region" | "phreatic";

export interface Draft {
  kind: DraftKind;
  points: Point[];
}

export type DraftStep = { ok: true; draft: Draft } | { ok: false; reason: string };

/** Adds a clicked point; the phreatic line must run left to right and repeats are ignored. */
export function appendDraftPoint(draft: Draft, p: Point): DraftStep {
  const last = draft.points[draft.points.length - 1];
  if (last && last[0] === p[0] && last[1] === p[1]) return { ok: true, draft };
  if (draft.kind === "phreatic" && last && p[0] <= last[0]) {
    return { ok: false, reason: "Draw the phreatic line from left to right: click to the right of the last point." };
  }
  if (draft.kind === "region" && draft.points.length >= 1) {
    const first = draft.points[0];
    // Clicking the first point again is the natural way to close an outline.
    if (first[0] === p[0] && first[1] === p[1]) return { ok: true, draft };
  }
  return { ok: true, draft: { ...draft, points: [...draft.points, [p[0], p[1]]] } };
}

/** Whether clicking p would close a region outline (it lands on the first point). */
export function closesDraft(draft: Draft, p: Point): boolean {
  const first = draft.points[0];
  return draft.kind === "region" && draft.points.length >= 3 && first[0] === p[0] && first[1] === p[1];
}

/** Drops the last point (Backspace while drawing). */
export function dropLastDraftPoint(draft: Draft): Draft {
  return { ...draft, points: draft.points.slice(0, -1) };
}

/** Why the draft cannot be finished yet, or null when it can. */
export function draftProblem(draft: Draft): string | null {
  if (draft.kind === "region" && draft.points.length < 3) return "A region needs at least 3 points.";
  if (draft.kind === "phreatic" && draft.points.length < 2) return "A phreatic line needs at least 2 points.";
  return null;
}
