/**
 * The server's read of what a seepage run needs beyond the section: the project library's
 * conductivities and the condition's saved seepage settings (server only: it reads the database).
 */
import { fetchMaterialsOfProject } from "@/db/queries/materials";
import { fetchSeepageSettings } from "@/db/queries/section-seepage";
import { conductivitiesOf } from "@/lib/section-seepage/conductivities";
import { waterConditionsOf } from "@/lib/sections/water-conditions";
import type { SectionDocument } from "@/lib/stability";
import type { SeepageInputs } from "./attach";

export async function loadSeepageInputs(
  projectId: number,
  sectionId: number,
  waterConditionId: string,
): Promise<SeepageInputs> {
  const conductivities = conductivitiesOf(await fetchMaterialsOfProject(projectId));
  return { conductivities, settings: await fetchSeepageSettings(sectionId, waterConditionId) };
}

/** The seepage inputs of every water condition of a section, keyed by condition id (for the run form). */
export async function loadSeepageInputsByCondition(
  projectId: number,
  sectionId: number,
  section: SectionDocument,
): Promise<Record<string, SeepageInputs>> {
  const conductivities = conductivitiesOf(await fetchMaterialsOfProject(projectId));
  const out: Record<string, SeepageInputs> = {};
  for (const c of waterConditionsOf(section))
    out[c.id] = { conductivities, settings: await fetchSeepageSettings(sectionId, c.id) };
  return out;
}
