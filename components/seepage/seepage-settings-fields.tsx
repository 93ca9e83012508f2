"use client";

import type { Pool } from "@/lib/seepage";
import type { SeepageSettingsForm } from "@/lib/section-seepage/settings-form";
import { FieldError } from "@/components/ui/form-message";

function Num({
  id,
  label,
  unit,
  value,
  onChange,
  messages,
  hint,
}: {
  id: string;
  label: string;
  unit: string;
  value: string;
  onChange: (v: string) => void;
  messages?: string[];
  hint?: string;
}) {
  return (
    <div>
      <label className="label normal-case" htmlFor={id}>
        {label}
      </label>
      <div className="flex items-center gap-1.5">
        <input
          id={id}
          className="field w-28"
          inputMode="decimal"
          value={value}
          onChange={(e) => onChange(e.target.value)}
        />
        <span className="text-xs text-ink-faint">{unit}</span>
      </div>
      {hint ? <p className="mt-0.5 text-xs text-ink-faint">{hint}</p> : null}
      <FieldError messages={messages} />
    </div>
  );
}

const levelText = (v: number | null) => (v === null ? "none" : `${v.toFixed(2)} m`);

/** Pool levels, drains by coordinates, the element size, the crest length, the head drops and a tailwater. */
export function SeepageSettingsFields({
  form,
  onChange,
  fields,
  pools,
  conditionPools,
}: {
  form: SeepageSettingsForm;
  onChange: (f: SeepageSettingsForm) => void;
  fields: Record<string, string[]>;
  pools: Pool[];
  /** The water condition's own pool levels, shown as what a blank field keeps. */
  conditionPools: { left: number | null; right: number | null };
}) {
  const set = <K extends keyof SeepageSettingsForm>(k: K, v: SeepageSettingsForm[K]) => onChange({ ...form, [k]: v });
  return (
    <fieldset className="panel grid gap-4 p-4 lg:grid-cols-[2fr_3fr]">
      <legend className="px-1 text-sm font-semibold">Water and mesh</legend>
      <div className="space-y-2 text-sm">
        <p className="text-ink-soft" data-testid="seepage-pools">
          Pools:{" "}
          {pools.length === 0
            ? "none"
            : pools.map((p) => `${p.side === "left" ? "left" : "right"} edge at ${p.level.toFixed(2)} m`).join(", ")}
          . Type a level below or drag a pool’s mark on the drawing.
        </p>
        <div className="grid grid-cols-2 gap-3">
          <Num
            id="seepage-pool-left"
            label="Pool level, left edge"
            unit="m"
            value={form.poolLeft}
            onChange={(v) => set("poolLeft", v)}
            messages={fields.poolLeft ?? fields.pools}
            hint={`Blank: the water condition's (${levelText(conditionPools.left)}).`}
          />
          <Num
            id="seepage-pool-right"
            label="Pool level, right edge"
            unit="m"
            value={form.poolRight}
            onChange={(v) => set("poolRight", v)}
            messages={fields.poolRight}
            hint={`Blank: the water condition's (${levelText(conditionPools.right)}).`}
          />
        </div>
        <div>
          <label className="label normal-case" htmlFor="seepage-drains">
            Drains (atmospheric pressure): one per line, points as “x y” separated by “;” (m)
          </label>
          <textarea
            id="seepage-drains"
            className="field h-24 font-mono text-xs"
            value={form.drains}
            onChange={(e) => set("drains", e.target.value)}
          />
          <FieldError messages={fields.drains} />
        </div>
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        <Num
          id="seepage-mesh-size"
          label="Element size"
          unit="m"
          value={form.meshSize}
          onChange={(v) => set("meshSize", v)}
          messages={fields.meshSize}
          hint="Blank: about 3,000 nodes."
        />
        <Num
          id="seepage-crest-length"
          label="Crest length"
          unit="m"
          value={form.crestLength}
          onChange={(v) => set("crestLength", v)}
          messages={fields.crestLength}
        />
        <Num
          id="seepage-head-drops"
          label="Head drops Nd"
          unit="–"
          value={form.headDrops}
          onChange={(v) => set("headDrops", v)}
          messages={fields.headDrops}
          hint="Blank: 12."
        />
        <div>
          <label className="label normal-case" htmlFor="seepage-tailwater-side">
            Tailwater on a dry side
          </label>
          <select
            id="seepage-tailwater-side"
            className="field w-auto"
            value={form.tailwaterSide}
            onChange={(e) => set("tailwaterSide", e.target.value as SeepageSettingsForm["tailwaterSide"])}
          >
            <option value="">None</option>
            <option value="left">Left edge</option>
            <option value="right">Right edge</option>
          </select>
        </div>
        <Num
          id="seepage-tailwater-level"
          label="Tailwater level"
          unit="m"
          value={form.tailwaterLevel}
          onChange={(v) => set("tailwaterLevel", v)}
          messages={fields.tailwaterLevel}
        />
      </div>
    </fieldset>
  );
}
