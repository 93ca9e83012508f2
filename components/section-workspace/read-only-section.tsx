"use client";

import type { SectionDocument } from "@/lib/stability";
import { SectionEditor } from "@/components/section-editor/section-editor";
import { ExportButtons } from "@/components/section-import/export-buttons";

/** An old version: the drawing without editing, and its files for download. */
export function ReadOnlySection({
  document: doc,
  materials,
}: {
  document: SectionDocument;
  materials: { key: string; name: string; color: string }[];
}) {
  return (
    <div className="space-y-3">
      <SectionEditor document={doc} onChange={() => undefined} materials={materials} readOnly />
      <ExportButtons name="section-version" document={doc} />
    </div>
  );
}
