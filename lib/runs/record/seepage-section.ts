/**
 * The section a run on seepage water is computed from: the stored version with its water
 * condition's seepage block and the library's conductivities attached (lib/seepage-stability/
 * attach.ts). Any other run gets the version as stored. A section that cannot be solved (a
 * material without k) is a 400 that names the material, and nothing is kept.
 */
import { ApiError } from "@/lib/api/errors";
import { waterConditionForRun, type RunSetup } from "@/lib/analysis/run-setup";
import { attachSeepage } from "@/lib/seepage-stability";
import { loadSeepageInputs } from "@/lib/seepage-stability/load-inputs";
import type { SectionDocument } from "@/lib/stability";

export async function sectionForSeepageRun(
  projectId: number,
  sectionId: number,
  section: SectionDocument,
  setup: RunSetup,
): Promise<SectionDocument> {
  if (setup.waterSource !== "seepage") return section;
  let condition;
  try {
    condition = waterConditionForRun(section, setup);
  } catch {
    // The record's own check reports an unknown water condition with its field.
    return section;
  }
  const attached = attachSeepage(section, condition, await loadSeepageInputs(projectId, sectionId, condition.id));
  if (attached.ok) return attached.section;
  throw new ApiError(400, "invalid_seepage", "The seepage of this water condition cannot be solved.", {
    "setup.waterSource": attached.errors.map((e) => e.message),
  });
}
