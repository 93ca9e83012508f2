import type { Knex } from "knex";
import { getDb } from "../index";
import type { EmbankmentParams } from "../../lib/design/parameters";
import type { StoredSweep } from "../../lib/design/sweep-results";
import type { DesignStudySummary, DesignStudy } from "../../lib/design/types";
// Re-exported so callers written before the move still compile; new code imports lib/design/types.
export type { DesignStudySummary, DesignStudy };

function selectStudies(db: Knex) {
  return db("design_studies as d").join("users as u", "u.id", "d.created_by").select("d.*", "u.name as user_name");
}

function toSummary(r: Record<string, unknown>): DesignStudySummary {
  return {
    id: r.id as number,
    projectId: r.project_id as number,
    name: r.name as string,
    createdByName: r.user_name as string,
    createdAt: new Date(r.created_at as Date).toISOString(),
    updatedAt: new Date(r.updated_at as Date).toISOString(),
    hasSweep: r.sweep_results !== null && r.sweep_results !== undefined,
  };
}

export async function fetchDesignStudiesOfProject(
  projectId: number,
  db: Knex = getDb(),
): Promise<DesignStudySummary[]> {
  const rows = await selectStudies(db)
    .where("d.project_id", projectId)
    .orderBy("d.updated_at", "desc")
    .orderBy("d.id", "desc");
  return rows.map(toSummary);
}

export async function fetchDesignStudy(
  projectId: number,
  studyId: number,
  db: Knex = getDb(),
): Promise<DesignStudy | null> {
  const row = await selectStudies(db).where({ "d.project_id": projectId, "d.id": studyId }).first();
  if (!row) return null;
  return {
    ...toSummary(row),
    // Written by createDesignStudy / saveDesignParameters / saveDesignSweep from checked values.
    parameters: JSON.parse(row.parameters) as EmbankmentParams,
    sweep: row.sweep_results ? (JSON.parse(row.sweep_results) as StoredSweep) : null,
  };
}

export async function createDesignStudy(
  input: { projectId: number; name: string; parameters: EmbankmentParams; userId: number },
  db: Knex = getDb(),
): Promise<number> {
  const [id] = await db("design_studies").insert({
    project_id: input.projectId,
    name: input.name,
    parameters: JSON.stringify(input.parameters),
    sweep_results: null,
    created_by: input.userId,
  });
  return id;
}

/** New parameters invalidate the kept sweep, which described another embankment. */
export async function saveDesignParameters(
  input: { projectId: number; studyId: number; name?: string; parameters: EmbankmentParams },
  db: Knex = getDb(),
): Promise<boolean> {
  const n = await db("design_studies")
    .where({ id: input.studyId, project_id: input.projectId })
    .update({
      parameters: JSON.stringify(input.parameters),
      sweep_results: null,
      updated_at: db.fn.now(),
      ...(input.name !== undefined ? { name: input.name } : {}),
    });
  return n > 0;
}

export async function saveDesignSweep(
  input: { projectId: number; studyId: number; sweep: StoredSweep },
  db: Knex = getDb(),
): Promise<boolean> {
  const n = await db("design_studies")
    .where({ id: input.studyId, project_id: input.projectId })
    .update({ sweep_results: JSON.stringify(input.sweep), updated_at: db.fn.now() });
  return n > 0;
}

export async function deleteDesignStudy(projectId: number, studyId: number, db: Knex = getDb()): Promise<boolean> {
  return (await db("design_studies").where({ id: studyId, project_id: projectId }).delete()) > 0;
}

/** A section name not yet taken in the project: `base`, else `base (2)`, `base (3)`, … */
export async function freeSectionName(projectId: number, base: string, db: Knex = getDb()): Promise<string> {
  const taken = new Set(
    (
      await db("sections")
        .where("project_id", projectId)
        .andWhere("name", "like", `${base.replace(/[%_\\]/g, "\\$&")}%`)
        .select("name")
    ).map((r: { name: string }) => r.name),
  );
  if (!taken.has(base)) return base;
  for (let i = 2; ; i++) if (!taken.has(`${base} (${i})`)) return `${base} (${i})`;
}
