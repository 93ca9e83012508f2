"use client";

import { useState } from "react";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import type { TransitionAction } from "@/lib/review/status";
import { useRunAction } from "./use-run-action";

export interface DecisionFormProps {
  apiBase: string;
  actions: readonly TransitionAction[];
  openItems: number;
}

/** The reviewer's decision: sign off, or return to the author with a note. */
export function DecisionForm({ apiBase, actions, openItems }: DecisionFormProps) {
  const [note, setNote] = useState("");
  const { run, busy, error } = useRunAction();
  if (!actions.includes("approve") && !actions.includes("return")) return null;

  const decide = (action: "approve" | "return") => run(`${apiBase}/status`, { method: "POST", json: { action, note } });

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
          disabled={busy || openItems > 0}
          onClick={() => decide("approve")}
        >
          Sign off
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
