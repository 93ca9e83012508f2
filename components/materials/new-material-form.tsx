"use client";

import { useState } from "react";
import type { LibraryMaterial } from "@/lib/materials/types";
import { EMPTY_PARAMETER_FORM, type ParameterFormValues } from "@/lib/materials/parameter-form";
import { MATERIAL_KEY_HINT, suggestMaterialKey } from "@/lib/materials/keys";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useMaterialSave } from "./use-material-save";
import { ParameterFields } from "./parameter-fields";

export interface NewMaterialFormProps {
  projectId: number;
  onCreated: (material: LibraryMaterial) => void;
}

/** Adds one material by hand; the key follows the name until the user types one. */
export function NewMaterialForm({ projectId, onCreated }: NewMaterialFormProps) {
  const [name, setName] = useState("");
  const [key, setKey] = useState("");
  const [keyTouched, setKeyTouched] = useState(false);
  const [values, setValues] = useState<ParameterFormValues>(EMPTY_PARAMETER_FORM);
  const { fields, banner, busy, save } = useMaterialSave();

  function submit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    void save(
      values,
      (parameters) => ({
        url: `/api/projects/${projectId}/materials`,
        method: "POST",
        json: { key, name, parameters },
      }),
      (created) => {
        onCreated(created);
        setName("");
        setKey("");
        setKeyTouched(false);
        setValues(EMPTY_PARAMETER_FORM);
        return `Added '${created.key}'.`;
      },
    );
  }

  return (
    <form onSubmit={submit} className="panel space-y-3 p-4" noValidate data-testid="new-material-form">
      <h2 className="font-semibold">Add a material</h2>
      <div>
        <label className="label" htmlFor="material-name">
          Name
        </label>
        <input
          id="material-name"
          className="field"
          value={name}
          onChange={(e) => {
            setName(e.target.value);
            if (!keyTouched) setKey(suggestMaterialKey(e.target.value));
          }}
        />
        <FieldError messages={fields.name} />
      </div>
      <div>
        <label className="label" htmlFor="material-key">
          Key used in sections
        </label>
        <input
          id="material-key"
          className="field font-mono"
          value={key}
          onChange={(e) => {
            setKey(e.target.value);
            setKeyTouched(true);
          }}
          aria-describedby="material-key-hint"
        />
        <p id="material-key-hint" className="mt-1 text-xs text-ink-faint">
          {MATERIAL_KEY_HINT}
        </p>
        <FieldError messages={fields.key} />
      </div>
      <ParameterFields idPrefix="new-material" values={values} onChange={setValues} fields={fields} />
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? "Adding…" : "Add material"}
      </button>
    </form>
  );
}
