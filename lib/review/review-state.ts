import "server-only";
import { fetchChecklist, fetchReviewRecord, fetchRunComments, fetchRunEvents } from "@/db/queries/review";
import type { ReviewRecord, RunComment, RunEvent } from "./types";
import { fetchRevisionChain } from "@/db/queries/runs";
import type { ChainLink, RunDetail } from "@/lib/runs/types";
import { availableActions, checkChecklistEdit, checkComment, checkDraftChange, type Actor } from "./rules";
import {
  checklistHints,
  fullChecklist,
  type ChecklistHint,
  type ChecklistItem,
  type ChecklistEntry,
} from "./checklist";
import type { TransitionAction } from "./status";

/** What the run and review pages show about a run's review, and what this person may do. */
export interface ReviewState {
  record: ReviewRecord;
  checklist: (ChecklistItem & ChecklistEntry & { hint?: ChecklistHint })[];
  comments: RunComment[];
  events: RunEvent[];
  chain: ChainLink[];
  may: { actions: TransitionAction[]; comment: boolean; checklist: boolean; rename: boolean; delete: boolean };
}

export async function loadReviewState(run: RunDetail, actor: Actor): Promise<ReviewState> {
  const [record, saved, comments, events, chain] = await Promise.all([
    fetchReviewRecord(run.id),
    fetchChecklist(run.id),
    fetchRunComments(run.id),
    fetchRunEvents(run.id),
    fetchRevisionChain(run.projectId, run.id),
  ]);
  const facts = { status: run.status, authorId: run.authorId };
  const result = run.result as { warnings?: { code: string; message: string }[] };
  const hints = checklistHints({
    warnings: result.warnings ?? [],
    fs: { bishop: run.fsBishop, fellenius: run.fsFellenius },
    requiredFs: run.requiredFs,
  });
  return {
    record: record!,
    checklist: fullChecklist(saved).map((c) => ({ ...c, hint: hints[c.key] })),
    comments,
    events,
    chain,
    may: {
      actions: availableActions(actor, facts),
      comment: checkComment(actor, facts).ok,
      checklist: checkChecklistEdit(actor, facts).ok,
      rename: checkDraftChange(actor, facts, "rename").ok,
      delete: checkDraftChange(actor, facts, "delete").ok,
    },
  };
}
