import type { Knex } from "knex";
import { getDb } from "../index";

/**
 * The stored set-up (result.setup) of a section's most recent run, unparsed; null when the
 * section has no run. The caller validates it: runs kept long ago may hold an older shape.
 */
export async function fetchLastRunSetup(projectId: number, sectionId: number, db: Knex = getDb()): Promise<unknown> {
  const row = await db("runs")
    .select("result")
    .where({ project_id: projectId, section_id: sectionId })
    .orderBy("created_at", "desc")
    .orderBy("id", "desc")
    .first();
  if (!row) return null;
  const result = JSON.parse(row.result) as { setup?: unknown };
  return result.setup ?? null;
}
