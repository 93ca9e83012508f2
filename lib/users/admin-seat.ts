import type { PublicUser } from "./types";

/** Why the last active administrator keeps the seat: someone must be able to manage people. */
export const LAST_ADMIN_MESSAGE =
  "The organisation needs at least one active administrator: make someone else an administrator first.";

/** Whether this person is the only active administrator among `people` (the screen disables their seat). */
export function isLastActiveAdmin(person: PublicUser, people: PublicUser[]): boolean {
  if (person.role !== "admin" || !person.active) return false;
  return !people.some((p) => p.id !== person.id && p.role === "admin" && p.active);
}
