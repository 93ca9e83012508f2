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
}

const toPublic = (r: UserRow): PublicUser => ({
  id: r.id,
  organisationId: r.organisation_id,
  email: r.email,
  name: r.name,
  role: r.role,
  active: Boolean(r.active),
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

export async function updatePasswordHash(userId: number, passwordHash: string, db: Knex = getDb()): Promise<void> {
  await db("users").where({ id: userId }).update({ password_hash: passwordHash, updated_at: db.fn.now() });
}

export { toPublic as toPublicUser };
