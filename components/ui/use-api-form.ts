"use client";

import { useState, type FormEvent } from "react";
import { ApiClientError } from "@/lib/client/fetch-json";

/** Messages per field name, as the API answers them in `{"error": {"fields": {...}}}`. */
export type FieldMessages = Record<string, string[]>;

export interface FormNotice {
  kind: "ok" | "error";
  text: string;
}

/**
 * A problem the form finds itself before sending (nothing chosen yet, a value that does not parse),
 * shown like the server's: its message as the notice (none when empty) and its field messages.
 */
export class FormProblem extends Error {
  constructor(
    message: string,
    readonly fields: FieldMessages = {},
  ) {
    super(message);
  }
}

/**
 * The one way a form talks to the API: read its FormData, clear the old messages, send, and show
 * the server's field errors and message, or a success note. `send` returns the note to show, or
 * nothing when the form navigates away, closes or shows its result elsewhere. A form that does not
 * submit FormData (values held in state) calls `run` with its own task instead.
 */
export function useApiForm(send?: (form: FormData, element: HTMLFormElement) => Promise<string | void>) {
  const [fields, setFields] = useState<FieldMessages>({});
  const [notice, setNotice] = useState<FormNotice | null>(null);
  const [busy, setBusy] = useState(false);

  /** Runs one submission; resolves true when it went through. */
  async function run(task: () => Promise<string | void>): Promise<boolean> {
    setFields({});
    setNotice(null);
    setBusy(true);
    try {
      const ok = await task();
      if (ok) setNotice({ kind: "ok", text: ok });
      return true;
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setNotice({ kind: "error", text: err.message });
      } else if (err instanceof FormProblem) {
        setFields(err.fields);
        if (err.message) setNotice({ kind: "error", text: err.message });
      } else setNotice({ kind: "error", text: "Could not reach the server." });
      return false;
    } finally {
      setBusy(false);
    }
  }

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const element = event.currentTarget;
    if (send) await run(() => send(new FormData(element), element));
  }

  /** Shows an error that arose outside a submission (a failed delete next to the form, say). */
  const fail = (err: unknown) =>
    setNotice({ kind: "error", text: err instanceof ApiClientError ? err.message : "Could not reach the server." });

  return { onSubmit, run, fields, notice, busy, fail };
}
