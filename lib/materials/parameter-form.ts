import { parseDecimal } from "@/lib/section-io";
import {
  MODEL_PARAMETERS,
  PARAMETER_INFO,
  PARAMETER_KEYS,
  parameterValue,
  type MaterialModel,
  type MaterialParameters,
  type ParameterKey,
} from "./parameters";

/** What a parameters form holds: numbers as typed, so a half-typed "12." is not lost. */
export type ParameterFormValues = { model: MaterialModel; freeDraining: boolean } & Record<ParameterKey, string>;

export const EMPTY_PARAMETER_FORM: ParameterFormValues = {
  model: "mohr-coulomb",
  freeDraining: false,
  gamma: "",
  gammaSat: "",
  c: "",
  phi: "",
  su: "",
  suGradient: "",
  suDatum: "",
  cR: "",
  phiR: "",
  k: "",
  kRatio: "",
};

/** The form's values for stored parameters. */
export function formValuesFrom(p: MaterialParameters): ParameterFormValues {
  const values = {
    ...EMPTY_PARAMETER_FORM,
    model: p.model,
    freeDraining: "freeDraining" in p && p.freeDraining === true,
  };
  for (const key of PARAMETER_KEYS) {
    const v = parameterValue(p, key);
    values[key] = v === undefined ? "" : String(v);
  }
  return values;
}

export type ParametersFromForm =
  { ok: true; parameters: MaterialParameters } | { ok: false; fields: Record<string, string[]> };

/**
 * Parameters from the form: only the model's own fields, blanks left out, numbers strict
 * (a decimal comma is refused with the fix). Bounds are the server's job (checkMaterialParameters).
 */
export function parametersFromForm(values: ParameterFormValues): ParametersFromForm {
  const fields: Record<string, string[]> = {};
  const out: Record<string, unknown> = { model: values.model };
  for (const key of MODEL_PARAMETERS[values.model]) {
    const text = values[key].trim();
    if (text === "") continue;
    const n = parseDecimal(text);
    if (n.ok) out[key] = n.value;
    else fields[`parameters.${key}`] = [`${PARAMETER_INFO[key].symbol}: ${n.message}`];
  }
  if (values.model !== "impenetrable" && values.freeDraining) out.freeDraining = true;
  if (Object.keys(fields).length > 0) return { ok: false, fields };
  return { ok: true, parameters: out as MaterialParameters };
}

// Number formats live in the one formatting module.
export { formatScientific, formatValue } from "@/lib/format";
