"use client";

import { useCallback, useMemo, useState } from "react";
import {
  DesignInputError,
  embankmentParamsSchema,
  fromFormValues,
  generateEmbankment,
  toFormValues,
  type EmbankmentParams,
  type FormValues,
  type GeneratedEmbankment,
} from "@/lib/design";
import type { Material } from "@/lib/stability";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";

export interface DraftPreview {
  normal: GeneratedEmbankment;
  flood: GeneratedEmbankment;
}

/**
 * The parameters as typed, checked on every keystroke with the same schema the server uses, and
 * the section they generate. The preview keeps the last valid parameters while a field is wrong.
 */
export function useDesignDraft(projectId: number, studyId: number, initial: EmbankmentParams, materials: Material[]) {
  const [values, setValues] = useState<FormValues>(() => toFormValues(initial));
  const [saved, setSaved] = useState<EmbankmentParams>(initial);
  const [lastValid, setLastValid] = useState<EmbankmentParams>(initial);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [serverErrors, setServerErrors] = useState<Record<string, string[]>>({});

  const parsed = useMemo(() => embankmentParamsSchema.safeParse(fromFormValues(values)), [values]);
  const schemaErrors = useMemo(() => {
    const out: Record<string, string[]> = {};
    if (!parsed.success) for (const i of parsed.error.issues) (out[i.path.join(".")] ??= []).push(i.message);
    return out;
  }, [parsed]);

  const { preview, generateError } = useMemo(() => {
    const params = parsed.success ? parsed.data : lastValid;
    try {
      return {
        preview: {
          normal: generateEmbankment(params, materials),
          flood: generateEmbankment(params, materials, { pool: "flood" }),
        } as DraftPreview,
        generateError: null,
      };
    } catch (err) {
      if (err instanceof DesignInputError)
        return { preview: null, generateError: { field: err.field, message: err.message } };
      throw err;
    }
  }, [parsed, lastValid, materials]);

  if (
    parsed.success &&
    !generateError &&
    parsed.data !== lastValid &&
    JSON.stringify(parsed.data) !== JSON.stringify(lastValid)
  )
    setLastValid(parsed.data);

  const errors = useMemo(() => {
    const out = { ...serverErrors, ...schemaErrors };
    if (generateError) (out[generateError.field] ??= []).push(generateError.message);
    return out;
  }, [schemaErrors, serverErrors, generateError]);

  const valid = parsed.success && !generateError;
  const params = valid ? parsed.data : null;
  const dirty = !params || JSON.stringify(params) !== JSON.stringify(saved);

  const onChange = useCallback((key: string, value: string) => {
    setValues((v) => ({ ...v, [key]: value }));
    setServerErrors({});
  }, []);

  /** Saves the parameters (the server clears the kept sweep); returns them, or null on failure. */
  const save = useCallback(async (): Promise<EmbankmentParams | null> => {
    if (!params) return null;
    setSaveError(null);
    try {
      await fetchJson(`/api/projects/${projectId}/design/${studyId}`, {
        method: "PATCH",
        json: { parameters: params },
      });
      setSaved(params);
      return params;
    } catch (err) {
      if (err instanceof ApiClientError) {
        setServerErrors(
          Object.fromEntries(Object.entries(err.fields).map(([k, v]) => [k.replace(/^parameters\./, ""), v])),
        );
        setSaveError(err.message);
      } else setSaveError("Could not reach the server.");
      return null;
    }
  }, [params, projectId, studyId]);

  const reset = useCallback(() => setValues(toFormValues(saved)), [saved]);

  return { values, onChange, errors, valid, params, saved, dirty, preview, save, saveError, reset };
}
