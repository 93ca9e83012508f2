"use client";

import useSWR from "swr";
import type { LibraryMaterial } from "@/lib/materials/types";
import { libraryToCsv } from "@/lib/materials/engine-material";
import { EmptyState } from "@/components/ui/empty-state";
import { MaterialsTable } from "./materials-table";
import { NewMaterialForm } from "./new-material-form";
import { MaterialsCsvImport } from "./materials-csv-import";
import { CsvDownloadLink } from "./csv-drop-zone";

export interface MaterialsLibraryProps {
  projectId: number;
  canEdit: boolean;
  initialMaterials: LibraryMaterial[];
}

/** The library page's live part: the table, and for editors the add form and the CSV import. */
export function MaterialsLibrary({ projectId, canEdit, initialMaterials }: MaterialsLibraryProps) {
  const url = `/api/projects/${projectId}/materials`;
  const { data, mutate } = useSWR<{ materials: LibraryMaterial[] }>(url, {
    fallbackData: { materials: initialMaterials },
  });
  const materials = data?.materials ?? [];

  return (
    <div className="grid gap-6 xl:grid-cols-[3fr_2fr]">
      <div className="space-y-3">
        <div className="flex flex-wrap items-center justify-end gap-2">
          {materials.length > 0 ? (
            <CsvDownloadLink text={libraryToCsv(materials)} fileName={`materials-project-${projectId}.csv`}>
              Export as CSV
            </CsvDownloadLink>
          ) : null}
        </div>
        {materials.length === 0 ? (
          <EmptyState title="No materials yet">
            {canEdit
              ? "Add each soil or rock of the section with its unit weights and strength, or import them from a CSV file. Lab results can then supply the numbers."
              : "An engineer or designer on this project builds the materials library."}
          </EmptyState>
        ) : (
          <MaterialsTable projectId={projectId} materials={materials} />
        )}
        <p className="text-xs text-ink-faint">
          A green mark under a value names the lab test set it was derived from; open the material to see the tests and
          the fit.
        </p>
      </div>
      {canEdit ? (
        <div className="space-y-6">
          <NewMaterialForm projectId={projectId} onCreated={() => mutate()} />
          <MaterialsCsvImport
            projectId={projectId}
            existingKeys={materials.map((m) => m.key)}
            onImported={() => mutate()}
          />
        </div>
      ) : null}
    </div>
  );
}
