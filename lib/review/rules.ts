/**
 * Who may do what to a run, as pure functions of the person, their role in the project and the
 * run. The server refuses by these rules and the UI hides by the same ones.
 * Refusals come back as data: 403 when the person may not, 409 when the run's state forbids it,
 * 422 when something the action needs is missing.
 */
import { can, type Role } from "@/lib/permissions";
import { TRANSITIONS, TRANSITION_ACTIONS, type RunStatus, type TransitionAction } from "./status";
import { openChecklistItems, type ChecklistEntry } from "./checklist";
import { MIN_BELOW_REQUIRED_REASON } from "./below-required";

export interface Actor {
  userId: number;
  /** The role that counts in the run's project (lib/permissions effectiveProjectRole). */
  role: Role | null;
}

export interface RunFacts {
  status: RunStatus;
  authorId: number;
}

export type Refusal = { ok: false; status: 403 | 409 | 422; code: string; message: string; field?: string };
export type Verdict = { ok: true } | Refusal;

const OK: Verdict = { ok: true };
const refuse = (status: Refusal["status"], code: string, message: string, field?: string): Refusal => ({
  ok: false,
  status,
  code,
  message,
  field,
});

/** Why a run in this status cannot move or change; null for a draft. */
function frozenReason(status: RunStatus): string | null {
  switch (status) {
    case "approved":
      return "This run is signed off: it and its frozen inputs can no longer be changed or deleted. Revise it as a new run instead.";
    case "returned":
      return "This run was returned and is kept as history. Revise it as a new run and submit that one.";
    case "submitted":
      return "This run is awaiting review and cannot be changed until the reviewer has decided.";
    default:
      return null;
  }
}

const WRONG_STATE: Record<TransitionAction, Partial<Record<RunStatus, string>>> = {
  submit: { submitted: "This run is already awaiting review." },
  approve: { draft: "This run has not been submitted for review yet." },
  return: { draft: "This run has not been submitted for review yet." },
};

/** Whether the person may move the run by `action`, leaving aside the note and the checklist. */
export function checkTransition(action: TransitionAction, actor: Actor, run: RunFacts): Verdict {
  const t = TRANSITIONS[action];
  if (action === "submit") {
    if (!can(actor.role, "run.submit"))
      return refuse(403, "forbidden", "Only engineers and designers submit runs for review.");
    if (actor.userId !== run.authorId) return refuse(403, "not_author", "Only the run's author submits it for review.");
  } else {
    if (!can(actor.role, "run.review")) return refuse(403, "forbidden", "Only reviewers approve or return runs.");
    if (actor.userId === run.authorId)
      return refuse(403, "self_review", "Nobody reviews their own run: ask another reviewer.");
  }
  if (run.status !== t.from) {
    return refuse(
      409,
      "wrong_status",
      WRONG_STATE[action][run.status] ?? frozenReason(run.status) ?? "This run cannot make that move.",
    );
  }
  return OK;
}

/**
 * The full check for a decision, including what the decision itself must carry: a note to return
 * a run; every checklist item confirmed to sign one off; and, when its FS is below the required
 * value, the reviewer's reason for signing it off all the same.
 */
export function checkDecision(
  action: TransitionAction,
  actor: Actor,
  run: RunFacts,
  input: {
    note: string;
    checklist: readonly ChecklistEntry[];
    belowRequired?: { requiredFs: number; reason: string } | null;
  },
): Verdict {
  const base = checkTransition(action, actor, run);
  if (!base.ok) return base;
  if (action === "return" && input.note.trim().length < 3) {
    return refuse(422, "note_required", "Say what the author must change: a returned run needs a note.", "note");
  }
  if (action === "approve") {
    const open = openChecklistItems(input.checklist);
    if (open.length > 0) {
      return refuse(
        409,
        "checklist_open",
        `Confirm every checklist item before signing off. Still open or of concern: ${open.map((i) => i.label.toLowerCase()).join("; ")}.`,
      );
    }
    const below = input.belowRequired;
    if (below && below.reason.trim().length < MIN_BELOW_REQUIRED_REASON) {
      return refuse(
        422,
        "below_required_reason",
        `This run's FS is below the required ${below.requiredFs.toFixed(2)}. Signing it off needs your reason ` +
          "in a sentence (for example: accepted as the record of a failing case, redesign follows).",
        "belowRequiredReason",
      );
    }
  }
  return OK;
}

/** The moves the person could make now, for the buttons a page shows. */
export function availableActions(actor: Actor, run: RunFacts): TransitionAction[] {
  return TRANSITION_ACTIONS.filter((a) => checkTransition(a, actor, run).ok);
}

/** Renaming or deleting: drafts only, by their author. A frozen run refuses everyone alike. */
export function checkDraftChange(actor: Actor, run: RunFacts, change: "rename" | "delete"): Verdict {
  const frozen = frozenReason(run.status);
  if (frozen) return refuse(409, "run_frozen", frozen);
  if (!can(actor.role, "run.create") || actor.userId !== run.authorId) {
    return refuse(
      403,
      "not_author",
      change === "delete" ? "Only the run's author deletes a draft." : "Only the run's author renames a draft.",
    );
  }
  return OK;
}

/** Comments: any engineer, designer or reviewer of the project, until the run is signed off. */
export function checkComment(actor: Actor, run: RunFacts): Verdict {
  if (!can(actor.role, "run.comment"))
    return refuse(403, "forbidden", "Your role does not allow you to comment on runs.");
  if (run.status === "approved")
    return refuse(
      409,
      "run_frozen",
      "This run is signed off and takes no more comments. Comment on a revision instead.",
    );
  return OK;
}

/** The checklist belongs to the review: reviewers other than the author, while it is awaiting review. */
export function checkChecklistEdit(actor: Actor, run: RunFacts): Verdict {
  if (!can(actor.role, "run.review")) return refuse(403, "forbidden", "Only reviewers fill in the review checklist.");
  if (actor.userId === run.authorId)
    return refuse(403, "self_review", "Nobody reviews their own run: ask another reviewer.");
  if (run.status !== "submitted")
    return refuse(
      409,
      "wrong_status",
      frozenReason(run.status) ?? "The checklist opens when the run is submitted for review.",
    );
  return OK;
}
