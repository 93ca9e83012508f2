"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { SectionDetail } from "@/lib/sections/types";
import type { SectionDocument } from "@/lib/stability";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FormBanner } from "@/components/ui/form-message";
import { SectionEditor } from "@/components/section-editor/section-editor";
import { ImportPanel } from "@/components/section-import/import-panel";
import { ExportButtons } from "@/components/section-import/export-buttons";
import { VersionList } from "./version-list";
import { useValidation } from "./use-validation";
import { countOf } from "@/lib/format";

export interface SectionWorkspaceProps {
  projectId: number;
  section: SectionDetail;
  document: SectionDocument;
  materials: { key: string; name: string; color: string }[];
  canEdit: boolean;
  /** The set-up of the section's last run, searched by the editor's live check; null: automatic. */
  lastRunSetup?: RunSetup | null;
}

/** The section's drawing, its import and export, saving a version, and its history. */
export function SectionWorkspace({
  projectId,
  section,
  document: saved,
  materials,
  canEdit,
  lastRunSetup = null,
}: SectionWorkspaceProps) {
  const router = useRouter();
  const [doc, setDoc] = useState<SectionDocument>(saved);
  const [summary, setSummary] = useState("");
  const [banner, setBanner] = useState<{ kind: "ok" | "error"; text: string; fields?: string[] } | null>(null);
  const [busy, setBusy] = useState(false);
  const { errors, warnings } = useValidation(doc);
  // A new saved version (ours, or a restore) becomes the drawing; the banner stays to say what happened.
  const [shownVersion, setShownVersion] = useState(section.currentVersion);
  if (shownVersion !== section.currentVersion) {
    setShownVersion(section.currentVersion);
    setDoc(saved);
  }
  const dirty = JSON.stringify(doc) !== JSON.stringify(saved);
  const palette =
    materials.length > 0
      ? materials
      : doc.materials.map((m, i) => ({
          key: m.id,
          name: m.name ?? m.id,
          color: ["#8fb3d9", "#d9b38f", "#9fc79f", "#c9a0c9", "#a0a0a0"][i % 5],
        }));

  async function save() {
    setBusy(true);
    setBanner(null);
    try {
      const r = await fetchJson<{ section: { version: number }; summary: string }>(
        `/api/projects/${projectId}/sections/${section.id}`,
        {
          method: "PUT",
          json: { baseVersion: section.currentVersion, document: doc, summary: summary || undefined },
        },
      );
      setSummary("");
      setBanner({ kind: "ok", text: `Saved as version ${r.section.version}: ${r.summary}` });
      router.refresh();
    } catch (err) {
      if (err instanceof ApiClientError)
        setBanner({
          kind: "error",
          text: err.message,
          fields: Object.entries(err.fields).map(([k, v]) => `${k}: ${v.join(" ")}`),
        });
      else setBanner({ kind: "error", text: "Could not reach the server; your drawing is still here." });
    } finally {
      setBusy(false);
    }
  }

  async function restore(version: number) {
    if (dirty && !window.confirm("Restoring replaces your unsaved changes in the drawing. Continue?")) return;
    try {
      const r = await fetchJson<{ section: { version: number } }>(
        `/api/projects/${projectId}/sections/${section.id}/versions/${version}/restore`,
        { method: "POST" },
      );
      setBanner({ kind: "ok", text: `Version ${version} restored as version ${r.section.version}.` });
      router.refresh();
    } catch (err) {
      setBanner({ kind: "error", text: err instanceof ApiClientError ? err.message : "Could not reach the server." });
    }
  }

  return (
    <div className="grid gap-4 xl:grid-cols-[1fr_18rem]">
      <div className="min-w-0 space-y-3">
        <SectionEditor
          document={doc}
          onChange={setDoc}
          materials={palette}
          issues={[...errors, ...warnings]}
          readOnly={!canEdit}
          live={{
            lastRunSetup,
            onKeep: canEdit ? save : undefined,
            canKeep: !busy && dirty && errors.length === 0,
            keepLabel: `Keep as version ${section.currentVersion + 1}`,
          }}
        />
        {canEdit ? (
          <div className="panel flex flex-wrap items-end gap-3 p-3" data-testid="save-bar">
            <div className="min-w-64 flex-1">
              <label className="label" htmlFor="save-summary">
                What changed (optional)
              </label>
              <input
                id="save-summary"
                className="field"
                value={summary}
                onChange={(e) => setSummary(e.target.value)}
                placeholder="Left blank, Scarpline describes the change"
                maxLength={300}
              />
            </div>
            <button
              type="button"
              className="btn-primary"
              onClick={save}
              disabled={busy || !dirty || errors.length > 0}
              data-testid="save-version"
            >
              {busy ? "Saving…" : `Save as version ${section.currentVersion + 1}`}
            </button>
            {errors.length > 0 ? (
              <span className="text-xs text-alarm-700">
                Fix the {countOf(errors.length, "problem")} listed beside the drawing to save.
              </span>
            ) : !dirty ? (
              <span className="text-xs text-ink-faint">No unsaved changes.</span>
            ) : null}
          </div>
        ) : null}
        {banner ? (
          <FormBanner kind={banner.kind}>
            {banner.text}
            {banner.fields?.length ? (
              <ul className="mt-1 list-disc pl-5 text-xs">
                {banner.fields.map((f) => (
                  <li key={f}>{f}</li>
                ))}
              </ul>
            ) : null}
          </FormBanner>
        ) : null}
        {canEdit ? (
          <ImportPanel knownMaterialIds={doc.materials.map((m) => m.id)} onApply={(apply) => setDoc((d) => apply(d))} />
        ) : null}
      </div>
      <aside className="space-y-3">
        <section className="panel space-y-2 p-3">
          <h2 className="text-sm font-semibold">Export</h2>
          <ExportButtons name={section.name} document={doc} />
        </section>
        <VersionList
          projectId={projectId}
          sectionId={section.id}
          versions={section.versions}
          current={section.currentVersion}
          canRestore={canEdit}
          onRestore={restore}
        />
      </aside>
    </div>
  );
}
