import { materialsToCsv, type SectionMaterial } from "@/lib/section-io";
import type { Material } from "@/lib/stability";
import type { MaterialParameters } from "./parameters";

/** The parts of a library material that the section document and the CSV carry. */
export interface LibraryMaterialLike {
  key: string;
  name: string;
  color: string;
  parameters: MaterialParameters;
}

/** The material as the section document (docs/engine-io.md) holds it: the key becomes its id. */
export function toEngineMaterial(m: LibraryMaterialLike): Material {
  return { ...m.parameters, id: m.key, name: m.name, color: m.color } as Material;
}

/** The library as a materials CSV (lib/section-io's format, colour included), read back by the import. */
export function libraryToCsv(materials: readonly LibraryMaterialLike[]): string {
  const rows = materials.map((m) => ({ ...m.parameters, id: m.key, color: m.color }) as SectionMaterial);
  return materialsToCsv(rows, Object.fromEntries(materials.map((m) => [m.key, m.name])));
}
