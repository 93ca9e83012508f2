"use client";

import { useState } from "react";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";

const FIELDS = [
  ["currentPassword", "Current password", "current-password"],
  ["newPassword", "New password", "new-password"],
  ["confirmPassword", "New password again", "new-password"],
] as const;

export function PasswordForm() {
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [banner, setBanner] = useState<{ kind: "ok" | "error"; text: string } | null>(null);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const el = event.currentTarget;
    const form = new FormData(el);
    setFields({});
    setBanner(null);
    try {
      await fetchJson("/api/account/password", {
        method: "POST",
        json: Object.fromEntries(FIELDS.map(([k]) => [k, String(form.get(k) ?? "")])),
      });
      el.reset();
      setBanner({ kind: "ok", text: "Password changed." });
    } catch (err) {
      if (err instanceof ApiClientError) {
        setFields(err.fields);
        setBanner({ kind: "error", text: err.message });
      } else setBanner({ kind: "error", text: "Could not reach the server." });
    }
  }

  return (
    <form onSubmit={onSubmit} className="panel space-y-3 p-4" noValidate>
      <h2 className="font-semibold">Change password</h2>
      {FIELDS.map(([name, label, auto]) => (
        <div key={name}>
          <label className="label" htmlFor={name}>
            {label}
          </label>
          <input id={name} name={name} type="password" autoComplete={auto} className="field" />
          <FieldError messages={fields[name]} />
        </div>
      ))}
      <p className="text-xs text-ink-faint">At least 10 characters, with letters and a digit.</p>
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
      <button type="submit" className="btn-primary">
        Change password
      </button>
    </form>
  );
}
