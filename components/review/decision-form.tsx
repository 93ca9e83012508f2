"use client";

import { useState } from "react";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import type { TransitionAction } from "@/lib/review/status";
import { useRunAction } from "./use-run-action";
import { MIN_BELOW_REQUIRED_REASON } from "@/lib/review/below-required";

export interface DecisionFormProps {
  apiBase: string;
  actions: readonly TransitionAction[];
  openItems: number;
  /** Set when the run's FS is below the required value: sign-off then needs a stated reason. */
  belowRequired?: { requiredFs: number; lowestFs: number | null } | null;
}

/** The reviewer's decision: sign off, or return to the author with a note. */
export function DecisionForm({ apiBase, actions, openItems, belowRequired = null }: DecisionFormProps) {
  const [note, setNote] = useState("");
  const [reason, setReason] = useState("");
  const { run, busy, error } = useRunAction();
  if (!actions.includes("approve") && !actions.includes("return")) return null;

  const decide = (action: "approve" | "return") =>
    run(`${apiBase}/status`, {
      method: "POST",
      json: { action, note, ...(action === "approve" && belowRequired ? { belowRequiredReason: reason } : {}) },
    });
  const reasonMissing = belowRequired !== null && reason.trim().length < MIN_BELOW_REQUIRED_REASON;

  return (
    <section className="panel space-y-2 p-4" data-testid="decision-form" aria-labelledby="decision-heading">
      <h2 id="decision-heading" className="font-semibold">
        Decision
      </h2>
      <label className="label" htmlFor="decision-note">
        Note to the author
      </label>
      <textarea
        id="decision-note"
        className="field min-h-20"
        value={note}
        onChange={(e) => setNote(e.target.value)}
        maxLength={4000}
      />
      <FieldError messages={error?.fields.note} />
      {belowRequired ? (
        <div
          className="space-y-1 rounded-md border border-dashed border-alarm-600 bg-alarm-50 p-3"
          data-testid="below-required"
        >
          <p className="text-sm font-medium text-alarm-700">
            <span aria-hidden="true">▲ </span>
            {belowRequired.lowestFs === null
              ? "No method of this run gave a factor of safety"
              : `The lowest FS of this run, ${belowRequired.lowestFs.toFixed(3)}, ` +
                `is below the required ${belowRequired.requiredFs.toFixed(2)}`}
            .
          </p>
          <p className="text-xs text-ink-soft">
            It can be signed off only on purpose, with your reason. Its status, the runs list and the report will read
            “signed off — below the required FS” with the reason.
          </p>
          <label className="label" htmlFor="below-required-reason">
            Why sign it off below the required FS?
          </label>
          <textarea
            id="below-required-reason"
            className="field min-h-16"
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            maxLength={2000}
            placeholder="e.g. Accepted as the record of a failing case; redesign follows in revision B."
          />
          <FieldError messages={error?.fields.belowRequiredReason} />
        </div>
      ) : null}
      {openItems > 0 ? (
        <p className="text-xs text-ink-soft">
          Sign-off needs every checklist item confirmed and saved ({openItems} still open or of concern).
        </p>
      ) : null}
      {error ? <FormBanner kind="error">{error.message}</FormBanner> : null}
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className="btn-primary"
          disabled={busy || openItems > 0 || reasonMissing}
          onClick={() => decide("approve")}
        >
          {belowRequired ? "Sign off below the required FS" : "Sign off"}
        </button>
        <button
          type="button"
          className="btn-danger"
          disabled={busy || note.trim().length < 3}
          onClick={() => decide("return")}
        >
          Return with comments
        </button>
      </div>
    </section>
  );
}
