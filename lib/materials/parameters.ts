import { z } from "zod";
import {
  impenetrableMaterialSchema,
  mohrCoulombMaterialSchema,
  undrainedMaterialSchema,
  type Material,
} from "@/lib/stability";
import { checkMaterials } from "@/lib/stability/validate-materials";
import type { Issue } from "@/lib/stability";

/**
 * A library material's engineering parameters: the engine's material (docs/engine-io.md) without the
 * id, name and colour, which the library keeps in their own columns. Units: kN/m³, kPa, degrees, m.
 */
const withoutIdentity = { id: true, name: true, color: true } as const;
/**
 * Conductivity for seepage (docs/seepage.md): horizontal k (m/s) and kRatio = kv/kh. The engine's
 * stability schema does not know them, so the library keeps them beside the strengths; a seepage
 * run reads them from here.
 */
const conductivity = {
  k: z.number().positive("k must be a conductivity above 0 m/s").max(1, "k above 1 m/s is not a soil").optional(),
  kRatio: z.number().positive("kv/kh must be above 0").max(1e6).optional(),
};
export const materialParametersSchema = z.discriminatedUnion("model", [
  mohrCoulombMaterialSchema.omit(withoutIdentity).extend(conductivity),
  undrainedMaterialSchema.omit(withoutIdentity).extend(conductivity),
  impenetrableMaterialSchema.omit(withoutIdentity),
]);
export type MaterialParameters = z.infer<typeof materialParametersSchema>;
export type MaterialModel = MaterialParameters["model"];

export const MATERIAL_MODELS: readonly MaterialModel[] = ["mohr-coulomb", "undrained", "impenetrable"];

/** Numeric parameters that can be typed in, or copied from a lab test set. */
export const PARAMETER_KEYS = [
  "gamma",
  "gammaSat",
  "c",
  "phi",
  "su",
  "suGradient",
  "suDatum",
  "cR",
  "phiR",
  "k",
  "kRatio",
] as const;
export type ParameterKey = (typeof PARAMETER_KEYS)[number];

export interface ParameterInfo {
  /** Plain-words name for forms. */
  label: string;
  /** The symbol engineers write. */
  symbol: string;
  unit: string;
}

export const PARAMETER_INFO: Record<ParameterKey, ParameterInfo> = {
  gamma: { label: "Unit weight", symbol: "γ", unit: "kN/m³" },
  gammaSat: { label: "Saturated unit weight", symbol: "γsat", unit: "kN/m³" },
  c: { label: "Effective cohesion", symbol: "c′", unit: "kPa" },
  phi: { label: "Effective friction angle", symbol: "φ′", unit: "°" },
  su: { label: "Undrained shear strength", symbol: "su", unit: "kPa" },
  suGradient: { label: "Increase of su per metre of depth", symbol: "su gradient", unit: "kPa/m" },
  suDatum: { label: "Elevation where su applies", symbol: "su datum", unit: "m" },
  // The total-stress (R) envelope from CU tests, for the staged rapid-drawdown method (docs/engine.md §7(b)).
  cR: { label: "R-envelope intercept (staged drawdown)", symbol: "cR", unit: "kPa" },
  phiR: { label: "R-envelope angle (staged drawdown)", symbol: "φR", unit: "°" },
  k: { label: "Hydraulic conductivity, horizontal", symbol: "kh", unit: "m/s" },
  kRatio: { label: "Anisotropy kv/kh", symbol: "kv/kh", unit: "–" },
};

/** Which numeric parameters each model keeps (the engine's schema; su on Mohr–Coulomb is for end of construction). */
export const MODEL_PARAMETERS: Record<MaterialModel, readonly ParameterKey[]> = {
  "mohr-coulomb": ["gamma", "gammaSat", "c", "phi", "su", "suGradient", "suDatum", "cR", "phiR", "k", "kRatio"],
  undrained: ["gamma", "gammaSat", "su", "suGradient", "suDatum", "k", "kRatio"],
  impenetrable: ["gamma"],
};

// The model names live with every other code-to-words mapping, in lib/vocabulary.ts.
export { MODEL_LABELS } from "@/lib/vocabulary";

/** The value of a numeric parameter, or undefined when the model lacks it or it is unset. */
export function parameterValue(p: MaterialParameters, key: ParameterKey): number | undefined {
  const value = (p as Partial<Record<ParameterKey, unknown>>)[key];
  return typeof value === "number" ? value : undefined;
}

export interface ParameterCheck {
  /** Keyed `parameters.<name>`, the shape forms read; empty when the parameters may be saved. */
  errors: Record<string, string[]>;
  warnings: Issue[];
}

/**
 * Checks parameters against the engine's own material bounds (docs/engine.md §1, through
 * lib/stability's checkMaterials), so the library never holds a material a run would refuse.
 * @param key the material key, used in the messages
 */
export function checkMaterialParameters(key: string, parameters: MaterialParameters, gammaW = 9.81): ParameterCheck {
  const errors: Issue[] = [];
  const warnings: Issue[] = [];
  const material = { ...parameters, id: key } as Material;
  checkMaterials([material], gammaW, errors, warnings);
  const fields: Record<string, string[]> = {};
  for (const e of errors) (fields[e.path.replace(/^materials\[0\]/, "parameters")] ??= []).push(e.message);
  return {
    errors: fields,
    warnings: warnings.map((w) => ({ ...w, path: w.path.replace(/^materials\[0\]/, "parameters") })),
  };
}
