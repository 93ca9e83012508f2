"use client";

import { useState } from "react";
import type { LibraryMaterial } from "@/db/queries/materials";
import { formValuesFrom, parametersFromForm, type ParameterFormValues } from "@/lib/materials/parameter-form";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { ParameterFields } from "./parameter-fields";

export interface MaterialParametersFormProps {
  projectId: number;
  material: LibraryMaterial;
  canEdit: boolean;
  onSaved: (material: LibraryMaterial) => void;
}

/**
 * The material's name, notes and parameters. Typing over a value that came from the lab drops
 * its source on save (the server decides; see mergeSources).
 */
export function MaterialParametersForm({ projectId, material, canEdit, onSaved }: MaterialParametersFormProps) {
  const [name, setName] = useState(material.name);
  const [notes, setNotes] = useState(material.notes);
  const [color, setColor] = useState(material.color);
  const [values, setValues] = useState<ParameterFormValues>(() => formValuesFrom(material.parameters));
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [banner, setBanner] = useState<{ kind: "error" | "ok"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBanner(null);
    const parsed = parametersFromForm(values);
    if (!parsed.ok) {
      setFields(parsed.fields);
      return;
    }
    setFields({});
    setBusy(true);
    try {
      const result = await fetchJson<{ material: LibraryMaterial; warnings: { message: string }[] }>(`/api/projects/${projectId}/materials/${material.id}`, {
        method: "PUT",
        json: { name, notes, color, parameters: parsed.parameters },
      });
      onSaved(result.material);
      const notesText = result.warnings.map((w) => w.message).join(" ");
      setBanner({ kind: "ok", text: `Saved.${notesText ? ` Note: ${notesText}` : ""}` });
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setBanner({ kind: "error", text: err.message });
      } else setBanner({ kind: "error", text: "Could not reach the server." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="panel space-y-3 p-4" noValidate data-testid="material-parameters">
      <h2 className="font-semibold">Parameters</h2>
      <fieldset className="grid gap-3 sm:grid-cols-[1fr_auto]" disabled={!canEdit}>
        <div>
          <label className="label" htmlFor="material-name">Name</label>
          <input id="material-name" className="field" value={name} onChange={(e) => setName(e.target.value)} />
          <FieldError messages={fields.name} />
        </div>
        <div>
          <label className="label" htmlFor="material-color">Colour</label>
          <input id="material-color" type="color" className="h-8 w-14 rounded border border-rule" value={color} onChange={(e) => setColor(e.target.value.toUpperCase())} />
          <FieldError messages={fields.color} />
        </div>
      </fieldset>
      <ParameterFields idPrefix="material" values={values} onChange={setValues} fields={fields} sources={material.sources} disabled={!canEdit} />
      <div>
        <label className="label" htmlFor="material-notes">Notes</label>
        <textarea id="material-notes" className="field min-h-16" value={notes} onChange={(e) => setNotes(e.target.value)} disabled={!canEdit} />
        <FieldError messages={fields.notes} />
      </div>
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
      {canEdit ? <button type="submit" className="btn-primary" disabled={busy}>{busy ? "Saving…" : "Save parameters"}</button> : null}
    </form>
  );
}
