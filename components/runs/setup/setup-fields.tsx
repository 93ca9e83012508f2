"use client";

import type { UseFormReturn } from "react-hook-form";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { LOADING_CONDITIONS } from "@/lib/analysis/required-fs";
import type { RunSetupInput } from "@/components/runs/setup/form-values";

type SetupForm = UseFormReturn<RunSetupInput, unknown, RunSetup>;

function Num({
  form,
  name,
  label,
  unit,
  step = "any",
}: {
  form: SetupForm;
  name: string;
  label: string;
  unit?: string;
  step?: string;
}) {
  const error = name
    .split(".")
    .reduce<unknown>((o, k) => (o as Record<string, unknown> | undefined)?.[k], form.formState.errors) as
    { message?: string } | undefined;
  const id = `f-${name.replace(/\./g, "-")}`;
  return (
    <div>
      <label className="label" htmlFor={id}>
        {label}
        {unit ? <span className="normal-case text-ink-faint"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        type="number"
        step={step}
        className="field tabular-nums"
        {...form.register(name as never, { valueAsNumber: true })}
      />
      {error?.message ? <p className="field-error">{error.message}</p> : null}
    </div>
  );
}

export function ConditionFields({
  form,
  onCondition,
  children,
}: {
  form: SetupForm;
  onCondition: (key: string) => void;
  /** The water condition field, placed under the loading condition it follows. */
  children?: React.ReactNode;
}) {
  const condition = form.watch("condition");
  const isDrawdown = LOADING_CONDITIONS.find((c) => c.key === condition)?.engineCase === "drawdown";
  return (
    <fieldset className="space-y-3">
      <legend className="mb-1 text-sm font-semibold">Loading condition</legend>
      <select
        className="field"
        aria-label="Loading condition"
        {...form.register("condition", { onChange: (e) => onCondition(e.target.value) })}
      >
        {LOADING_CONDITIONS.map((c) => (
          <option key={c.key} value={c.key}>
            {c.label}
          </option>
        ))}
      </select>
      {children}
      <div className="flex gap-4 text-sm" role="radiogroup" aria-label="Face checked">
        {(["upstream", "downstream"] as const).map((f) => (
          <label key={f} className="inline-flex items-center gap-1.5">
            <input type="radio" value={f} {...form.register("face")} />{" "}
            {f === "upstream" ? "Upstream face" : "Downstream face"}
          </label>
        ))}
      </div>
      {isDrawdown ? (
        <div className="grid grid-cols-2 gap-2">
          <Num form={form} name="drawdownFrom" label="Pool before" unit="m" />
          <Num form={form} name="drawdownTo" label="Pool after" unit="m" />
          <div className="col-span-2">
            <label className="label" htmlFor="f-drawdownMethod">
              Drawdown method
            </label>
            <select id="f-drawdownMethod" className="field" {...form.register("drawdownMethod")}>
              <option value="effective">Effective stress, pore pressures held (simple)</option>
              <option value="staged">Staged total stress (three stages, R envelope)</option>
            </select>
          </div>
        </div>
      ) : null}
      <Num form={form} name="requiredFs" label="Required FS" step="0.05" />
    </fieldset>
  );
}

export function MethodFields({ form }: { form: SetupForm }) {
  const chosen = form.watch("methods");
  const mp = Array.isArray(chosen) ? chosen.includes("morgenstern-price") : chosen === "morgenstern-price";
  return (
    <fieldset className="space-y-3">
      <legend className="mb-1 text-sm font-semibold">Methods</legend>
      <div className="flex flex-col gap-1 text-sm">
        <label className="inline-flex items-center gap-1.5">
          <input type="checkbox" value="bishop" {...form.register("methods")} /> Bishop&apos;s simplified method
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input type="checkbox" value="fellenius" {...form.register("methods")} /> Ordinary method of slices
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input type="checkbox" value="spencer" {...form.register("methods")} /> Spencer&apos;s method
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input type="checkbox" value="morgenstern-price" {...form.register("methods")} /> Morgenstern–Price
        </label>
        <p className="text-xs text-ink-faint">
          Spencer and Morgenstern–Price satisfy force and moment equilibrium; they are solved on the critical circle and
          on a surface you draw.
        </p>
        {form.formState.errors.methods?.message ? (
          <p className="field-error">{form.formState.errors.methods.message}</p>
        ) : null}
      </div>
      {mp ? (
        <div>
          <label className="label" htmlFor="f-interslice">
            Morgenstern–Price interslice function
          </label>
          <select id="f-interslice" className="field" {...form.register("interslice")}>
            <option value="half-sine">Half-sine, f(x) = sin(πx′)</option>
            <option value="constant">Constant, f(x) = 1</option>
          </select>
        </div>
      ) : null}
      <div className="flex flex-col gap-1 text-sm" role="radiogroup" aria-label="Slip surfaces searched">
        <span className="label">Slip surfaces searched</span>
        <label className="inline-flex items-center gap-1.5">
          <input type="radio" value="circles" {...form.register("search")} /> Circles on the grid of centres
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input type="radio" value="surfaces" {...form.register("search")} /> Circles, then surfaces of any shape
        </label>
        {form.formState.errors.search?.message ? (
          <p className="field-error">{form.formState.errors.search.message}</p>
        ) : null}
      </div>
      <div className="grid grid-cols-2 gap-2">
        <Num form={form} name="slices" label="Slices" step="1" />
        <div>
          <label className="label" htmlFor="f-ordinaryForm">
            Ordinary form
          </label>
          <select id="f-ordinaryForm" className="field" {...form.register("ordinaryForm")}>
            <option value="classical">Classical (N − u·l)</option>
            <option value="effective-weight">Effective weight</option>
          </select>
        </div>
      </div>
    </fieldset>
  );
}

export function GridFields({ form, onSuggest }: { form: SetupForm; onSuggest: () => void }) {
  const mode = form.watch("radiusMode");
  return (
    <fieldset className="space-y-3">
      <legend className="mb-1 flex w-full items-center justify-between text-sm font-semibold">
        Trial centres and radii
        <button type="button" className="text-xs font-normal text-clay-600 hover:underline" onClick={onSuggest}>
          Place for this face
        </button>
      </legend>
      <div className="grid grid-cols-2 gap-2">
        <Num form={form} name="grid.x1" label="Left x" unit="m" />
        <Num form={form} name="grid.x2" label="Right x" unit="m" />
        <Num form={form} name="grid.y1" label="Bottom y" unit="m" />
        <Num form={form} name="grid.y2" label="Top y" unit="m" />
        <Num form={form} name="grid.nx" label="Columns" step="1" />
        <Num form={form} name="grid.ny" label="Rows" step="1" />
      </div>
      {form.formState.errors.grid?.message || form.formState.errors.grid?.root?.message ? (
        <p className="field-error">
          {form.formState.errors.grid?.message ?? form.formState.errors.grid?.root?.message}
        </p>
      ) : null}
      <div className="flex gap-4 text-sm" role="radiogroup" aria-label="Radius set">
        <label className="inline-flex items-center gap-1.5">
          <input type="radio" value="tangent" {...form.register("radiusMode")} /> Tangent elevations
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input type="radio" value="range" {...form.register("radiusMode")} /> Radius range
        </label>
      </div>
      {mode === "tangent" ? (
        <div className="grid grid-cols-3 gap-2">
          <Num form={form} name="tangentY1" label="Upper" unit="m" />
          <Num form={form} name="tangentY2" label="Lower" unit="m" />
          <Num form={form} name="radiusCount" label="Count" step="1" />
        </div>
      ) : (
        <div className="grid grid-cols-3 gap-2">
          <Num form={form} name="r1" label="Smallest" unit="m" />
          <Num form={form} name="r2" label="Largest" unit="m" />
          <Num form={form} name="radiusCount" label="Count" step="1" />
        </div>
      )}
      <label className="inline-flex items-center gap-1.5 text-sm">
        <input type="checkbox" {...form.register("refine")} /> Refine around the best centres
      </label>
    </fieldset>
  );
}
