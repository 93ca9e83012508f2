import type { MaterialParameters } from "./parameters";
import type { ParameterSources } from "./sources";

// A material of a project's library (db/queries/materials.ts reads and writes it).

/** A material of a project's library; `sources` maps a parameter to the lab test set it came from. */
export interface LibraryMaterial {
  id: number;
  projectId: number;
  key: string;
  name: string;
  color: string;
  parameters: MaterialParameters;
  sources: ParameterSources;
  notes: string;
  updatedAt: string;
  updatedByName: string;
  labTestCount: number;
}

export interface NewMaterial {
  key: string;
  name: string;
  color: string;
  notes: string;
  parameters: MaterialParameters;
  sources?: ParameterSources;
}
