import type { Knex } from "knex";
import { getDb } from "../index";
import type { Role } from "../../lib/permissions";
import type { PublicUser } from "../../lib/users/types";
// Re-exported so callers written before the move still compile; new code imports lib/users/types.
export type { PublicUser };

export interface UserRow {
  id: number;
  organisation_id: number;
  email: string;
  name: string;
  role: Role;
  active: number | boolean;
  password_hash: string;
  session_version: number;
  last_sign_in_at: Date | null;
}

const toPublic = (r: UserRow): PublicUser => ({
  id: r.id,
  organisationId: r.organisation_id,
  email: r.email,
  name: r.name,
  role: r.role,
  active: Boolean(r.active),
  lastSignInAt: r.last_sign_in_at ? new Date(r.last_sign_in_at).toISOString() : null,
});

export async function fetchUserByEmail(email: string, db: Knex = getDb()): Promise<UserRow | undefined> {
  return db<UserRow>("users").where({ email: email.trim().toLowerCase() }).first();
}

export async function fetchUserById(id: number, db: Knex = getDb()): Promise<UserRow | undefined> {
  return db<UserRow>("users").where({ id }).first();
}

export async function fetchUsersOfOrganisation(organisationId: number, db: Knex = getDb()): Promise<PublicUser[]> {
  const rows = await db<UserRow>("users").where({ organisation_id: organisationId }).orderBy("name");
  return rows.map(toPublic);
}

export async function createUser(
  input: { organisationId: number; email: string; name: string; role: Role; passwordHash: string },
  db: Knex = getDb(),
): Promise<PublicUser> {
  const [id] = await db("users").insert({
    organisation_id: input.organisationId,
    email: input.email.trim().toLowerCase(),
    name: input.name.trim(),
    role: input.role,
    password_hash: input.passwordHash,
  });
  return toPublic((await fetchUserById(id, db))!);
}

const nextVersion = (db: Knex) => db.raw("session_version + 1");

/** What every request checks its token against (lib/auth/session.ts). */
export async function fetchSessionState(
  userId: number,
  db: Knex = getDb(),
): Promise<{ sessionVersion: number; active: boolean } | null> {
  const row = await db<UserRow>("users").where({ id: userId }).first("session_version", "active");
  return row ? { sessionVersion: row.session_version, active: Boolean(row.active) } : null;
}

/** Ends every session of the user: tokens carrying an older version are refused from now on. */
export async function bumpSessionVersion(userId: number, db: Knex = getDb()): Promise<number> {
  return db.transaction(async (trx) => {
    await trx("users")
      .where({ id: userId })
      .update({ session_version: nextVersion(trx) });
    const row = await trx<UserRow>("users").where({ id: userId }).first("session_version");
    return row?.session_version ?? 0;
  });
}

/** A new password ends every session of the user; returns the new session version. */
export async function updatePasswordHash(userId: number, passwordHash: string, db: Knex = getDb()): Promise<number> {
  return db.transaction(async (trx) => {
    await trx("users")
      .where({ id: userId })
      .update({ password_hash: passwordHash, updated_at: trx.fn.now(), session_version: nextVersion(trx) });
    const row = await trx<UserRow>("users").where({ id: userId }).first("session_version");
    return row?.session_version ?? 0;
  });
}

export type AccessChange =
  | { kind: "changed"; user: PublicUser }
  | { kind: "not-found" }
  /** The change would leave the organisation without an active administrator. */
  | { kind: "last-admin" };

/**
 * Changes a user's role or active flag in one organisation; either change ends the user's sessions.
 * The organisation's administrator rows are locked while counting, so two administrators demoting each
 * other at once cannot leave nobody able to manage people.
 */
export async function updateUserAccess(
  input: { organisationId: number; userId: number; role?: Role; active?: boolean },
  db: Knex = getDb(),
): Promise<AccessChange> {
  return db.transaction(async (trx) => {
    const admins = await trx<UserRow>("users")
      .where({ organisation_id: input.organisationId, role: "admin", active: true })
      .forUpdate()
      .select("id");
    const row = await trx<UserRow>("users")
      .where({ id: input.userId, organisation_id: input.organisationId })
      .forUpdate()
      .first();
    if (!row) return { kind: "not-found" } as const;
    const changes: Record<string, unknown> = {};
    if (input.role !== undefined && input.role !== row.role) changes.role = input.role;
    if (input.active !== undefined && input.active !== Boolean(row.active)) changes.active = input.active;
    const leavesAdminSeat = row.role === "admin" && Boolean(row.active) && ("role" in changes || "active" in changes);
    if (leavesAdminSeat && admins.every((a) => a.id === row.id)) return { kind: "last-admin" } as const;
    if (Object.keys(changes).length) {
      await trx("users")
        .where({ id: input.userId })
        .update({ ...changes, updated_at: trx.fn.now(), session_version: nextVersion(trx) });
    }
    return { kind: "changed", user: toPublic((await trx<UserRow>("users").where({ id: input.userId }).first())!) };
  });
}

/** Notes a successful sign-in, for the people screen. */
export async function recordSignIn(userId: number, db: Knex = getDb()): Promise<void> {
  await db("users")
    .where({ id: userId })
    .update({ last_sign_in_at: db.raw("UTC_TIMESTAMP()") });
}

export { toPublic as toPublicUser };
