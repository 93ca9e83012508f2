import type { Knex } from "knex";
import { getDb } from "../index";
import { isDuplicateEntry } from "../duplicate-entry";

/** A section name equal to another of the project under the column's collation ("máin" and "main"). */
export class DuplicateSectionNameError extends Error {
  constructor(readonly sectionName: string) {
    super(`A section named '${sectionName}' (or one the database counts as the same) exists already.`);
  }
}

async function guardName<T>(name: string | undefined, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (err) {
    if (name !== undefined && isDuplicateEntry(err)) throw new DuplicateSectionNameError(name);
    throw err;
  }
}

import type { SectionSummary, SectionVersionMeta, SectionDetail, StoredVersion } from "../../lib/sections/types";
// Re-exported so callers written before the move still compile; new code imports lib/sections/types.
export type { SectionSummary, SectionVersionMeta, SectionDetail, StoredVersion };

export async function fetchSectionsOfProject(projectId: number, db: Knex = getDb()): Promise<SectionSummary[]> {
  const rows = await db("sections as s")
    .join("section_versions as v", function () {
      this.on("v.section_id", "s.id").andOn("v.version", "s.current_version");
    })
    .join("users as u", "u.id", "v.created_by")
    .where("s.project_id", projectId)
    .select(
      "s.id",
      "s.project_id",
      "s.name",
      "s.description",
      "s.current_version",
      "v.created_at",
      "u.name as user_name",
      "s.archived_at",
      db.raw("(select count(*) from runs r where r.section_id = s.id) as run_count"),
    )
    .orderBy("s.name");
  return rows.map((r: Record<string, unknown>) => ({
    id: r.id as number,
    projectId: r.project_id as number,
    name: r.name as string,
    description: r.description as string,
    currentVersion: r.current_version as number,
    updatedAt: new Date(r.created_at as Date).toISOString(),
    updatedByName: r.user_name as string,
    archivedAt: r.archived_at ? new Date(r.archived_at as Date).toISOString() : null,
    runCount: Number(r.run_count),
  }));
}

export async function fetchSection(
  projectId: number,
  sectionId: number,
  db: Knex = getDb(),
): Promise<SectionDetail | null> {
  const s = await db("sections").where({ id: sectionId, project_id: projectId }).first();
  if (!s) return null;
  const versions = await db("section_versions as v")
    .join("users as u", "u.id", "v.created_by")
    .where("v.section_id", sectionId)
    .select("v.id", "v.version", "v.summary", "v.created_at", "u.name as user_name")
    .orderBy("v.version", "desc");
  return {
    id: s.id,
    projectId: s.project_id,
    name: s.name,
    description: s.description,
    currentVersion: s.current_version,
    versions: versions.map((v: Record<string, unknown>) => ({
      id: v.id as number,
      version: v.version as number,
      summary: v.summary as string,
      createdAt: new Date(v.created_at as Date).toISOString(),
      createdByName: v.user_name as string,
    })),
  };
}

export async function fetchSectionVersion(
  sectionId: number,
  version: number,
  db: Knex = getDb(),
): Promise<StoredVersion | null> {
  const v = await db("section_versions as v")
    .join("users as u", "u.id", "v.created_by")
    .where({ "v.section_id": sectionId, "v.version": version })
    .select("v.*", "u.name as user_name")
    .first();
  if (!v) return null;
  return {
    id: v.id,
    sectionId: v.section_id,
    version: v.version,
    summary: v.summary,
    document: JSON.parse(v.document),
    createdAt: new Date(v.created_at).toISOString(),
    createdByName: v.user_name,
  };
}

/** Creates a section with its first version, in one transaction. */
export async function createSection(
  input: {
    projectId: number;
    name: string;
    description: string;
    document: unknown;
    summary: string;
    userId: number;
    /** What generated the section (see migration 010), so it can be found again. */
    originKey?: string;
  },
  db: Knex = getDb(),
): Promise<number> {
  return db.transaction(async (trx) => {
    const [id] = await guardName(input.name, () =>
      trx("sections").insert({
        project_id: input.projectId,
        name: input.name,
        description: input.description,
        current_version: 1,
        created_by: input.userId,
        origin_key: input.originKey ?? null,
      }),
    );
    await trx("section_versions").insert({
      section_id: id,
      version: 1,
      document: JSON.stringify(input.document),
      summary: input.summary,
      created_by: input.userId,
    });
    return id;
  });
}

export class StaleVersionError extends Error {
  constructor(readonly currentVersion: number) {
    super(
      currentVersion
        ? `The section was saved by someone else meanwhile (now version ${currentVersion}).`
        : "The section was deleted meanwhile.",
    );
  }
}

/**
 * Saves a new version. `baseVersion` is the version the editor started from: a save on top of
 * a newer version would silently drop someone's work, so it is refused instead.
 */
export async function saveSectionVersion(
  input: {
    sectionId: number;
    baseVersion: number;
    document: unknown;
    summary: string;
    userId: number;
    name?: string;
    description?: string;
  },
  db: Knex = getDb(),
): Promise<number> {
  return db.transaction(async (trx) => {
    const s = await trx("sections").where({ id: input.sectionId }).forUpdate().first();
    if (!s) throw new StaleVersionError(0);
    if (s.current_version !== input.baseVersion) throw new StaleVersionError(s.current_version);
    const version = s.current_version + 1;
    await trx("section_versions").insert({
      section_id: input.sectionId,
      version,
      document: JSON.stringify(input.document),
      summary: input.summary,
      created_by: input.userId,
    });
    await guardName(input.name, () =>
      trx("sections")
        .where({ id: input.sectionId })
        .update({
          current_version: version,
          updated_at: trx.fn.now(),
          ...(input.name !== undefined ? { name: input.name } : {}),
          ...(input.description !== undefined ? { description: input.description } : {}),
        }),
    );
    return version;
  });
}

/** The section a generator made earlier in the project (migration 010's origin_key), if any. */
export async function findSectionByOrigin(
  projectId: number,
  originKey: string,
  db: Knex = getDb(),
): Promise<number | null> {
  const row = await db("sections").where({ project_id: projectId, origin_key: originKey }).first("id");
  return row ? (row.id as number) : null;
}

/** Archives a section (userId) or brings it back (null). Its versions and runs stay as they are. */
export async function setSectionArchived(sectionId: number, userId: number | null, db: Knex = getDb()): Promise<void> {
  await db("sections")
    .where({ id: sectionId })
    .update(
      userId === null ? { archived_at: null, archived_by: null } : { archived_at: db.fn.now(), archived_by: userId },
    );
}

/** How many runs use a section: a section with runs is archived, never deleted. */
export async function countRunsOfSection(sectionId: number, db: Knex = getDb()): Promise<number> {
  const row = await db("runs").where({ section_id: sectionId }).count({ n: "*" }).first();
  return Number(row?.n ?? 0);
}

/** Deletes a section no run uses, with its versions; false when runs use it (the trigger refuses too). */
export async function deleteUnusedSection(sectionId: number, db: Knex = getDb()): Promise<boolean> {
  try {
    return (await db("sections").where({ id: sectionId }).delete()) > 0;
  } catch (err) {
    if (err instanceof Error && /section_in_use:/.test(err.message)) return false;
    throw err;
  }
}
