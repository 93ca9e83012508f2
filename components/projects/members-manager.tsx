"use client";

import useSWR from "swr";
import type { ProjectMember } from "@/lib/projects/types";
import { PROJECT_ROLES, type ProjectRole } from "@/lib/permissions";
import { fetchJson } from "@/lib/client/fetch-json";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useApiForm } from "@/components/ui/use-api-form";

export interface MembersManagerProps {
  projectId: number;
  initialMembers: ProjectMember[];
  candidates: { id: number; name: string; email: string; role: string }[];
}

export function MembersManager({ projectId, initialMembers, candidates }: MembersManagerProps) {
  const url = `/api/projects/${projectId}/members`;
  const { data, mutate } = useSWR<{ members: ProjectMember[] }>(url, { fallbackData: { members: initialMembers } });
  const members = data?.members ?? [];
  const {
    onSubmit: add,
    fields,
    notice,
    fail,
  } = useApiForm(async (form) => {
    const userId = Number(form.get("userId"));
    const result = await fetchJson<{ members: ProjectMember[] }>(url, {
      method: "POST",
      json: { userId: userId || undefined, role: form.get("role") as ProjectRole },
    });
    await mutate(result, { revalidate: false });
  });

  async function remove(userId: number) {
    try {
      await fetchJson(`${url}/${userId}`, { method: "DELETE" });
      await mutate();
    } catch (err) {
      fail(err);
    }
  }

  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <table
        className="w-full self-start rounded-lg border border-rule bg-paper-raised text-sm"
        data-testid="member-table"
      >
        <thead className="bg-paper-sunk text-left text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="px-3 py-2">Name</th>
            <th className="px-3 py-2">E-mail</th>
            <th className="px-3 py-2">Project role</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {members.length === 0 ? (
            <tr>
              <td colSpan={4} className="px-3 py-6 text-center text-ink-soft">
                No members yet: add the people who work on this project.
              </td>
            </tr>
          ) : (
            members.map((m) => (
              <tr key={m.userId} className="border-t border-rule">
                <td className="px-3 py-2">{m.name}</td>
                <td className="px-3 py-2 text-ink-soft">{m.email}</td>
                <td className="px-3 py-2 capitalize">{m.role}</td>
                <td className="px-3 py-2 text-right">
                  <button className="text-xs text-alarm-700 hover:underline" onClick={() => remove(m.userId)}>
                    Remove
                  </button>
                </td>
              </tr>
            ))
          )}
        </tbody>
      </table>
      <form onSubmit={add} className="panel space-y-3 self-start p-4" noValidate>
        <h2 className="font-semibold">Add or change a member</h2>
        <div>
          <label className="label" htmlFor="member-user">
            Person
          </label>
          <select id="member-user" name="userId" className="field" defaultValue="">
            <option value="" disabled>
              Choose…
            </option>
            {candidates.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name} ({c.email})
              </option>
            ))}
          </select>
          <FieldError messages={fields.userId} />
        </div>
        <div>
          <label className="label" htmlFor="member-role">
            Role in this project
          </label>
          <select id="member-role" name="role" className="field" defaultValue="engineer">
            {PROJECT_ROLES.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
          <FieldError messages={fields.role} />
        </div>
        {notice ? <FormBanner kind={notice.kind}>{notice.text}</FormBanner> : null}
        <button type="submit" className="btn-primary">
          Save member
        </button>
      </form>
    </div>
  );
}
