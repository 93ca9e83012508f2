"use client";

import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

const FIELDS = [
  ["currentPassword", "Current password", "current-password"],
  ["newPassword", "New password", "new-password"],
  ["confirmPassword", "New password again", "new-password"],
] as const;

export function PasswordForm() {
  const {
    onSubmit,
    fields,
    notice: banner,
  } = useApiForm(async (form, el) => {
    await fetchJson("/api/account/password", {
      method: "POST",
      json: Object.fromEntries(FIELDS.map(([k]) => [k, String(form.get(k) ?? "")])),
    });
    el.reset();
    return "Password changed.";
  });

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
