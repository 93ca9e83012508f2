import { MATERIAL_MODELS, MODEL_LABELS, MODEL_PARAMETERS, PARAMETER_INFO } from "@/lib/materials/parameters";
import type { ParameterFormValues } from "@/lib/materials/parameter-form";
import type { ParameterSources } from "@/lib/materials/sources";
import type { MaterialModel } from "@/lib/materials/parameters";
import { FieldError } from "@/components/ui/form-message";
import { SourceBadge } from "./source-badge";

export interface ParameterFieldsProps {
  idPrefix: string;
  values: ParameterFormValues;
  onChange: (values: ParameterFormValues) => void;
  fields: Record<string, string[]>;
  sources?: ParameterSources;
  disabled?: boolean;
}

/** The model picker and one input per parameter of that model, each with its unit beside it. */
export function ParameterFields({
  idPrefix,
  values,
  onChange,
  fields,
  sources = {},
  disabled = false,
}: ParameterFieldsProps) {
  const model = values.model;
  return (
    <fieldset className="space-y-3" disabled={disabled}>
      <div>
        <label className="label" htmlFor={`${idPrefix}-model`}>
          Strength model
        </label>
        <select
          id={`${idPrefix}-model`}
          className="field"
          value={model}
          onChange={(e) => onChange({ ...values, model: e.target.value as MaterialModel })}
        >
          {MATERIAL_MODELS.map((m) => (
            <option key={m} value={m}>
              {MODEL_LABELS[m]}
            </option>
          ))}
        </select>
        <FieldError messages={fields["parameters.model"]} />
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        {MODEL_PARAMETERS[model].map((key) => {
          const info = PARAMETER_INFO[key];
          const id = `${idPrefix}-${key}`;
          const optional =
            key === "gammaSat" || key.startsWith("su")
              ? model === "undrained" && key === "su"
                ? ""
                : " (optional)"
              : "";
          return (
            <div key={key}>
              <label className="label normal-case" htmlFor={id}>
                {info.label}
                {optional} <span className="text-ink-faint">{info.symbol}</span>
                <SourceBadge setId={sources[key]} />
              </label>
              <div className="flex items-center gap-1.5">
                <input
                  id={id}
                  name={key}
                  className="field"
                  inputMode="decimal"
                  value={values[key]}
                  onChange={(e) => onChange({ ...values, [key]: e.target.value })}
                />
                <span className="w-12 shrink-0 text-xs text-ink-faint">{info.unit}</span>
              </div>
              <FieldError messages={fields[`parameters.${key}`] ?? fields[`sources.${key}`]} />
            </div>
          );
        })}
      </div>
      {model === "mohr-coulomb" ? (
        <p className="text-xs text-ink-faint">
          An su on a drained material is used only for the end of construction check.
        </p>
      ) : null}
      {model !== "impenetrable" ? (
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={values.freeDraining}
            onChange={(e) => onChange({ ...values, freeDraining: e.target.checked })}
          />
          Drains freely (keeps its drained strength at end of construction and in drawdown)
        </label>
      ) : null}
    </fieldset>
  );
}
