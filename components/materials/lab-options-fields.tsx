import type { LabTestKind } from "@/lib/materials/lab-kinds";
import type { LabOptions } from "@/lib/materials/lab-rows";
import type { TableProblem } from "@/lib/materials/problem-keys";
import { FieldError } from "@/components/ui/form-message";
import { BJERRUM_SOURCE, PERMEABILITY_SOURCE } from "@/lib/lab";

export interface LabOptionsFieldsProps {
  kind: LabTestKind;
  options: LabOptions;
  onChange: (options: LabOptions) => void;
  problems: readonly TableProblem[];
}

function NumberSetting({
  id,
  label,
  unit,
  value,
  onChange,
  messages,
}: {
  id: string;
  label: string;
  unit: string;
  value: string;
  onChange: (v: string) => void;
  messages?: string[];
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
      <FieldError messages={messages} />
    </div>
  );
}

/** The settings of each kind: forcing c' = 0, the stress space, the su model, Gs and the acceptance percentage. */
export function LabOptionsFields({ kind, options, onChange, problems }: LabOptionsFieldsProps) {
  const set = <K extends keyof LabOptions>(key: K, value: LabOptions[K]) => onChange({ ...options, [key]: value });
  const messagesOf = (column: string) => {
    const m = problems.filter((p) => p.row === null && p.column === column).map((p) => p.message);
    return m.length ? m : undefined;
  };
  switch (kind) {
    case "direct-shear":
      return (
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={options.zeroCohesion}
            onChange={(e) => set("zeroCohesion", e.target.checked)}
          />
          Force the line through the origin (c&apos; = 0), as for clean sand or gravel
        </label>
      );
    case "triaxial-cu":
      return (
        <div className="flex flex-wrap items-start gap-4">
          <div>
            <label className="label" htmlFor="lab-space">
              Fit the line in
            </label>
            <select
              id="lab-space"
              className="field w-auto"
              value={options.space}
              onChange={(e) => set("space", e.target.value as LabOptions["space"])}
            >
              <option value="p-q">p&apos;–q: p&apos; = (σ1&apos; + 2σ3&apos;)/3, q = σ1 − σ3</option>
              <option value="s-t">s&apos;–t: s&apos; = (σ1&apos; + σ3&apos;)/2, t = (σ1 − σ3)/2</option>
            </select>
          </div>
          <div>
            <NumberSetting
              id="lab-back-pressure"
              label="Back pressure (blank: 0)"
              unit="kPa"
              value={options.backPressure}
              onChange={(v) => set("backPressure", v)}
              messages={messagesOf("backPressure")}
            />
            <p className="mt-1 max-w-xs text-xs text-ink-faint">
              The R envelope (cR, φR, for staged drawdown) takes total-stress circles at failure from σ3c = cell
              pressure − back pressure.
            </p>
          </div>
        </div>
      );
    case "undrained":
      return (
        <div className="grid gap-3 sm:grid-cols-3">
          <div>
            <label className="label" htmlFor="lab-source">
              Tests
            </label>
            <select
              id="lab-source"
              className="field"
              value={options.source}
              onChange={(e) => set("source", e.target.value as LabOptions["source"])}
            >
              <option value="uu">UU triaxial (su = q/2)</option>
              <option value="vane">Field vane (su read directly)</option>
            </select>
          </div>
          <div>
            <label className="label" htmlFor="lab-su-model">
              su taken as
            </label>
            <select
              id="lab-su-model"
              className="field"
              value={options.model}
              onChange={(e) => set("model", e.target.value as LabOptions["model"])}
            >
              <option value="constant">One value (the mean)</option>
              <option value="linear">Rising with depth (a fitted line)</option>
            </select>
          </div>
          <NumberSetting
            id="lab-ground"
            label="Ground elevation (for depths)"
            unit="m"
            value={options.groundElevation}
            onChange={(v) => set("groundElevation", v)}
            messages={messagesOf("groundElevation")}
          />
          {options.model === "linear" ? (
            <NumberSetting
              id="lab-datum"
              label="Datum elevation (blank: ground)"
              unit="m"
              value={options.datumElevation}
              onChange={(v) => set("datumElevation", v)}
              messages={messagesOf("datumElevation")}
            />
          ) : null}
          {options.source === "vane" ? (
            <div>
              <label className="label" htmlFor="lab-vane-correction">
                Correction of vane su
              </label>
              <select
                id="lab-vane-correction"
                className="field"
                value={options.vaneCorrection}
                onChange={(e) => set("vaneCorrection", e.target.value as LabOptions["vaneCorrection"])}
              >
                <option value="none">None: su as measured</option>
                <option value="bjerrum">Bjerrum&apos;s μ from the plasticity index</option>
                <option value="factor">A factor I give</option>
              </select>
            </div>
          ) : null}
          {options.source === "vane" && options.vaneCorrection === "factor" ? (
            <NumberSetting
              id="lab-vane"
              label="Vane correction factor"
              unit="–"
              value={options.vaneCorrectionFactor}
              onChange={(v) => set("vaneCorrectionFactor", v)}
              messages={messagesOf("vaneCorrectionFactor")}
            />
          ) : null}
          {options.source === "vane" && options.vaneCorrection === "bjerrum" ? (
            <div>
              <NumberSetting
                id="lab-vane-pi"
                label="Plasticity index PI of the clay"
                unit="%"
                value={options.vanePlasticityIndex}
                onChange={(v) => set("vanePlasticityIndex", v)}
                messages={messagesOf("vanePlasticityIndex")}
              />
              <p className="mt-1 max-w-xs text-xs text-ink-faint">{BJERRUM_SOURCE}.</p>
            </div>
          ) : null}
        </div>
      );
    case "compaction":
      return (
        <div className="grid gap-3 sm:grid-cols-2">
          <NumberSetting
            id="lab-gs"
            label="Specific gravity of solids Gs"
            unit="–"
            value={options.specificGravity}
            onChange={(v) => set("specificGravity", v)}
            messages={messagesOf("specificGravity")}
          />
          <NumberSetting
            id="lab-acceptance"
            label="Acceptance, share of max. dry density"
            unit="%"
            value={options.acceptancePercent}
            onChange={(v) => set("acceptancePercent", v)}
            messages={messagesOf("acceptancePercent")}
          />
        </div>
      );
    case "permeability": {
      const falling = options.permeabilityMethod === "falling-head";
      return (
        <div className="space-y-3">
          <div>
            <label className="label" htmlFor="lab-permeability-method">
              Test
            </label>
            <select
              id="lab-permeability-method"
              className="field w-auto"
              value={options.permeabilityMethod}
              onChange={(e) => set("permeabilityMethod", e.target.value as LabOptions["permeabilityMethod"])}
            >
              <option value="falling-head">Falling head: k = aL/(At)·ln(h1/h2), for fine soils</option>
              <option value="constant-head">Constant head: k = QL/(Aht), for sands and gravels</option>
            </select>
          </div>
          <div className="grid gap-3 sm:grid-cols-3">
            <NumberSetting
              id="lab-specimen-length"
              label="Specimen length L"
              unit="mm"
              value={options.specimenLength}
              onChange={(v) => set("specimenLength", v)}
              messages={messagesOf("length")}
            />
            <NumberSetting
              id="lab-specimen-diameter"
              label="Specimen diameter D"
              unit="mm"
              value={options.specimenDiameter}
              onChange={(v) => set("specimenDiameter", v)}
              messages={messagesOf("diameter")}
            />
            {falling ? (
              <NumberSetting
                id="lab-standpipe-diameter"
                label="Standpipe diameter d"
                unit="mm"
                value={options.standpipeDiameter}
                onChange={(v) => set("standpipeDiameter", v)}
                messages={messagesOf("standpipeDiameter")}
              />
            ) : null}
          </div>
          <p className="max-w-xl text-xs text-ink-faint">
            {PERMEABILITY_SOURCE}. No temperature correction is applied. The design kh is the geometric mean of the
            readings.
          </p>
        </div>
      );
    }
    case "atterberg":
      return (
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={options.nonPlastic} onChange={(e) => set("nonPlastic", e.target.checked)} />
          The lab reported the sample as non-plastic
        </label>
      );
  }
}
