import type { Knex } from "knex";
import { getDb } from "../index";
import {
  EMPTY_SEEPAGE_SETTINGS,
  seepageSettingsInputSchema,
  type SeepageSettingsInput,
} from "../../lib/section-seepage/types";

/** The saved seepage settings of a section under one water condition, or the empty ones. */
export async function fetchSeepageSettings(
  sectionId: number,
  waterConditionId: string,
  db: Knex = getDb(),
): Promise<SeepageSettingsInput> {
  const row = await db("section_seepage")
    .where({ section_id: sectionId, water_condition_id: waterConditionId })
    .first();
  if (!row) return EMPTY_SEEPAGE_SETTINGS;
  // Stored rows passed the same schema when saved; parsing again keeps old rows readable if it grows.
  const parsed = seepageSettingsInputSchema.safeParse(JSON.parse(row.settings as string));
  return parsed.success ? parsed.data : EMPTY_SEEPAGE_SETTINGS;
}

/** Saves (inserts or replaces) the settings of a section under one water condition. */
export async function saveSeepageSettings(
  input: { sectionId: number; waterConditionId: string; settings: SeepageSettingsInput; userId: number },
  db: Knex = getDb(),
): Promise<void> {
  await db("section_seepage")
    .insert({
      section_id: input.sectionId,
      water_condition_id: input.waterConditionId,
      settings: JSON.stringify(input.settings),
      updated_by: input.userId,
    })
    .onConflict(["section_id", "water_condition_id"])
    .merge({ settings: JSON.stringify(input.settings), updated_by: input.userId, updated_at: db.fn.now() });
}
