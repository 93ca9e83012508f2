import { LAB_KIND_INFO, type LabTestKind, type LabTestRecord } from "./lab-kinds";
import {
  MODEL_PARAMETERS,
  PARAMETER_INFO,
  PARAMETER_KEYS,
  parameterValue,
  type MaterialParameters,
  type ParameterKey,
} from "./parameters";

/** Which lab test set each parameter came from, e.g. {"c": 12, "phi": 12, "gamma": 14}. */
export type ParameterSources = Partial<Record<ParameterKey, number>>;

/** The lab test kinds that can supply a parameter (the inverse of LAB_KIND_INFO[kind].feeds). */
export function kindsThatFeed(key: ParameterKey): LabTestKind[] {
  return (Object.keys(LAB_KIND_INFO) as LabTestKind[]).filter((k) => LAB_KIND_INFO[k].feeds.includes(key));
}

/**
 * The sources after an edit: a parameter keeps its source only while its value is unchanged (a
 * value typed over a derived one no longer comes from the lab), and `given` sets new ones.
 */
export function mergeSources(
  before: MaterialParameters,
  beforeSources: ParameterSources,
  after: MaterialParameters,
  given: ParameterSources = {},
): ParameterSources {
  const out: ParameterSources = {};
  for (const key of PARAMETER_KEYS) {
    const now = parameterValue(after, key);
    if (now === undefined) continue;
    if (given[key] !== undefined) out[key] = given[key];
    else if (beforeSources[key] !== undefined && parameterValue(before, key) === now) out[key] = beforeSources[key];
  }
  return out;
}

/** A lab test set as far as source checks need it. */
export interface SourceCandidate {
  id: number;
  kind: LabTestKind;
  materialId: number | null;
}

/**
 * Checks claimed sources: the parameter must be set on the material, the set must exist in the
 * project, belong to this material (or to none yet) and be of a kind that yields that parameter.
 * @returns field errors keyed `sources.<parameter>`, empty when all hold.
 */
export function checkSources(
  materialId: number,
  parameters: MaterialParameters,
  given: ParameterSources,
  sets: ReadonlyMap<number, SourceCandidate>,
): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  const add = (key: string, message: string) => (fields[`sources.${key}`] ??= []).push(message);
  for (const [key, setId] of Object.entries(given) as [ParameterKey, number][]) {
    const info = PARAMETER_INFO[key];
    if (!MODEL_PARAMETERS[parameters.model].includes(key) || parameterValue(parameters, key) === undefined) {
      add(key, `${info.symbol} is not set on this ${parameters.model} material, so it cannot have a source.`);
      continue;
    }
    const set = sets.get(setId);
    if (!set) add(key, `Lab test set ${setId} was not found in this project.`);
    else if (set.materialId !== null && set.materialId !== materialId)
      add(key, `Lab test set ${setId} belongs to another material.`);
    else if (!LAB_KIND_INFO[set.kind].feeds.includes(key))
      add(key, `A ${LAB_KIND_INFO[set.kind].label.toLowerCase()} set does not give ${info.symbol}.`);
  }
  return fields;
}

const round = (v: number, step: number) => Math.round(v / step) * step;
const tidy = (v: number, digits: number) => Number(v.toFixed(digits));

/** Values a lab result offers to a material, rounded as a design value is written. */
export interface SuggestedValues {
  label: string;
  values: Partial<Record<ParameterKey, number>>;
  note?: string;
}

const ENVELOPE_LABEL = { c: "c' and φ'", cR: "cR and φR (R envelope, staged drawdown)" } as const;

/** An envelope's intercept and angle as design values (0.1 kPa, 0.1°); a negative intercept becomes 0. */
function envelopeValues(
  e: { cohesion: number; frictionAngle: number },
  cKey: "c" | "cR",
  phiKey: "phi" | "phiR",
): SuggestedValues {
  const c = e.cohesion;
  const symbol = cKey === "c" ? "c'" : "cR";
  return {
    label: ENVELOPE_LABEL[cKey],
    values: { [cKey]: tidy(Math.max(0, round(c, 0.1)), 1), [phiKey]: tidy(round(e.frictionAngle, 0.1), 1) },
    note: c < 0 ? `The fitted ${symbol} is negative (${c.toFixed(1)} kPa); 0 is used.` : undefined,
  };
}

/**
 * What "use these values" copies into a material from a derived result: c', φ' (0.1 kPa, 0.1°);
 * from CU triaxial sets also the R envelope cR, φR;
 * su with its gradient and datum; γ and γsat at the optimum (0.1 kN/m³). Atterberg limits give
 * only a hint, so nothing.
 */
export function suggestedValues(record: LabTestRecord): SuggestedValues[] {
  switch (record.kind) {
    case "direct-shear":
      return [envelopeValues(record.result, "c", "phi")];
    case "triaxial-cu": {
      const r = record.result.totalStress;
      return [envelopeValues(record.result, "c", "phi"), ...(r ? [envelopeValues(r, "cR", "phiR")] : [])];
    }
    case "undrained": {
      const r = record.result;
      if (r.model === "constant") return [{ label: "su", values: { su: tidy(round(r.su, 0.1), 1) } }];
      return [
        {
          label: "su with depth",
          values: {
            su: tidy(round(r.su, 0.1), 1),
            suGradient: tidy(Math.max(0, r.suGradient), 2),
            suDatum: tidy(r.suDatum, 2),
          },
        },
      ];
    }
    case "compaction":
      return [
        {
          label: "γ and γsat",
          values: {
            gamma: tidy(round(record.result.unitWeight, 0.1), 1),
            gammaSat: tidy(round(record.result.saturatedUnitWeight, 0.1), 1),
          },
        },
      ];
    case "atterberg":
      return [];
    case "permeability":
      // Two significant figures: k is seldom known better, and 4.9e-8 reads as the lab wrote it.
      return [{ label: "kh", values: { k: Number(record.result.k.toPrecision(2)) } }];
  }
}
