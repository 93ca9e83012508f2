"use client";

import { useState } from "react";
import type { LibraryMaterial } from "@/lib/materials/types";
import type { MaterialParameters } from "@/lib/materials/parameters";
import { parametersFromForm, type ParameterFormValues } from "@/lib/materials/parameter-form";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";

type Banner = { kind: "error" | "ok"; text: string } | null;

/**
 * What the new-material and edit-material forms share: check the typed parameters, send them,
 * and turn the answer into field errors or a banner that repeats the server's warnings.
 */
export function useMaterialSave() {
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [banner, setBanner] = useState<Banner>(null);
  const [busy, setBusy] = useState(false);

  async function save(
    values: ParameterFormValues,
    request: (parameters: MaterialParameters) => { url: string; method: "POST" | "PUT"; json: Record<string, unknown> },
    onDone: (material: LibraryMaterial) => string,
  ): Promise<void> {
    setBanner(null);
    const parsed = parametersFromForm(values);
    if (!parsed.ok) {
      setFields(parsed.fields);
      return;
    }
    setFields({});
    setBusy(true);
    try {
      const { url, method, json } = request(parsed.parameters);
      const result = await fetchJson<{ material: LibraryMaterial; warnings: { message: string }[] }>(url, {
        method,
        json,
      });
      const said = onDone(result.material);
      const notes = result.warnings.map((w) => w.message).join(" ");
      setBanner({ kind: "ok", text: `${said}${notes ? ` Note: ${notes}` : ""}` });
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setBanner({ kind: "error", text: err.message });
      } else setBanner({ kind: "error", text: "Could not reach the server." });
    } finally {
      setBusy(false);
    }
  }

  return { fields, banner, busy, save };
}
