"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { SectionDocument } from "@/lib/stability";
import { validateSection } from "@/lib/stability";
import { starterSection } from "@/lib/sections/starter";
import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { FormProblem, useApiForm } from "@/components/ui/use-api-form";
import { ImportPanel } from "@/components/section-import/import-panel";
import { SectionPreview } from "@/components/section-import/section-preview";
import { countOf } from "@/lib/format";

const EMPTY: SectionDocument = { version: 1, materials: [], regions: [] } as unknown as SectionDocument;

/** Names a new section and starts it from the starter drawing or from imported files. */
export function NewSectionForm({ projectId }: { projectId: number }) {
  const router = useRouter();
  const [start, setStart] = useState<"starter" | "files">("starter");
  const [imported, setImported] = useState<{ doc: SectionDocument; description: string } | null>(null);
  const doc = start === "starter" ? starterSection() : (imported?.doc ?? null);
  const check = doc ? validateSection(doc) : null;

  const { onSubmit, fields, notice } = useApiForm(async (form) => {
    if (!doc) throw new FormProblem("Drop the section's files first, or start from the starter drawing.");
    const r = await fetchJson<{ section: { id: number } }>(`/api/projects/${projectId}/sections`, {
      method: "POST",
      json: {
        name: form.get("name"),
        description: form.get("description"),
        document: doc,
        summary: start === "files" ? imported?.description : "Started from the starter drawing",
      },
    });
    router.push(`/projects/${projectId}/sections/${r.section.id}`);
  });

  return (
    <form onSubmit={onSubmit} className="max-w-3xl space-y-4" noValidate>
      <div className="panel space-y-3 p-4">
        <div>
          <label className="label" htmlFor="section-name">
            Name
          </label>
          <input id="section-name" name="name" className="field" placeholder="e.g. Right abutment, station 0+410" />
          <FieldError messages={fields.name} />
        </div>
        <div>
          <label className="label" htmlFor="section-description">
            Description
          </label>
          <textarea id="section-description" name="description" rows={2} className="field" />
        </div>
        <div className="flex gap-4 text-sm" role="radiogroup" aria-label="Start from">
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name="start" checked={start === "starter"} onChange={() => setStart("starter")} />{" "}
            Starter drawing, then draw
          </label>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name="start" checked={start === "files"} onChange={() => setStart("files")} /> Import
            files
          </label>
        </div>
      </div>
      {start === "files" ? (
        <>
          <ImportPanel
            knownMaterialIds={[]}
            onApply={(apply, description) => setImported({ doc: apply(EMPTY), description })}
          />
          {imported && check && !check.ok ? (
            <div className="panel p-3 text-sm" data-testid="new-section-issues">
              <p className="font-medium text-alarm-700">
                The imported section has {countOf(check.errors.length, "problem")}; fix the files and drop them again:
              </p>
              <ul className="mt-1 list-disc pl-5 text-xs">
                {check.errors.map((e, i) => (
                  <li key={i}>
                    {e.path}: {e.message}
                  </li>
                ))}
              </ul>
            </div>
          ) : imported ? (
            <p className="text-sm text-moss-700">✓ {imported.description}</p>
          ) : null}
          {imported && imported.doc.regions.length > 0 ? <SectionPreview document={imported.doc} /> : null}
        </>
      ) : null}
      {notice ? (
        <FormBanner kind={notice.kind}>
          {notice.text}
          {Object.keys(fields).some((k) => k.startsWith("document")) ? (
            <ul className="mt-1 list-disc pl-5 text-xs">
              {Object.entries(fields)
                .filter(([k]) => k.startsWith("document"))
                .map(([k, v]) => (
                  <li key={k}>
                    {k.replace(/^document\./, "")}: {v.join(" ")}
                  </li>
                ))}
            </ul>
          ) : null}
        </FormBanner>
      ) : null}
      <button type="submit" className="btn-primary" disabled={start === "files" && !(check && check.ok)}>
        Create section
      </button>
    </form>
  );
}
