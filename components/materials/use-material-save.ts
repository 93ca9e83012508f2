"use client";

import type { LibraryMaterial } from "@/lib/materials/types";
import type { MaterialParameters } from "@/lib/materials/parameters";
import { parametersFromForm, type ParameterFormValues } from "@/lib/materials/parameter-form";
import { fetchJson } from "@/lib/client/fetch-json";
import { FormProblem, useApiForm } from "@/components/ui/use-api-form";

/**
 * What the new-material and edit-material forms share: check the typed parameters, send them,
 * and turn the answer into field errors or a banner that repeats the server's warnings.
 */
export function useMaterialSave() {
  const { run, fields, notice: banner, busy } = useApiForm();

  function save(
    values: ParameterFormValues,
    request: (parameters: MaterialParameters) => { url: string; method: "POST" | "PUT"; json: Record<string, unknown> },
    onDone: (material: LibraryMaterial) => string,
  ): Promise<boolean> {
    return run(async () => {
      const parsed = parametersFromForm(values);
      if (!parsed.ok) throw new FormProblem("", parsed.fields);
      const { url, method, json } = request(parsed.parameters);
      const result = await fetchJson<{ material: LibraryMaterial; warnings: { message: string }[] }>(url, {
        method,
        json,
      });
      const said = onDone(result.material);
      const notes = result.warnings.map((w) => w.message).join(" ");
      return `${said}${notes ? ` Note: ${notes}` : ""}`;
    });
  }

  return { fields, banner, busy, save };
}
