"use client";

import useSWR from "swr";
import { useRouter } from "next/navigation";
import { useState } from "react";
import type { LibraryMaterial } from "@/lib/materials/types";
import type { LabTestSet } from "@/lib/lab/types";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { EmptyState } from "@/components/ui/empty-state";
import { FormBanner } from "@/components/ui/form-message";
import { MaterialParametersForm } from "./material-parameters-form";
import { LabTestCard } from "./lab-test-card";
import { LabTestEntry } from "./lab-test-entry";

export interface MaterialWorkbenchProps {
  projectId: number;
  canEdit: boolean;
  initial: { material: LibraryMaterial; labTests: LabTestSet[] };
}

/** One material: its parameters, its lab test sets with their fits, and the entry of new results. */
export function MaterialWorkbench({ projectId, canEdit, initial }: MaterialWorkbenchProps) {
  const router = useRouter();
  const url = `/api/projects/${projectId}/materials/${initial.material.id}`;
  const { data, mutate } = useSWR<{ material: LibraryMaterial; labTests: LabTestSet[] }>(url, {
    fallbackData: initial,
  });
  const [error, setError] = useState<string | null>(null);
  const { material, labTests } = data ?? initial;

  async function remove() {
    const sets = labTests.length ? ` and its ${labTests.length} lab test set${labTests.length === 1 ? "" : "s"}` : "";
    if (!window.confirm(`Delete '${material.key}'${sets}? Sections that already use it keep their own copy.`)) return;
    try {
      await fetchJson(url, { method: "DELETE" });
      router.push(`/projects/${projectId}/materials`);
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : "Could not reach the server.");
    }
  }

  return (
    <div className="space-y-6">
      <div className="grid gap-6 xl:grid-cols-[2fr_3fr]">
        <div className="space-y-3">
          {/* Remount whenever the kept values change so the form shows what the server kept: updatedAt alone
              has whole seconds, so two changes within one second (a save, then "use these values") kept it. */}
          <MaterialParametersForm
            key={JSON.stringify(material)}
            projectId={projectId}
            material={material}
            canEdit={canEdit}
            onSaved={(m) => mutate({ material: m, labTests }, { revalidate: false })}
          />
          {canEdit ? (
            <button type="button" className="btn-danger" onClick={remove}>
              Delete this material
            </button>
          ) : null}
          {error ? <FormBanner kind="error">{error}</FormBanner> : null}
        </div>
        <section className="space-y-4" aria-labelledby="lab-sets-heading">
          <h2 id="lab-sets-heading" className="text-lg font-semibold">
            Lab test sets
          </h2>
          {labTests.length === 0 ? (
            <EmptyState title="No test results yet">
              {canEdit
                ? "Add the results of shear box, triaxial, vane, compaction or limits tests below; the app fits them and offers the values to this material."
                : "Engineers and designers add the lab results behind each parameter."}
            </EmptyState>
          ) : (
            labTests.map((set) => (
              <LabTestCard
                key={set.id}
                projectId={projectId}
                material={material}
                set={set}
                canEdit={canEdit}
                onChanged={() => mutate()}
              />
            ))
          )}
        </section>
      </div>
      {canEdit ? <LabTestEntry projectId={projectId} materialId={material.id} onSaved={() => mutate()} /> : null}
    </div>
  );
}
