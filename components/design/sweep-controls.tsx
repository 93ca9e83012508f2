"use client";

import { DEFAULT_SWEEP, FINE_SWEEP, sweepRatios, type SweepSettings } from "@/lib/design";
import { FieldError } from "@/components/ui/form-message";
import type { SweepRunState, SweepWhere } from "./use-sweep";
import { countOf } from "@/lib/format";

export interface SweepControlsProps {
  settings: SweepSettings;
  onSettings: (s: SweepSettings) => void;
  errors: Record<string, string[]>;
  where: SweepWhere;
  onWhere: (w: SweepWhere) => void;
  state: SweepRunState;
  onStart: () => void;
  onCancel: () => void;
  disabled: boolean;
  disabledReason: string | null;
}

/** Range of ratios, search density, where to run, the start/cancel button and the progress bar. */
const COARSE_GRID_NOTE =
  " This modest grid is for comparing ratios; open the chosen point as a run and refine it before relying on its FS.";

export function SweepControls({
  settings,
  onSettings,
  errors,
  where,
  onWhere,
  state,
  onStart,
  onCancel,
  disabled,
  disabledReason,
}: SweepControlsProps) {
  const running = state.status === "running";
  const fine = settings.nx === FINE_SWEEP.nx && settings.refine;
  const num = (key: "from" | "to" | "step", label: string) => (
    <div>
      <label className="label" htmlFor={`sweep-${key}`}>
        {label}
      </label>
      <input
        id={`sweep-${key}`}
        className="field w-28"
        inputMode="decimal"
        defaultValue={settings[key]}
        disabled={running}
        onChange={(e) => onSettings({ ...settings, [key]: Number(e.target.value.replace(",", ".")) })}
      />
      <FieldError messages={errors[key]} />
    </div>
  );
  const count =
    Number.isFinite(settings.from) && Number.isFinite(settings.to) && settings.step > 0 && settings.to >= settings.from
      ? sweepRatios(settings).length
      : 0;
  return (
    <section className="panel space-y-3 p-4" aria-labelledby="sweep-heading">
      <h3 id="sweep-heading" className="text-base font-semibold">
        Sweep the face slopes
      </h3>
      <div className="flex flex-wrap items-end gap-3">
        {num("from", "Steepest (H:1V)")}
        {num("to", "Flattest (H:1V)")}
        {num("step", "Step")}
        <label className="inline-flex items-center gap-2 pb-2 text-sm">
          <input
            type="checkbox"
            checked={fine}
            disabled={running}
            onChange={(e) =>
              onSettings({
                ...settings,
                ...(e.target.checked
                  ? FINE_SWEEP
                  : {
                      nx: DEFAULT_SWEEP.nx,
                      ny: DEFAULT_SWEEP.ny,
                      radii: DEFAULT_SWEEP.radii,
                      slices: DEFAULT_SWEEP.slices,
                      refine: false,
                    }),
              })
            }
          />
          Finer search (slower)
        </label>
        <label className="inline-flex items-center gap-2 pb-2 text-sm">
          <input
            type="checkbox"
            checked={where === "server"}
            disabled={running}
            onChange={(e) => onWhere(e.target.checked ? "server" : "browser")}
          />
          Run on the server
        </label>
      </div>
      <p className="text-xs text-ink-soft">
        {count} ratios × 3 cases ({count * 3} searches, then 3 to recheck the chosen pair). Each search:{" "}
        {`${settings.nx} × ${settings.ny}`} centres × {countOf(settings.radii, "radius", "radii")},{" "}
        {countOf(settings.slices, "slice")}
        {settings.refine ? ", refined around the best centres" : ""}; the grid follows each geometry and moves once if
        its minimum is on an edge.
        {fine ? "" : COARSE_GRID_NOTE}
      </p>
      <div className="flex items-center gap-3">
        {running ? (
          <button type="button" className="btn-danger" onClick={onCancel}>
            Cancel sweep
          </button>
        ) : (
          <button type="button" className="btn-primary" onClick={onStart} disabled={disabled}>
            Sweep slopes
          </button>
        )}
        {disabledReason && !running ? <span className="text-sm text-ink-soft">{disabledReason}</span> : null}
      </div>
      {running ? (
        <div>
          <progress
            className="w-full"
            max={state.total}
            value={state.done}
            aria-label="Sweep progress"
            data-testid="sweep-progress"
          />
          <p className="text-xs text-ink-soft">
            {state.done} of {state.total} searches {state.where === "server" ? "on the server" : "in this browser"}…
          </p>
          {state.notice ? (
            <p className="text-sm text-alarm-700" role="status" data-testid="sweep-notice">
              {state.notice}
            </p>
          ) : null}
        </div>
      ) : null}
      {state.status === "failed" ? (
        <p className="text-sm text-alarm-700" data-testid="sweep-error">
          {state.message}
        </p>
      ) : null}
      {state.status === "cancelled" ? <p className="text-sm text-ink-soft">Cancelled; nothing was kept.</p> : null}
      {state.status === "done" ? (
        <p className="text-sm text-ink-soft" data-testid="sweep-timing">
          Finished in {(state.elapsedMs / 1000).toFixed(1)} s{" "}
          {state.where === "server" ? "on the server" : "in this browser"} with {state.workers} worker
          {state.workers > 1 ? "s" : ""}.{state.keptMessage ? ` ${state.keptMessage}` : ""}
        </p>
      ) : null}
    </section>
  );
}
