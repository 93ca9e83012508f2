import type { Knex } from "knex";
import { getDb } from "../index";
import type { LabTestKind, LabTestRecord } from "../../lib/materials/lab-kinds";
import type { ParameterSources } from "../../lib/materials/sources";
import type { LabTestSet } from "../../lib/lab/types";
// Re-exported so callers written before the move still compile; new code imports lib/lab/types.
export type { LabTestSet };

function toLabTestSet(r: Record<string, unknown>): LabTestSet {
  // data and result were written by createLabTestSet from one LabTestRecord of this kind.
  const record = {
    kind: r.kind as LabTestKind,
    data: JSON.parse(r.data as string),
    result: JSON.parse(r.result as string),
  } as LabTestRecord;
  return {
    ...record,
    id: r.id as number,
    projectId: r.project_id as number,
    materialId: (r.material_id as number | null) ?? null,
    name: r.name as string,
    createdAt: new Date(r.created_at as Date).toISOString(),
    createdByName: r.user_name as string,
  };
}

function selectSets(db: Knex) {
  return db("lab_test_sets as l").join("users as u", "u.id", "l.created_by").select("l.*", "u.name as user_name");
}

export async function fetchLabTestSetsOfMaterial(
  projectId: number,
  materialId: number,
  db: Knex = getDb(),
): Promise<LabTestSet[]> {
  const rows = await selectSets(db).where({ "l.project_id": projectId, "l.material_id": materialId }).orderBy("l.id");
  return rows.map(toLabTestSet);
}

export async function fetchLabTestSetsOfProject(projectId: number, db: Knex = getDb()): Promise<LabTestSet[]> {
  const rows = await selectSets(db).where("l.project_id", projectId).orderBy("l.id");
  return rows.map(toLabTestSet);
}

export async function fetchLabTestSet(
  projectId: number,
  setId: number,
  db: Knex = getDb(),
): Promise<LabTestSet | null> {
  const row = await selectSets(db).where({ "l.project_id": projectId, "l.id": setId }).first();
  return row ? toLabTestSet(row) : null;
}

/** Kind and owner of the given sets of a project, for checking claimed sources. */
export async function fetchLabTestSetKinds(
  projectId: number,
  setIds: readonly number[],
  db: Knex = getDb(),
): Promise<{ id: number; kind: LabTestKind; materialId: number | null }[]> {
  if (setIds.length === 0) return [];
  const rows = await db("lab_test_sets")
    .where("project_id", projectId)
    .whereIn("id", [...setIds])
    .select("id", "kind", "material_id");
  return rows.map((r: Record<string, unknown>) => ({
    id: r.id as number,
    kind: r.kind as LabTestKind,
    materialId: (r.material_id as number | null) ?? null,
  }));
}

export async function createLabTestSet(
  input: { projectId: number; materialId: number | null; name: string; record: LabTestRecord; userId: number },
  db: Knex = getDb(),
): Promise<number> {
  const [id] = await db("lab_test_sets").insert({
    project_id: input.projectId,
    material_id: input.materialId,
    kind: input.record.kind,
    name: input.name,
    data: JSON.stringify(input.record.data),
    result: JSON.stringify(input.record.result),
    created_by: input.userId,
  });
  return id;
}

/**
 * Deletes a set and, in the same transaction, the sources that point at it: a parameter must not
 * claim to come from a set that no longer exists. The values themselves stay. False when not found.
 */
export async function deleteLabTestSet(projectId: number, setId: number, db: Knex = getDb()): Promise<boolean> {
  return db.transaction(async (trx) => {
    const found = await trx("lab_test_sets").where({ id: setId, project_id: projectId }).forUpdate().first();
    if (!found) return false;
    const materials = await trx("materials").where({ project_id: projectId }).forUpdate().select("id", "sources");
    for (const m of materials) {
      const sources = JSON.parse(m.sources) as ParameterSources;
      const kept = Object.fromEntries(Object.entries(sources).filter(([, id]) => id !== setId));
      if (Object.keys(kept).length !== Object.keys(sources).length)
        await trx("materials")
          .where({ id: m.id })
          .update({ sources: JSON.stringify(kept) });
    }
    await trx("lab_test_sets").where({ id: setId }).delete();
    return true;
  });
}
