"use client";

import { useState } from "react";
import Link from "next/link";
import { fetchJson } from "@/lib/client/fetch-json";
import { formatDateTime } from "@/lib/format";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

const FIELDS = [
  ["newPassword", "New password"],
  ["confirmPassword", "New password again"],
] as const;

/** Sets a new password from a mailed one-time link; the server checks the link again when it is used. */
export function ResetPasswordForm({ token, expiresAt }: { token: string; expiresAt: string }) {
  const [done, setDone] = useState(false);
  const { onSubmit, fields, notice, busy } = useApiForm(async (form) => {
    await fetchJson("/api/password-reset", {
      method: "POST",
      json: { token, ...Object.fromEntries(FIELDS.map(([k]) => [k, String(form.get(k) ?? "")])) },
    });
    setDone(true);
  });

  if (done) {
    return (
      <div className="space-y-4" data-testid="reset-done">
        <FormBanner kind="ok">Your new password is set. Every earlier session of yours has ended.</FormBanner>
        <Link href="/sign-in" className="btn-primary w-full justify-center">
          Sign in
        </Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <p className="text-sm text-ink-soft">
        Choose a new password. This link works once, until {formatDateTime(expiresAt)}.
      </p>
      {FIELDS.map(([name, label]) => (
        <div key={name}>
          <label className="label" htmlFor={name}>
            {label}
          </label>
          <input id={name} name={name} type="password" autoComplete="new-password" className="field" />
          <FieldError messages={fields[name]} />
        </div>
      ))}
      <p className="text-xs text-ink-faint">At least 10 characters, with letters and a digit.</p>
      {notice ? <FormBanner kind={notice.kind}>{notice.text}</FormBanner> : null}
      <button type="submit" className="btn-primary w-full" disabled={busy}>
        Set new password
      </button>
    </form>
  );
}
