import type { Knex } from "knex";
import { getDb } from "../index";
import type { ProjectRole } from "../../lib/permissions";
import type { ProjectSummary, ProjectMember } from "../../lib/projects/types";
// Re-exported so callers written before the move still compile; new code imports lib/projects/types.
export type { ProjectSummary, ProjectMember };

const iso = (d: Date | string) => new Date(d).toISOString();

/** Projects the user may see: all of the organisation's for admins, their memberships for others. */
export async function fetchProjectsForUser(
  user: { id: number; organisationId: number; role: string },
  db: Knex = getDb(),
): Promise<ProjectSummary[]> {
  const q = db("projects as p")
    .leftJoin("project_members as me", function () {
      this.on("me.project_id", "p.id").andOn("me.user_id", db.raw("?", [user.id]));
    })
    .where("p.organisation_id", user.organisationId)
    .select(
      "p.id",
      "p.organisation_id",
      "p.name",
      "p.description",
      "p.created_at",
      "me.role as member_role",
      db.raw("(select count(*) from project_members pm where pm.project_id = p.id) as member_count"),
    )
    .orderBy("p.name");
  if (user.role !== "admin") q.whereNotNull("me.user_id");
  const rows = await q;
  return rows.map((r: Record<string, unknown>) => ({
    id: r.id as number,
    organisationId: r.organisation_id as number,
    name: r.name as string,
    description: r.description as string,
    createdAt: iso(r.created_at as Date),
    memberRole: (r.member_role as ProjectRole) ?? null,
    memberCount: Number(r.member_count),
  }));
}

export async function fetchProjectById(id: number, db: Knex = getDb()) {
  const row = await db("projects").where({ id }).first();
  if (!row) return null;
  return {
    id: row.id as number,
    organisationId: row.organisation_id as number,
    name: row.name as string,
    description: row.description as string,
    createdAt: iso(row.created_at),
  };
}

export async function fetchMemberRole(
  projectId: number,
  userId: number,
  db: Knex = getDb(),
): Promise<ProjectRole | null> {
  const row = await db("project_members").where({ project_id: projectId, user_id: userId }).first();
  return row ? (row.role as ProjectRole) : null;
}

export async function fetchProjectMembers(projectId: number, db: Knex = getDb()): Promise<ProjectMember[]> {
  const rows = await db("project_members as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.project_id", projectId)
    .select("u.id as user_id", "u.name", "u.email", "m.role", "m.added_at")
    .orderBy("u.name");
  return rows.map((r: Record<string, unknown>) => ({
    userId: r.user_id as number,
    name: r.name as string,
    email: r.email as string,
    role: r.role as ProjectRole,
    addedAt: iso(r.added_at as Date),
  }));
}

export async function createProject(
  input: { organisationId: number; name: string; description: string; createdBy: number },
  db: Knex = getDb(),
): Promise<number> {
  const [id] = await db("projects").insert({
    organisation_id: input.organisationId,
    name: input.name,
    description: input.description,
    created_by: input.createdBy,
  });
  return id;
}

/** Adds a member or changes the role of an existing one. */
export async function upsertProjectMember(projectId: number, userId: number, role: ProjectRole, db: Knex = getDb()) {
  await db("project_members")
    .insert({ project_id: projectId, user_id: userId, role })
    .onConflict(["project_id", "user_id"])
    .merge({ role });
}

export async function removeProjectMember(projectId: number, userId: number, db: Knex = getDb()): Promise<boolean> {
  return (await db("project_members").where({ project_id: projectId, user_id: userId }).delete()) > 0;
}
