import type { Knex } from "knex";
import { defaultParamsFor } from "../../lib/design/parameters";

export const DEMO_STUDY_NAME = "Main embankment: face slope options";

/**
 * Stores one design study for the demo project: the demo embankment's dimensions (crest 18.0 m,
 * 6 m wide, 3:1 and 2.5:1 faces, 12 m toe drain, pools 16.0 and 17.0 m) with the project's
 * library materials. No sweep is stored: the designer runs it. Run inside the caller's
 * transaction, after the materials library is seeded.
 */
export async function seedDemoDesign(trx: Knex | Knex.Transaction, projectId: number, userId: number): Promise<number> {
  const library = await trx("materials").where("project_id", projectId).select("key", "parameters");
  const keys = library.map((m: { key: string; parameters: string }) => ({
    key: m.key,
    model: (JSON.parse(m.parameters) as { model: string }).model,
  }));
  const [id] = await trx("design_studies").insert({
    project_id: projectId,
    name: DEMO_STUDY_NAME,
    parameters: JSON.stringify(defaultParamsFor(keys)),
    sweep_results: null,
    created_by: userId,
  });
  return id;
}
