"use client";

import useSWR from "swr";
import { useRouter } from "next/navigation";
import type { PublicUser } from "@/lib/users/types";
import { ROLES, ROLE_LABELS } from "@/lib/permissions";
import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";
import { isLastActiveAdmin } from "@/lib/users/admin-seat";
import { PersonRow } from "./person-row";

export interface UsersManagerProps {
  initialUsers: PublicUser[];
  currentUserId: number;
}

export function UsersManager({ initialUsers, currentUserId }: UsersManagerProps) {
  const { data, mutate } = useSWR<{ users: PublicUser[] }>("/api/users", { fallbackData: { users: initialUsers } });
  const router = useRouter();
  const people = data?.users ?? [];
  // A change to one person is put in place at once, then the list is read again for everyone else's state.
  // A change to one's own role or status ends one's own sessions too, so that means signing in again.
  const replace = async (user: PublicUser) => {
    const before = people.find((p) => p.id === user.id);
    const ownSessionsEnded =
      user.id === currentUserId && (before?.role !== user.role || before?.active !== user.active);
    if (ownSessionsEnded) return router.replace("/sign-in");
    return mutate({ users: people.map((p) => (p.id === user.id ? user : p)) }, { revalidate: true });
  };
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
    <div className="grid gap-6 xl:grid-cols-[3fr_1fr]">
      <table
        className="w-full self-start rounded-lg border border-rule bg-paper-raised text-sm"
        data-testid="user-table"
      >
        <thead className="bg-paper-sunk text-left text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="px-3 py-2">Person</th>
            <th className="px-3 py-2">Role</th>
            <th className="px-3 py-2">Status</th>
            <th className="px-3 py-2">Last sign-in</th>
            <th className="px-3 py-2">Actions</th>
          </tr>
        </thead>
        <tbody>
          {people.map((u) => (
            <PersonRow
              key={u.id}
              person={u}
              isSelf={u.id === currentUserId}
              holdsLastAdminSeat={isLastActiveAdmin(u, people)}
              onChanged={replace}
            />
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
