/**
 * Where each material of a run got its values, frozen with the run when it is submitted, so the
 * report still says what the reviewer saw after the library changes.
 * A library source counts only while the library value equals the value the run analysed.
 */
import type { Material } from "@/lib/stability";
import { LAB_KIND_INFO, type LabTestKind } from "@/lib/materials/lab-kinds";
import { MODEL_PARAMETERS, PARAMETER_INFO, parameterValue, type MaterialParameters } from "@/lib/materials/parameters";
import type { ParameterSources } from "@/lib/materials/sources";

export interface ParameterSourceLine {
  symbol: string;
  value: number;
  unit: string;
  /** e.g. "Direct shear (shear box) set 'Fill, box tests 2024' (#3)"; null when typed in. */
  source: string | null;
}

export interface MaterialSourceRecord {
  key: string;
  name: string;
  model: string;
  notes: string;
  inLibrary: boolean;
  parameters: ParameterSourceLine[];
}

export interface LibraryEntry {
  key: string;
  name: string;
  notes: string;
  parameters: MaterialParameters;
  sources: ParameterSources;
}

export interface LabSetName {
  id: number;
  name: string;
  kind: LabTestKind;
}

export function buildMaterialSources(
  materials: readonly Material[],
  library: readonly LibraryEntry[],
  sets: readonly LabSetName[],
): MaterialSourceRecord[] {
  return materials.map((m) => {
    const lib = library.find((l) => l.key === m.id);
    const asParams = m as unknown as MaterialParameters;
    const parameters: ParameterSourceLine[] = [];
    for (const key of MODEL_PARAMETERS[m.model]) {
      const value = parameterValue(asParams, key);
      if (value === undefined) continue;
      const setId = lib && parameterValue(lib.parameters, key) === value ? lib.sources[key] : undefined;
      const set = setId !== undefined ? sets.find((s) => s.id === setId) : undefined;
      parameters.push({
        symbol: PARAMETER_INFO[key].symbol,
        value,
        unit: PARAMETER_INFO[key].unit,
        source: set ? `${LAB_KIND_INFO[set.kind].label} set '${set.name}' (#${set.id})` : null,
      });
    }
    return {
      key: m.id,
      name: m.name ?? lib?.name ?? m.id,
      model: m.model,
      notes: lib?.notes ?? "",
      inLibrary: Boolean(lib),
      parameters,
    };
  });
}
