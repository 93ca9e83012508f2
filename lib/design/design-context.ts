// Server-only: reads the project's library, required FS and lab tests through db/queries, so it is not
// exported from lib/design/index.ts (which the browser bundles).
import { fetchLabTestSetsOfProject } from "@/db/queries/lab-tests";
import { fetchRequiredFsMap } from "@/db/queries/loading-conditions";
import { fetchMaterialsOfProject } from "@/db/queries/materials";
import type { CompactionResult } from "@/lib/lab/compaction";
import { toEngineMaterial } from "@/lib/materials/engine-material";
import type { Material } from "@/lib/stability";
import type { RequiredFs } from "./pick-ratio";
import { requiredFsForSweep } from "./sweep-results";

export interface CompactionSource {
  materialKey: string;
  setName: string;
  result: CompactionResult;
}

export interface DesignContext {
  /** The library as engine materials (ids are the library keys), with each key's model and name. */
  materials: Material[];
  library: { key: string; name: string; model: string; color: string }[];
  required: RequiredFs;
  /** The latest compaction set of each material that has one. */
  compaction: CompactionSource[];
}

/** What a design study needs from its project: materials, required FS and compaction results. */
export async function fetchDesignContext(projectId: number): Promise<DesignContext> {
  const [library, fsMap, sets] = await Promise.all([
    fetchMaterialsOfProject(projectId),
    fetchRequiredFsMap(projectId),
    fetchLabTestSetsOfProject(projectId),
  ]);
  const keyOf = new Map(library.map((m) => [m.id, m.key]));
  const compaction = new Map<string, CompactionSource>();
  for (const set of sets) {
    const key = set.materialId === null ? undefined : keyOf.get(set.materialId);
    if (set.kind === "compaction" && key)
      compaction.set(key, { materialKey: key, setName: set.name, result: set.result });
  }
  return {
    materials: library.map(toEngineMaterial),
    library: library.map((m) => ({ key: m.key, name: m.name, model: m.parameters.model, color: m.color })),
    required: requiredFsForSweep(fsMap),
    compaction: [...compaction.values()],
  };
}
