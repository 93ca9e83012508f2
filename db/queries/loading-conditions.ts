import type { Knex } from "knex";
import { getDb } from "../index";
import { LOADING_CONDITIONS, type LoadingConditionKey } from "../../lib/analysis/required-fs";
import type { ConditionSetting } from "../../lib/analysis/types";
// Re-exported so callers written before the move still compile; new code imports lib/analysis/types.
export type { ConditionSetting };

/** Every loading condition with the project's required FS (its own value or the default). */
export async function fetchConditionSettings(projectId: number, db: Knex = getDb()): Promise<ConditionSetting[]> {
  const rows = await db("project_loading_conditions as c")
    .join("users as u", "u.id", "c.updated_by")
    .where("c.project_id", projectId)
    .select("c.condition_key", "c.required_fs", "c.reason", "c.updated_at", "u.name as user_name");
  const own = new Map(rows.map((r: Record<string, unknown>) => [r.condition_key as string, r]));
  return LOADING_CONDITIONS.map((c) => {
    const r = own.get(c.key) as Record<string, unknown> | undefined;
    return {
      key: c.key,
      label: c.label,
      faces: c.faces,
      requiredFs: r ? Number(r.required_fs) : c.requiredFs,
      defaultFs: c.requiredFs,
      basis: c.basis,
      reason: r ? (r.reason as string) : null,
      updatedByName: r ? (r.user_name as string) : null,
      updatedAt: r ? new Date(r.updated_at as Date).toISOString() : null,
    };
  });
}

export async function fetchRequiredFsMap(
  projectId: number,
  db: Knex = getDb(),
): Promise<Record<LoadingConditionKey, number>> {
  const settings = await fetchConditionSettings(projectId, db);
  return Object.fromEntries(settings.map((s) => [s.key, s.requiredFs])) as Record<LoadingConditionKey, number>;
}

/** Sets a project's own required FS for a condition; back to the default removes the override. */
export async function saveConditionSetting(
  input: { projectId: number; key: LoadingConditionKey; requiredFs: number; reason: string; userId: number },
  db: Knex = getDb(),
): Promise<void> {
  const def = LOADING_CONDITIONS.find((c) => c.key === input.key)!;
  if (Math.abs(def.requiredFs - input.requiredFs) < 1e-9) {
    await db("project_loading_conditions").where({ project_id: input.projectId, condition_key: input.key }).delete();
    return;
  }
  await db("project_loading_conditions")
    .insert({
      project_id: input.projectId,
      condition_key: input.key,
      required_fs: input.requiredFs,
      reason: input.reason,
      updated_by: input.userId,
    })
    .onConflict(["project_id", "condition_key"])
    .merge({ required_fs: input.requiredFs, reason: input.reason, updated_by: input.userId, updated_at: db.fn.now() });
}
