"use client";

import { useState } from "react";
import type { LibraryMaterial } from "@/lib/materials/types";
import { formValuesFrom, type ParameterFormValues } from "@/lib/materials/parameter-form";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useMaterialSave } from "./use-material-save";
import { ParameterFields } from "./parameter-fields";
import { isWaterLike } from "@/lib/sections/material-palette";

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
  const { fields, banner, busy, save } = useMaterialSave();

  function submit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    void save(
      values,
      (parameters) => ({
        url: `/api/projects/${projectId}/materials/${material.id}`,
        method: "PUT",
        json: { name, notes, color, parameters },
      }),
      (saved) => {
        onSaved(saved);
        return "Saved.";
      },
    );
  }

  return (
    <form onSubmit={submit} className="panel space-y-3 p-4" noValidate data-testid="material-parameters">
      <h2 className="font-semibold">Parameters</h2>
      <fieldset className="grid gap-3 sm:grid-cols-[1fr_auto]" disabled={!canEdit}>
        <div>
          <label className="label" htmlFor="material-name">
            Name
          </label>
          <input id="material-name" className="field" value={name} onChange={(e) => setName(e.target.value)} />
          <FieldError messages={fields.name} />
        </div>
        <div>
          <label className="label" htmlFor="material-color">
            Colour
          </label>
          <input
            id="material-color"
            type="color"
            className="h-8 w-14 rounded border border-rule"
            value={color}
            onChange={(e) => setColor(e.target.value.toUpperCase())}
            aria-describedby={isWaterLike(color) ? "material-color-water" : undefined}
          />
          {isWaterLike(color) ? (
            <p id="material-color-water" className="mt-1 max-w-48 text-xs text-alarm-700">
              Blue is kept for water: drawings show this material in the palette&apos;s colour instead.
            </p>
          ) : null}
          <FieldError messages={fields.color} />
        </div>
      </fieldset>
      <ParameterFields
        idPrefix="material"
        values={values}
        onChange={setValues}
        fields={fields}
        sources={material.sources}
        disabled={!canEdit}
      />
      <div>
        <label className="label" htmlFor="material-notes">
          Notes
        </label>
        <textarea
          id="material-notes"
          className="field min-h-16"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          disabled={!canEdit}
        />
        <FieldError messages={fields.notes} />
      </div>
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
      {canEdit ? (
        <button type="submit" className="btn-primary" disabled={busy}>
          {busy ? "Saving…" : "Save parameters"}
        </button>
      ) : null}
    </form>
  );
}
