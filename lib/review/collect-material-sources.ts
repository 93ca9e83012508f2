import "server-only";
import type { SectionDocument } from "@/lib/stability";
import { fetchMaterialsOfProject } from "@/db/queries/materials";
import { fetchLabTestSetsOfProject } from "@/db/queries/lab-tests";
import { buildMaterialSources, type MaterialSourceRecord } from "./material-sources";

/** The sources of a run's materials as the project's library gives them now. */
export async function collectMaterialSources(
  projectId: number,
  document: SectionDocument,
): Promise<MaterialSourceRecord[]> {
  const [library, sets] = await Promise.all([fetchMaterialsOfProject(projectId), fetchLabTestSetsOfProject(projectId)]);
  return buildMaterialSources(
    document.materials,
    library,
    sets.map((s) => ({ id: s.id, name: s.name, kind: s.kind })),
  );
}
