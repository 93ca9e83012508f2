import { STATUS_WORDS } from "@/lib/vocabulary";

/**
 * The review life of a run. A run is saved as a draft; its author submits it; a reviewer who is
 * not its author approves it (signed off) or returns it with a note. A returned run stays as it
 * was, as history: the author revises it as a new run (linked by revises_run_id) and submits that.
 */
export const RUN_STATUSES = ["draft", "submitted", "returned", "approved"] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

export const TRANSITION_ACTIONS = ["submit", "approve", "return"] as const;
export type TransitionAction = (typeof TRANSITION_ACTIONS)[number];

export interface Transition {
  from: RunStatus;
  to: RunStatus;
}

export const TRANSITIONS: Record<TransitionAction, Transition> = {
  submit: { from: "draft", to: "submitted" },
  approve: { from: "submitted", to: "approved" },
  return: { from: "submitted", to: "returned" },
};

/** The badge and filter label of a run signed off although its FS is below the required value. */
export const BELOW_REQUIRED_LABEL = "Signed off — below the required FS";

// The words live with every other code-to-words mapping, in lib/vocabulary.ts.
export { STATUS_LABELS, STATUS_WORDS } from "@/lib/vocabulary";

export function isRunStatus(value: string): value is RunStatus {
  return (RUN_STATUSES as readonly string[]).includes(value);
}

/** A run's status in words, telling a sign-off below the required FS apart from a plain one. */
export function statusWords(status: RunStatus, signedOffBelowRequired: boolean): string {
  if (status === "approved" && signedOffBelowRequired) return "signed off — below the required FS";
  return STATUS_WORDS[status];
}
