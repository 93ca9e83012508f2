"use client";

import useSWR from "swr";
import type { PublicUser } from "@/lib/users/types";
import { ROLES, ROLE_LABELS } from "@/lib/permissions";
import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

export function UsersManager({ initialUsers }: { initialUsers: PublicUser[] }) {
  const { data, mutate } = useSWR<{ users: PublicUser[] }>("/api/users", { fallbackData: { users: initialUsers } });
  const {
    onSubmit,
    fields,
    notice: banner,
  } = useApiForm(async (form, el) => {
    await fetchJson("/api/users", {
      method: "POST",
      json: {
        email: form.get("email"),
        name: form.get("name"),
        role: form.get("role"),
        password: form.get("password"),
      },
    });
    el.reset();
    await mutate();
    return "User added. Give them their e-mail and first password in person.";
  });

  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <table
        className="w-full self-start rounded-lg border border-rule bg-paper-raised text-sm"
        data-testid="user-table"
      >
        <thead className="bg-paper-sunk text-left text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="px-3 py-2">Name</th>
            <th className="px-3 py-2">E-mail</th>
            <th className="px-3 py-2">Role</th>
          </tr>
        </thead>
        <tbody>
          {(data?.users ?? []).map((u) => (
            <tr key={u.id} className="border-t border-rule">
              <td className="px-3 py-2">{u.name}</td>
              <td className="px-3 py-2 text-ink-soft">{u.email}</td>
              <td className="px-3 py-2">{ROLE_LABELS[u.role]}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <form onSubmit={onSubmit} className="panel space-y-3 self-start p-4" noValidate>
        <h2 className="font-semibold">Add a person</h2>
        {(
          [
            ["name", "Name", "text"],
            ["email", "E-mail", "email"],
            ["password", "First password", "password"],
          ] as const
        ).map(([n, l, t]) => (
          <div key={n}>
            <label className="label" htmlFor={`user-${n}`}>
              {l}
            </label>
            <input id={`user-${n}`} name={n} type={t} className="field" autoComplete="off" />
            <FieldError messages={fields[n]} />
          </div>
        ))}
        <div>
          <label className="label" htmlFor="user-role">
            Role
          </label>
          <select id="user-role" name="role" className="field" defaultValue="engineer">
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        </div>
        {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
        <button type="submit" className="btn-primary">
          Add person
        </button>
      </form>
    </div>
  );
}
