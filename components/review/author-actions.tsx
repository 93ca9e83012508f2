"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useRunAction } from "./use-run-action";

export interface AuthorActionsProps {
  apiBase: string;
  projectId: number;
  title: string;
  may: { submit: boolean; rename: boolean; delete: boolean };
}

/** What the author does with a draft: submit it for review, rename it, or delete it. */
export function AuthorActions({ apiBase, projectId, title, may }: AuthorActionsProps) {
  const router = useRouter();
  const [note, setNote] = useState("");
  const [name, setName] = useState(title);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const { run, busy, error } = useRunAction();
  if (!may.submit && !may.rename && !may.delete) return null;

  async function remove() {
    if (await run(apiBase, { method: "DELETE" })) router.push(`/projects/${projectId}/runs`);
  }

  return (
    <section className="panel space-y-3 p-4" data-testid="author-actions" aria-labelledby="author-heading">
      <h2 id="author-heading" className="font-semibold">
        This draft
      </h2>
      {may.submit ? (
        <div className="space-y-2">
          <label className="label" htmlFor="submit-note">
            Note for the reviewer (optional)
          </label>
          <textarea
            id="submit-note"
            className="field min-h-16"
            value={note}
            onChange={(e) => setNote(e.target.value)}
            maxLength={4000}
          />
          <button
            type="button"
            className="btn-primary"
            disabled={busy}
            onClick={() => run(`${apiBase}/status`, { method: "POST", json: { action: "submit", note } })}
          >
            Submit for review
          </button>
        </div>
      ) : null}
      {may.rename ? (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void run(apiBase, { method: "PATCH", json: { title: name } });
          }}
        >
          <div className="min-w-64 flex-1">
            <label className="label" htmlFor="run-name">
              Name of the run
            </label>
            <input
              id="run-name"
              className="field"
              value={name}
              onChange={(e) => setName(e.target.value)}
              maxLength={200}
            />
            <FieldError messages={error?.fields.title} />
          </div>
          <button type="submit" className="btn-quiet" disabled={busy || name.trim() === title}>
            Rename
          </button>
        </form>
      ) : null}
      {may.delete ? (
        confirmDelete ? (
          <div className="flex flex-wrap items-center gap-2 text-sm">
            <span>Delete this draft for good?</span>
            <button type="button" className="btn-danger" disabled={busy} onClick={remove}>
              Delete the draft
            </button>
            <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(false)}>
              Keep it
            </button>
          </div>
        ) : (
          <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(true)}>
            Delete draft…
          </button>
        )
      ) : null}
      {error ? <FormBanner kind="error">{error.message}</FormBanner> : null}
    </section>
  );
}
