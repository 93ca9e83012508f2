"use client";

import { useState, type FormEvent } from "react";
import { ApiClientError } from "@/lib/client/fetch-json";

/** Messages per field name, as the API answers them in `{"error": {"fields": {...}}}`. */
export type FieldMessages = Record<string, string[]>;

export interface FormNotice {
  kind: "ok" | "error";
  text: string;
}

/** A problem the form finds itself before sending (nothing chosen yet, say), shown like the server's. */
export class FormProblem extends Error {}

/**
 * The one way a form talks to the API: read its FormData, clear the old messages, send, and show
 * the server's field errors and message, or a success note. `send` returns the note to show, or
 * nothing when the form navigates away, closes or shows its result elsewhere.
 */
export function useApiForm(send: (form: FormData, element: HTMLFormElement) => Promise<string | void>) {
  const [fields, setFields] = useState<FieldMessages>({});
  const [notice, setNotice] = useState<FormNotice | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const element = event.currentTarget;
    setFields({});
    setNotice(null);
    setBusy(true);
    try {
      const ok = await send(new FormData(element), element);
      if (ok) setNotice({ kind: "ok", text: ok });
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setNotice({ kind: "error", text: err.message });
      } else if (err instanceof FormProblem) setNotice({ kind: "error", text: err.message });
      else setNotice({ kind: "error", text: "Could not reach the server." });
    } finally {
      setBusy(false);
    }
  }

  /** Shows an error that arose outside a submission (a failed delete next to the form, say). */
  const fail = (err: unknown) =>
    setNotice({ kind: "error", text: err instanceof ApiClientError ? err.message : "Could not reach the server." });

  return { onSubmit, fields, notice, busy, fail };
}
