"use client";

import useSWR from "swr";
import { useState } from "react";
import type { ConditionSetting } from "@/lib/analysis/types";
import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

export interface RequiredFsTableProps {
  projectId: number;
  initial: ConditionSetting[];
  canEdit: boolean;
}

/** Required minimum FS per loading condition: the default, its basis, and the project's own value. */
export function RequiredFsTable({ projectId, initial, canEdit }: RequiredFsTableProps) {
  const url = `/api/projects/${projectId}/loading-conditions`;
  const { data, mutate } = useSWR<{ conditions: ConditionSetting[] }>(url, { fallbackData: { conditions: initial } });
  const [editing, setEditing] = useState<string | null>(null);
  // One condition is edited at a time, so the open form's key is `editing`.
  const {
    onSubmit: save,
    fields,
    notice,
  } = useApiForm(async (form) => {
    const r = await fetchJson<{ conditions: ConditionSetting[] }>(`${url}/${editing}`, {
      method: "PUT",
      json: { requiredFs: Number(form.get("requiredFs")), reason: String(form.get("reason") ?? "") },
    });
    await mutate(r, { revalidate: false });
    setEditing(null);
  });

  return (
    <table className="w-full rounded-lg border border-rule bg-paper-raised text-sm" data-testid="required-fs-table">
      <thead className="bg-paper-sunk text-left text-xs uppercase tracking-wide text-ink-soft">
        <tr>
          <th className="px-3 py-2">Loading condition</th>
          <th className="px-3 py-2">Face</th>
          <th className="px-3 py-2 text-right">Default</th>
          <th className="px-3 py-2 text-right">This project</th>
          <th className="px-3 py-2">Basis and reason</th>
          <th />
        </tr>
      </thead>
      <tbody>
        {(data?.conditions ?? []).map((c) => (
          <tr key={c.key} className="border-t border-rule align-top">
            <td className="px-3 py-2">{c.label}</td>
            <td className="px-3 py-2 capitalize">{c.faces}</td>
            <td className="px-3 py-2 text-right tabular-nums">{c.defaultFs.toFixed(2)}</td>
            <td className="px-3 py-2 text-right font-semibold tabular-nums" data-testid={`required-${c.key}`}>
              {c.requiredFs.toFixed(2)}
            </td>
            <td className="px-3 py-2 text-xs text-ink-soft">
              <div>{c.basis}</div>
              {c.reason ? (
                <div className="mt-1 text-ink">
                  Changed by {c.updatedByName}: {c.reason}
                </div>
              ) : null}
              {editing === c.key ? (
                <form onSubmit={save} className="mt-2 space-y-2" noValidate>
                  <div className="flex gap-2">
                    <input
                      name="requiredFs"
                      type="number"
                      step="0.05"
                      defaultValue={c.requiredFs}
                      className="field w-24"
                      aria-label="Required FS"
                    />
                    <input
                      name="reason"
                      className="field"
                      placeholder="Why this project uses another value"
                      aria-label="Reason"
                    />
                  </div>
                  <FieldError messages={[...(fields.requiredFs ?? []), ...(fields.reason ?? [])]} />
                  {notice ? <FormBanner kind={notice.kind}>{notice.text}</FormBanner> : null}
                  <div className="flex gap-2">
                    <button className="btn-primary" type="submit">
                      Save
                    </button>
                    <button className="btn-quiet" type="button" onClick={() => setEditing(null)}>
                      Cancel
                    </button>
                  </div>
                </form>
              ) : null}
            </td>
            <td className="px-3 py-2 text-right">
              {canEdit && editing !== c.key ? (
                <button
                  type="button"
                  className="text-xs text-clay-600 hover:underline"
                  onClick={() => setEditing(c.key)}
                >
                  Change
                </button>
              ) : null}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
