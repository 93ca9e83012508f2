"use client";

import { useState } from "react";
import type { ReliabilityTarget } from "@/lib/probabilistic/types";
import { PERFORMANCE_LEVELS, pfOfBeta } from "@/lib/probabilistic/targets";
import { formatScientific } from "@/lib/format";
import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

/** The project's target reliability index, beside the table of expected performance it is read against. */
export function ReliabilityTargetForm({
  projectId,
  initial,
  canEdit,
}: {
  projectId: number;
  initial: ReliabilityTarget;
  canEdit: boolean;
}) {
  const [target, setTarget] = useState(initial);
  const [editing, setEditing] = useState(false);
  const { onSubmit, fields, notice } = useApiForm(async (form) => {
    const r = await fetchJson<{ target: ReliabilityTarget }>(`/api/projects/${projectId}/reliability-target`, {
      method: "PUT",
      json: { beta: Number(form.get("beta")), reason: String(form.get("reason") ?? "") },
    });
    setTarget(r.target);
    setEditing(false);
  });
  return (
    <section className="mt-8 max-w-3xl space-y-3" data-testid="reliability-target" aria-labelledby="target-title">
      <h2 id="target-title" className="text-base font-semibold">
        Target reliability index
      </h2>
      <p className="text-sm">
        Probabilistic runs are judged against β = <strong data-testid="target-beta">{target.beta.toFixed(2)}</strong>{" "}
        (pf = Φ(−β) = {(pfOfBeta(target.beta) * 100).toFixed(3)} %).{" "}
        {target.reason
          ? `Changed by ${target.updatedByName}: ${target.reason}`
          : `Default ${target.defaultBeta.toFixed(2)}.`}
      </p>
      <table className="text-sm" data-testid="performance-levels">
        <thead className="text-left text-xs text-ink-soft">
          <tr>
            <th className="pr-4">β at least</th>
            <th className="pr-4">pf = Φ(−β)</th>
            <th>expected performance</th>
          </tr>
        </thead>
        <tbody>
          {PERFORMANCE_LEVELS.map((l) => (
            <tr key={l.beta}>
              <td className="pr-4 tabular-nums">{l.beta.toFixed(1)}</td>
              <td className="pr-4 tabular-nums">{formatScientific(pfOfBeta(l.beta), 1)}</td>
              <td>{l.level}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-ink-soft">{target.basis}</p>
      {canEdit && !editing ? (
        <button type="button" className="btn-quiet" onClick={() => setEditing(true)}>
          Change the target
        </button>
      ) : null}
      {editing ? (
        <form onSubmit={onSubmit} className="space-y-2" noValidate>
          <div className="flex gap-2">
            <input
              name="beta"
              type="number"
              step="0.1"
              defaultValue={target.beta}
              className="field w-24"
              aria-label="Target β"
            />
            <input
              name="reason"
              className="field flex-1"
              placeholder="Why this project uses another value"
              aria-label="Reason"
            />
          </div>
          <FieldError messages={[...(fields.beta ?? []), ...(fields.reason ?? [])]} />
          {notice ? <FormBanner kind={notice.kind}>{notice.text}</FormBanner> : null}
          <div className="flex gap-2">
            <button className="btn-primary" type="submit">
              Save
            </button>
            <button className="btn-quiet" type="button" onClick={() => setEditing(false)}>
              Cancel
            </button>
          </div>
        </form>
      ) : null}
    </section>
  );
}
