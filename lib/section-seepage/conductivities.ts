import type { MaterialParameters } from "@/lib/materials/parameters";
import type { ParameterSources } from "@/lib/materials/sources";
import type { MaterialConductivity } from "./types";

/** The conductivities a seepage run takes from the library, with the test set kh came from. */
export function conductivitiesOf(
  library: readonly { key: string; name: string; parameters: MaterialParameters; sources: ParameterSources }[],
): MaterialConductivity[] {
  return library.map((m) => {
    const p = m.parameters as MaterialParameters & { k?: number; kRatio?: number };
    return {
      key: m.key,
      name: m.name,
      ...(p.k !== undefined ? { k: p.k } : {}),
      ...(p.kRatio !== undefined ? { kRatio: p.kRatio } : {}),
      ...(m.sources.k !== undefined ? { sourceSetId: m.sources.k } : {}),
    };
  });
}
