"use client";

import type { FormValues } from "@/lib/design";
import { CheckInput, FieldGroup, MaterialSelect, NumberInput, type LibraryEntry } from "./parameter-inputs";

export interface ParametersFormProps {
  values: FormValues;
  errors: Record<string, string[]>;
  library: LibraryEntry[];
  onChange: (key: string, value: string) => void;
  disabled?: boolean;
}

/** The embankment's dimensions, materials and water levels, with units on every field. */
export function ParametersForm({ values, errors, library, onChange, disabled }: ParametersFormProps) {
  const io = { values, errors, onChange };
  const zoned = values["zoning.kind"] === "zoned";
  return (
    <fieldset disabled={disabled} className="space-y-5" data-testid="design-parameters">
      <FieldGroup title="Crest and faces">
        <NumberInput name="crestElevation" {...io} />
        <NumberInput name="crestWidth" {...io} />
        <NumberInput name="crestLength" {...io} />
        <NumberInput name="upstreamSlope" {...io} />
        <NumberInput name="downstreamSlope" {...io} />
      </FieldGroup>

      <FieldGroup title="Berms">
        {(["upstream", "downstream"] as const).map((side) => (
          <div key={side} className="col-span-2 grid grid-cols-2 gap-3 md:col-span-3 md:grid-cols-3">
            <div className="flex items-end pb-2">
              <CheckInput name={`${side}Berm.on`} label={`Berm on the ${side} face`} {...io} />
            </div>
            {values[`${side}Berm.on`] === "on" ? (
              <>
                <NumberInput name={`${side}Berm.elevation`} {...io} />
                <NumberInput name={`${side}Berm.width`} {...io} />
              </>
            ) : null}
          </div>
        ))}
      </FieldGroup>

      <FieldGroup title="Fill">
        <div
          className="col-span-2 flex flex-wrap gap-4 text-sm md:col-span-3"
          role="radiogroup"
          aria-label="Fill zoning"
        >
          <label className="inline-flex items-center gap-1.5">
            <input
              type="radio"
              name="zoning"
              checked={!zoned}
              onChange={() => onChange("zoning.kind", "homogeneous")}
            />{" "}
            Homogeneous fill
          </label>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name="zoning" checked={zoned} onChange={() => onChange("zoning.kind", "zoned")} /> Core
            and shells
          </label>
        </div>
        {zoned ? (
          <>
            <MaterialSelect name="zoning.core" label="Core material" library={library} {...io} />
            <MaterialSelect name="zoning.shell" label="Shell material" library={library} {...io} />
            <NumberInput name="zoning.coreTopWidth" {...io} />
            <NumberInput name="zoning.coreSlope" {...io} />
          </>
        ) : (
          <MaterialSelect name="zoning.fill" label="Fill material" library={library} {...io} />
        )}
      </FieldGroup>

      <FieldGroup title="Foundation">
        <NumberInput name="foundationTop" {...io} />
        <NumberInput name="foundationThickness" {...io} />
        <MaterialSelect name="foundationMaterial" label="Foundation material" library={library} {...io} />
        <NumberInput name="baseThickness" {...io} />
        <MaterialSelect name="baseMaterial" label="Base material" library={library} allowRigid {...io} />
        <div className="col-span-2 flex items-end pb-2 md:col-span-1">
          <CheckInput name="foundationImpervious" label="Foundation much less permeable than the fill" {...io} />
        </div>
      </FieldGroup>

      <FieldGroup title="Toe drain">
        <NumberInput name="drainLength" {...io} />
        <NumberInput name="drainThickness" {...io} />
        <MaterialSelect name="drainMaterial" label="Drain material" library={library} {...io} />
      </FieldGroup>

      <FieldGroup title="Water">
        <NumberInput name="normalPool" {...io} />
        <NumberInput name="floodPool" {...io} />
        <NumberInput name="drawdownTo" {...io} />
        <NumberInput name="minFreeboard" {...io} />
        <NumberInput name="fillPermeability" {...io} />
        <NumberInput name="anisotropy" {...io} />
        <NumberInput name="requiredPipingFactor" {...io} />
      </FieldGroup>
    </fieldset>
  );
}
