import type { Knex } from "knex";
import { getDb } from "../index";
import { isDuplicateEntry } from "../duplicate-entry";
import type { MaterialParameters } from "../../lib/materials/parameters";
import type { ParameterSources } from "../../lib/materials/sources";
import type { LibraryMaterial, NewMaterial } from "../../lib/materials/types";
// Re-exported so callers written before the move still compile; new code imports lib/materials/types.
export type { LibraryMaterial, NewMaterial };

/** A key already used in the project (the unique index on project_id, key). */
export class DuplicateMaterialKeyError extends Error {
  constructor(readonly key: string) {
    super(`The library already has a material '${key}'.`);
  }
}

function toMaterial(r: Record<string, unknown>): LibraryMaterial {
  return {
    id: r.id as number,
    projectId: r.project_id as number,
    key: r.key as string,
    name: r.name as string,
    color: r.color as string,
    parameters: JSON.parse(r.parameters as string) as MaterialParameters,
    sources: JSON.parse(r.sources as string) as ParameterSources,
    notes: r.notes as string,
    updatedAt: new Date(r.updated_at as Date).toISOString(),
    updatedByName: r.user_name as string,
    labTestCount: Number(r.lab_test_count ?? 0),
  };
}

function selectMaterials(db: Knex) {
  return db("materials as m")
    .join("users as u", "u.id", "m.updated_by")
    .select(
      "m.*",
      "u.name as user_name",
      db.raw("(select count(*) from lab_test_sets l where l.material_id = m.id) as lab_test_count"),
    );
}

export async function fetchMaterialsOfProject(projectId: number, db: Knex = getDb()): Promise<LibraryMaterial[]> {
  const rows = await selectMaterials(db).where("m.project_id", projectId).orderBy("m.key");
  return rows.map(toMaterial);
}

export async function fetchMaterial(
  projectId: number,
  materialId: number,
  db: Knex = getDb(),
): Promise<LibraryMaterial | null> {
  const row = await selectMaterials(db).where({ "m.project_id": projectId, "m.id": materialId }).first();
  return row ? toMaterial(row) : null;
}

/**
 * Inserts materials in one transaction: all of them or none (an import of a whole file).
 * @throws DuplicateMaterialKeyError when a key is taken, e.g. by someone saving meanwhile.
 */
export async function createMaterials(
  projectId: number,
  userId: number,
  materials: readonly NewMaterial[],
  db: Knex = getDb(),
): Promise<number[]> {
  return db.transaction(async (trx) => {
    const ids: number[] = [];
    for (const m of materials) {
      try {
        const [id] = await trx("materials").insert({
          project_id: projectId,
          key: m.key,
          name: m.name,
          color: m.color,
          parameters: JSON.stringify(m.parameters),
          sources: JSON.stringify(m.sources ?? {}),
          notes: m.notes,
          updated_by: userId,
        });
        ids.push(id);
      } catch (err) {
        if (isDuplicateEntry(err)) throw new DuplicateMaterialKeyError(m.key);
        throw err;
      }
    }
    return ids;
  });
}

export async function createMaterial(
  projectId: number,
  userId: number,
  material: NewMaterial,
  db: Knex = getDb(),
): Promise<number> {
  const [id] = await createMaterials(projectId, userId, [material], db);
  return id;
}

/**
 * Saves a material's new parameters and sources. Lab test sets named as sources that belong to no
 * material yet are attached to this one in the same transaction.
 */
export async function updateMaterial(
  input: {
    materialId: number;
    userId: number;
    name: string;
    color: string;
    notes: string;
    parameters: MaterialParameters;
    sources: ParameterSources;
  },
  db: Knex = getDb(),
): Promise<void> {
  await db.transaction(async (trx) => {
    await trx("materials")
      .where({ id: input.materialId })
      .update({
        name: input.name,
        color: input.color,
        notes: input.notes,
        parameters: JSON.stringify(input.parameters),
        sources: JSON.stringify(input.sources),
        updated_by: input.userId,
        updated_at: trx.fn.now(),
      });
    const setIds = [...new Set(Object.values(input.sources))];
    if (setIds.length > 0)
      await trx("lab_test_sets")
        .whereIn("id", setIds)
        .whereNull("material_id")
        .update({ material_id: input.materialId });
  });
}

/**
 * Deletes a material with its lab test sets, in one transaction: a set left without its material
 * would be out of sight in the library. Returns false when it was not found.
 */
export async function deleteMaterial(projectId: number, materialId: number, db: Knex = getDb()): Promise<boolean> {
  return db.transaction(async (trx) => {
    const found = await trx("materials").where({ id: materialId, project_id: projectId }).forUpdate().first();
    if (!found) return false;
    await trx("lab_test_sets").where({ material_id: materialId, project_id: projectId }).delete();
    await trx("materials").where({ id: materialId }).delete();
    return true;
  });
}
