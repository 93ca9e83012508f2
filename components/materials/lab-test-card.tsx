"use client";

import { useState } from "react";
import type { LibraryMaterial } from "@/lib/materials/types";
import type { LabTestSet } from "@/lib/lab/types";
import { LAB_KIND_INFO } from "@/lib/materials/lab-kinds";
import { labInputToRows } from "@/lib/materials/lab-rows";
import { MODEL_PARAMETERS, PARAMETER_INFO, type ParameterKey } from "@/lib/materials/parameters";
import { suggestedValues, type SuggestedValues } from "@/lib/materials/sources";
import { formatScientific, withUnit, countOf } from "@/lib/format";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FormBanner } from "@/components/ui/form-message";
import { LabResultPlot } from "./lab-result-plot";
import { LabResultSummary } from "./lab-result-summary";
import { formatDate } from "@/lib/format";

export interface LabTestCardProps {
  projectId: number;
  material: LibraryMaterial;
  set: LabTestSet;
  canEdit: boolean;
  onChanged: () => void;
}

const describe = (s: SuggestedValues) =>
  (Object.entries(s.values) as [ParameterKey, number][])
    .map(
      ([k, v]) =>
        `${PARAMETER_INFO[k].symbol} = ${withUnit(k === "k" ? formatScientific(v, 1) : v, PARAMETER_INFO[k].unit)}`,
    )
    .join(", ");

/** One stored test set: its rows, what was derived, the plot, and buttons that copy values into the material. */
export function LabTestCard({ projectId, material, set, canEdit, onChanged }: LabTestCardProps) {
  const [banner, setBanner] = useState<{ kind: "error" | "ok"; text: string } | null>(null);
  const info = LAB_KIND_INFO[set.kind];
  const { rows } = labInputToRows(set.kind, set.data as unknown as Record<string, unknown>);
  const allowed = MODEL_PARAMETERS[material.parameters.model];

  async function use(s: SuggestedValues) {
    setBanner(null);
    const sources = Object.fromEntries(Object.keys(s.values).map((k) => [k, set.id]));
    try {
      await fetchJson(`/api/projects/${projectId}/materials/${material.id}`, {
        method: "PUT",
        json: { parameters: { ...material.parameters, ...s.values }, sources },
      });
      setBanner({ kind: "ok", text: `The material now uses ${describe(s)}, from lab test set ${set.id}.` });
      onChanged();
    } catch (err) {
      const fields = err instanceof ApiClientError ? Object.values(err.fields).flat().join(" ") : "";
      setBanner({
        kind: "error",
        text: err instanceof ApiClientError ? `${err.message} ${fields}` : "Could not reach the server.",
      });
    }
  }

  async function remove() {
    if (
      !window.confirm(`Delete lab test set ${set.id}? Values taken from it stay in the material but lose their source.`)
    )
      return;
    try {
      await fetchJson(`/api/projects/${projectId}/lab-tests/${set.id}`, { method: "DELETE" });
      onChanged();
    } catch (err) {
      setBanner({ kind: "error", text: err instanceof ApiClientError ? err.message : "Could not reach the server." });
    }
  }

  return (
    <article id={`lab-set-${set.id}`} className="panel scroll-mt-6 p-4" data-testid="lab-set">
      <header className="mb-3 flex flex-wrap items-start justify-between gap-2">
        <div>
          <p className="text-xs font-medium uppercase tracking-wide text-ink-faint">
            Lab test set {set.id} · {info.label}
          </p>
          <h3 className="font-semibold">{set.name}</h3>
          <p className="text-xs text-ink-faint">
            Entered by {set.createdByName} on {formatDate(set.createdAt)}
          </p>
        </div>
        {canEdit ? (
          <button type="button" className="text-xs text-alarm-700 hover:underline" onClick={remove}>
            Delete set
          </button>
        ) : null}
      </header>
      <div className="grid gap-4 lg:grid-cols-2">
        <div className="space-y-3">
          <LabResultSummary record={set} />
          <details className="text-xs">
            <summary className="cursor-pointer text-ink-soft">
              The {countOf(rows.length, "test")} behind these numbers
            </summary>
            <table className="mt-2 w-full">
              <thead className="text-left text-ink-faint">
                <tr>
                  <th className="pr-2">#</th>
                  {info.columns.map((c) => (
                    <th key={c.key} className="pr-2 font-normal">
                      {c.label}
                      {c.unit ? ` (${c.unit})` : ""}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {rows.map((r, i) => (
                  <tr key={i} className="border-t border-rule/60">
                    <td className="pr-2 text-ink-faint">{i + 1}</td>
                    {info.columns.map((c) => (
                      <td key={c.key} className="pr-2 tabular-nums">
                        {r[c.key]}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </details>
        </div>
        <LabResultPlot record={set} />
      </div>
      {canEdit ? (
        <div className="mt-3 flex flex-wrap gap-2">
          {suggestedValues(set).map((s) => {
            const missing = Object.keys(s.values).filter((k) => !allowed.includes(k as ParameterKey));
            return (
              <div key={s.label}>
                <button
                  type="button"
                  className="btn-quiet"
                  disabled={missing.length > 0}
                  onClick={() => use(s)}
                  title={s.note}
                >
                  Use {describe(s)}
                </button>
                {missing.length > 0 ? (
                  <p className="mt-1 text-xs text-ink-faint">
                    This material&apos;s model has no{" "}
                    {missing.map((k) => PARAMETER_INFO[k as ParameterKey].symbol).join(", ")}: change the model first.
                  </p>
                ) : null}
                {s.note ? <p className="mt-1 text-xs text-clay-700">{s.note}</p> : null}
              </div>
            );
          })}
        </div>
      ) : null}
      {banner ? (
        <div className="mt-3">
          <FormBanner kind={banner.kind}>{banner.text}</FormBanner>
        </div>
      ) : null}
    </article>
  );
}
