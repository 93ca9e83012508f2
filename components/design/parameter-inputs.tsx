"use client";

import { NUMBER_FIELDS, type FormValues, type NumberField } from "@/lib/design";
import { FieldError } from "@/components/ui/form-message";

export interface LibraryEntry {
  key: string;
  name: string;
  model: string;
  color: string;
}

interface InputProps {
  values: FormValues;
  errors: Record<string, string[]>;
  onChange: (key: string, value: string) => void;
}

const fieldId = (key: string) => `design-${key.replace(/\./g, "-")}`;

/** A numeric parameter with its unit in the label, and the schema's message under it. */
export function NumberInput({
  name,
  values,
  errors,
  onChange,
  step = "any",
}: InputProps & { name: NumberField; step?: string }) {
  const info = NUMBER_FIELDS[name];
  const id = fieldId(name);
  const messages = errors[name];
  return (
    <div>
      <label className="label" htmlFor={id}>
        {info.label} ({info.unit})
      </label>
      <input
        id={id}
        className="field"
        inputMode="decimal"
        value={values[name] ?? ""}
        step={step}
        aria-invalid={messages ? true : undefined}
        aria-describedby={messages ? `${id}-error` : undefined}
        onChange={(e) => onChange(name, e.target.value)}
      />
      <FieldError messages={messages} id={`${id}-error`} />
    </div>
  );
}

/** A material of the project's library for one role of the embankment. */
export function MaterialSelect({
  name,
  label,
  values,
  errors,
  onChange,
  library,
  allowRigid = false,
}: InputProps & { name: string; label: string; library: LibraryEntry[]; allowRigid?: boolean }) {
  const id = fieldId(name);
  const messages = errors[name];
  const options = library.filter((m) => allowRigid || m.model !== "impenetrable");
  return (
    <div>
      <label className="label" htmlFor={id}>
        {label}
      </label>
      <select
        id={id}
        className="field"
        value={values[name] ?? ""}
        onChange={(e) => onChange(name, e.target.value)}
        aria-describedby={messages ? `${id}-error` : undefined}
      >
        {values[name] && !options.some((m) => m.key === values[name]) ? (
          <option value={values[name]}>{values[name]} (not in the library)</option>
        ) : null}
        {options.map((m) => (
          <option key={m.key} value={m.key}>
            {m.name} ({m.key})
          </option>
        ))}
      </select>
      <FieldError messages={messages} id={`${id}-error`} />
    </div>
  );
}

export function CheckInput({
  name,
  label,
  values,
  onChange,
}: Omit<InputProps, "errors"> & { name: string; label: string }) {
  return (
    <label className="inline-flex items-center gap-2 text-sm">
      <input
        type="checkbox"
        checked={values[name] === "on"}
        onChange={(e) => onChange(name, e.target.checked ? "on" : "")}
      />
      {label}
    </label>
  );
}

/** A titled group of inputs, laid out in a responsive grid. */
export function FieldGroup({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <fieldset className="space-y-2">
      <legend className="mb-1 text-sm font-semibold">{title}</legend>
      <div className="grid grid-cols-2 gap-3 md:grid-cols-3">{children}</div>
    </fieldset>
  );
}
