"use client";

import type { PublicUser } from "@/lib/users/types";
import { ROLES, ROLE_LABELS, type Role } from "@/lib/permissions";
import { formatDateTime } from "@/lib/format";
import { fetchJson } from "@/lib/client/fetch-json";
import { LAST_ADMIN_MESSAGE } from "@/lib/users/admin-seat";
import { useApiForm } from "@/components/ui/use-api-form";

export interface PersonRowProps {
  person: PublicUser;
  isSelf: boolean;
  /** The only active administrator: their role and active flag stay as they are. */
  holdsLastAdminSeat: boolean;
  onChanged: (user: PublicUser) => Promise<unknown>;
}

/** One person on the people screen: role, status, last sign-in, and what an administrator can do about them. */
export function PersonRow({ person, isSelf, holdsLastAdminSeat, onChanged }: PersonRowProps) {
  const { run, notice, busy } = useApiForm();
  const url = `/api/users/${person.id}`;
  const seatNoteId = `seat-note-${person.id}`;

  const patch = (json: { role?: Role; active?: boolean; unlockSignIn?: true }, done: string) =>
    run(async () => {
      const { user } = await fetchJson<{ user: PublicUser }>(url, { method: "PATCH", json });
      await onChanged(user);
      return done;
    });

  const mailReset = () =>
    run(async () => {
      const sent = await fetchJson<{ sentTo: string; expiresAt: string }>(`${url}/password-reset`, { method: "POST" });
      return `Reset link mailed to ${sent.sentTo}; it works once and expires on ${formatDateTime(sent.expiresAt)}.`;
    });

  return (
    <tr className="border-t border-rule align-top" data-testid={`person-${person.email}`}>
      <td className="px-3 py-2">
        {person.name}
        {isSelf ? <span className="ml-1 text-xs text-ink-soft">(you)</span> : null}
        <div className="text-xs text-ink-soft">{person.email}</div>
      </td>
      <td className="px-3 py-2">
        <label className="sr-only" htmlFor={`role-${person.id}`}>
          Role of {person.name}
        </label>
        <select
          id={`role-${person.id}`}
          className="field w-36 py-1"
          value={person.role}
          disabled={busy || holdsLastAdminSeat}
          aria-describedby={holdsLastAdminSeat ? seatNoteId : undefined}
          onChange={(e) => {
            const role = e.target.value as Role;
            void patch({ role }, `${person.name} is now ${ROLE_LABELS[role].toLowerCase()}; their sessions ended.`);
          }}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      </td>
      <td className="px-3 py-2" data-testid="person-status">
        {person.active ? "Active" : <span className="font-medium text-alarm-700">Deactivated</span>}
      </td>
      <td className="px-3 py-2 whitespace-nowrap" data-testid="person-last-sign-in">
        {person.lastSignInAt ? (
          <time dateTime={person.lastSignInAt}>{formatDateTime(person.lastSignInAt)}</time>
        ) : (
          <span className="text-ink-soft">Never</span>
        )}
      </td>
      <td className="px-3 py-2">
        <div className="flex flex-wrap gap-2 whitespace-nowrap">
          {person.active ? (
            <button
              type="button"
              className="btn-quiet py-1 text-xs"
              disabled={busy || holdsLastAdminSeat}
              aria-describedby={holdsLastAdminSeat ? seatNoteId : undefined}
              onClick={() =>
                patch(
                  { active: false },
                  `${person.name} is deactivated and cannot sign in; their runs and comments keep their name.`,
                )
              }
            >
              Deactivate
            </button>
          ) : (
            <button
              type="button"
              className="btn-quiet py-1 text-xs"
              disabled={busy}
              onClick={() => patch({ active: true }, `${person.name} can sign in again.`)}
            >
              Reactivate
            </button>
          )}
          {person.active ? (
            <button type="button" className="btn-quiet py-1 text-xs" disabled={busy} onClick={mailReset}>
              Mail a reset link
            </button>
          ) : null}
          <button
            type="button"
            className="btn-quiet py-1 text-xs"
            disabled={busy}
            onClick={() => patch({ unlockSignIn: true }, `Failed sign-ins of ${person.name} are forgotten.`)}
          >
            Lift sign-in lock
          </button>
        </div>
        {holdsLastAdminSeat ? (
          <p id={seatNoteId} className="mt-1 max-w-xs text-xs text-ink-soft" data-testid="last-admin-note">
            {isSelf ? "You are the only active administrator. " : ""}
            {LAST_ADMIN_MESSAGE}
          </p>
        ) : null}
        {notice ? (
          <p
            role="status"
            className={`mt-1 max-w-xs text-xs ${notice.kind === "error" ? "text-alarm-700" : "text-moss-700"}`}
            data-testid={notice.kind === "error" ? "person-error" : "person-done"}
          >
            {notice.text}
          </p>
        ) : null}
      </td>
    </tr>
  );
}
