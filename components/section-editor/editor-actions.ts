/**
 * The editing commands shared by the canvas, the keyboard and the side panels. Built
 * afresh on each render from the current state, so no handler sees a stale document.
 */
import type { Point, SectionDocument } from "@/lib/stability";
import {
  addRegion,
  deletePoint,
  deleteRegion,
  insertPoint,
  moveSharedVertex,
  setPhreatic,
  setRegionMaterial,
} from "@/lib/editor/document-edits";
import { appendDraftPoint, closesDraft, draftProblem, type Draft } from "@/lib/editor/drafts";
import { groundSurface } from "@/lib/editor/ground-surface";
import { parseIssuePath } from "@/lib/editor/issue-paths";
import { ownerOf, ownerPoints, selectedVertex, type Owner, type Selection, type VertexRef } from "@/lib/editor/refs";
import { setReservoirLevel, sideOf, type Side } from "@/lib/editor/reservoir-level";
import { nudgeStep } from "@/lib/editor/snapping";
import type { EditorIssue } from "./types";

export interface EditorContext {
  doc: SectionDocument;
  readOnly: boolean;
  selection: Selection | null;
  setSelection(sel: Selection | null): void;
  draft: Draft | null;
  setDraft(d: Draft | null): void;
  newRegionMaterial: string;
  gridStep: number;
  commit(doc: SectionDocument): void;
  say(message: string | null): void;
  showPoint(p: Point): void;
}

/** Where a new row goes after row i: halfway to the next point, or one step on past the end of a line. */
export function pointAfter(points: readonly Point[], i: number, closed: boolean): Point {
  const a = points[i];
  const next = points[i + 1] ?? (closed ? points[0] : undefined);
  if (next) return [(a[0] + next[0]) / 2, (a[1] + next[1]) / 2];
  const prev = points[i - 1];
  return prev ? [a[0] + (a[0] - prev[0]), a[1] + (a[1] - prev[1])] : [a[0] + 1, a[1]];
}

export function createEditorActions(ctx: EditorContext) {
  const { doc } = ctx;
  const editable = () => {
    if (ctx.readOnly) ctx.say("This section is read-only.");
    return !ctx.readOnly;
  };

  const finishDraft = () => {
    const d = ctx.draft;
    if (!d) return;
    const problem = draftProblem(d);
    if (problem) return ctx.say(problem);
    if (d.kind === "region") {
      ctx.commit(addRegion(doc, ctx.newRegionMaterial, d.points));
      ctx.setSelection({ kind: "region", region: doc.regions.length, vertex: null });
      ctx.say("Region added. Pick its material in the side panel.");
    } else {
      ctx.commit(setPhreatic(doc, d.points));
      ctx.setSelection({ kind: "phreatic", vertex: null });
      ctx.say(doc.water?.phreatic ? "The new phreatic line replaces the old one." : "Phreatic line added.");
    }
    ctx.setDraft(null);
  };

  const deletePointAt = (owner: Owner, index: number) => {
    if (!editable()) return;
    const r = deletePoint(doc, owner, index);
    if (!r.ok) return ctx.say(r.reason);
    ctx.commit(r.doc);
    const left = ownerPoints(r.doc, owner)?.length ?? 0;
    ctx.setSelection({ ...ownerSelection(owner), vertex: Math.min(index, left - 1) });
  };

  const insertPointAfter = (owner: Owner, index: number, p?: Point) => {
    if (!editable()) return;
    const pts = ownerPoints(doc, owner);
    if (!pts) return;
    ctx.commit(insertPoint(doc, owner, index, p ?? pointAfter(pts, index, owner.kind === "region")));
    ctx.setSelection({ ...ownerSelection(owner), vertex: index + 1 });
  };

  const moveTo = (ref: VertexRef, p: Point) => {
    if (!editable()) return;
    ctx.commit(moveSharedVertex(doc, ref, p));
  };

  const applyReservoir = (side: Side, y: number) => {
    if (!editable()) return;
    const r = setReservoirLevel(doc, side, y);
    if (!r.ok) return ctx.say(r.reason);
    ctx.commit(r.doc);
    ctx.setSelection({ kind: "phreatic", vertex: null });
    ctx.say(`Reservoir set at ${y.toFixed(2)} m on the ${side}.`);
  };

  return {
    finishDraft,
    deletePointAt,
    insertPointAfter,
    moveTo,
    cancelDraft: () => ctx.setDraft(null),

    /** Delete key: the selected vertex, else the selected region or line. */
    deleteSelection() {
      const sel = ctx.selection;
      if (!sel || !editable()) return;
      if (sel.vertex !== null) return deletePointAt(ownerOf(sel), sel.vertex);
      if (sel.kind === "region") {
        ctx.commit(deleteRegion(doc, sel.region));
        ctx.say(`Region ${sel.region + 1} deleted. Undo brings it back.`);
      } else {
        ctx.commit(setPhreatic(doc, null));
        ctx.say("Phreatic line removed.");
      }
      ctx.setSelection(null);
    },

    /** Arrow keys: move the selected vertex by whole snap steps. */
    nudge(dx: number, dy: number) {
      const ref = selectedVertex(ctx.selection);
      const p = ref && ownerPoints(doc, ownerOf(ref))?.[ref.index];
      if (!ref || !p || !editable()) return;
      const step = nudgeStep(ctx.gridStep);
      const tidy = (v: number) => Math.round(v * 1e9) / 1e9;
      moveTo(ref, [tidy(p[0] + dx * step), tidy(p[1] + dy * step)]);
    },

    insertAfterSelection() {
      const ref = selectedVertex(ctx.selection);
      if (!ref) return ctx.say("Select a vertex first: the new one goes on the edge after it.");
      insertPointAfter(ownerOf(ref), ref.index);
    },

    /** Steps the vertex selection forward or back ([ and ] keys). */
    stepVertex(delta: number) {
      const sel = ctx.selection;
      const pts = sel && ownerPoints(doc, ownerOf(sel));
      if (!sel || !pts || pts.length === 0) return;
      const i = sel.vertex === null ? (delta > 0 ? 0 : pts.length - 1) : (sel.vertex + delta + pts.length) % pts.length;
      ctx.setSelection({ ...sel, vertex: i });
    },

    setMaterial(region: number, key: string) {
      if (editable()) ctx.commit(setRegionMaterial(doc, region, key));
    },

    applyReservoir,

    /**
     * The keyboard's click: with a drawing tool, adds the point to the outline or line being drawn
     * (on the first corner it closes the outline); with the reservoir tool, sets the pool there.
     */
    placeAt(tool: "region" | "phreatic" | "reservoir", p: Point) {
      if (!editable()) return;
      if (tool === "reservoir") return applyReservoir(sideOf(groundSurface(doc.regions), p[0]), p[1]);
      const draft = ctx.draft?.kind === tool ? ctx.draft : { kind: tool, points: [] };
      if (closesDraft(draft, p)) return finishDraft();
      const step = appendDraftPoint(draft, p);
      if (!step.ok) return ctx.say(step.reason);
      ctx.setDraft(step.draft);
      ctx.say(
        `${tool === "region" ? "Corner" : "Point"} ${step.draft.points.length} at x ${p[0].toFixed(2)} m, elevation ${p[1].toFixed(2)} m.`,
      );
    },

    /** Selects what an issue's path names and brings its location into view. */
    focusIssue(issue: EditorIssue) {
      const t = parseIssuePath(issue.path);
      if (t.kind === "region" && doc.regions[t.region]) {
        const n = doc.regions[t.region].points.length;
        ctx.setSelection({
          kind: "region",
          region: t.region,
          vertex: t.vertex !== null && t.vertex < n ? t.vertex : null,
        });
      } else if (t.kind === "phreatic" && doc.water?.phreatic) {
        const n = doc.water.phreatic.length;
        ctx.setSelection({ kind: "phreatic", vertex: t.vertex !== null && t.vertex < n ? t.vertex : null });
      }
      if (issue.at) ctx.showPoint(issue.at);
    },
  };
}

export type EditorActions = ReturnType<typeof createEditorActions>;

function ownerSelection(owner: Owner): Selection {
  return owner.kind === "region"
    ? { kind: "region", region: owner.region, vertex: null }
    : { kind: "phreatic", vertex: null };
}
