"use client";

import { useState } from "react";
import type { ReviewState } from "@/lib/review/review-state";
import type { CheckState } from "@/lib/review/checklist";
import { FormBanner } from "@/components/ui/form-message";
import { useRunAction } from "./use-run-action";

const STATES: { value: CheckState; label: string }[] = [
  { value: "ok", label: "Confirmed" },
  { value: "concern", label: "Concern" },
  { value: "open", label: "Open" },
];

export interface ChecklistPanelProps {
  apiBase: string;
  items: ReviewState["checklist"];
  editable: boolean;
}

/** The reviewer's checklist for this load case; every item must be confirmed before sign-off. */
export function ChecklistPanel({ apiBase, items, editable }: ChecklistPanelProps) {
  const [draft, setDraft] = useState(() =>
    Object.fromEntries(items.map((i) => [i.key, { state: i.state, note: i.note }])),
  );
  const { run, busy, error } = useRunAction();
  const [saved, setSaved] = useState(false);
  const changed = items.filter((i) => draft[i.key].state !== i.state || draft[i.key].note !== i.note);

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setSaved(false);
    const ok = await run(`${apiBase}/checklist`, {
      method: "PUT",
      json: { items: changed.map((i) => ({ key: i.key, ...draft[i.key] })) },
    });
    setSaved(ok);
  }

  return (
    <form onSubmit={save} className="panel space-y-3 p-4" data-testid="checklist" noValidate>
      <h2 className="font-semibold">Reviewer&apos;s checklist</h2>
      <ul className="space-y-3">
        {items.map((item) => (
          <li
            key={item.key}
            className="border-t border-rule pt-2 first:border-t-0 first:pt-0"
            data-testid={`check-${item.key}`}
            data-state={item.state}
          >
            <fieldset disabled={!editable}>
              <legend className="text-sm font-medium">{item.label}</legend>
              <p className="text-xs text-ink-soft">{item.prompt}</p>
              {item.hint ? (
                <p className={`mt-1 text-xs ${item.hint.tone === "good" ? "text-moss-700" : "text-alarm-700"}`}>
                  From the run: {item.hint.text}
                </p>
              ) : null}
              <div className="mt-1 flex flex-wrap gap-3 text-sm">
                {STATES.map((s) => (
                  <label key={s.value} className="inline-flex items-center gap-1">
                    <input
                      type="radio"
                      name={`check-${item.key}`}
                      value={s.value}
                      checked={draft[item.key].state === s.value}
                      onChange={() => setDraft({ ...draft, [item.key]: { ...draft[item.key], state: s.value } })}
                    />
                    {s.label}
                  </label>
                ))}
              </div>
              <input
                className="field mt-1 text-sm"
                aria-label={`Note on “${item.label}”`}
                placeholder={editable ? "Note (drawing number, lab set, level…)" : ""}
                value={draft[item.key].note}
                maxLength={1000}
                onChange={(e) => setDraft({ ...draft, [item.key]: { ...draft[item.key], note: e.target.value } })}
              />
              {item.updatedByName ? (
                <p className="mt-0.5 text-xs text-ink-faint">Last set by {item.updatedByName}</p>
              ) : null}
            </fieldset>
          </li>
        ))}
      </ul>
      {error ? <FormBanner kind="error">{error.message}</FormBanner> : null}
      {saved && changed.length === 0 ? <FormBanner kind="ok">Checklist saved.</FormBanner> : null}
      {editable ? (
        <button type="submit" className="btn-quiet" disabled={busy || changed.length === 0}>
          {busy ? "Saving…" : "Save checklist"}
        </button>
      ) : null}
    </form>
  );
}
