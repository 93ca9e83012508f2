"use client";

import { useState } from "react";
import type { Distribution, Vary } from "@/lib/stability";
import type { MaterialDefaults, VariedQuantity } from "@/lib/probabilistic/types";
import type { ProbabilisticRequest } from "@/lib/probabilistic/request";
import { FieldError } from "@/components/ui/form-message";

interface Row {
  on: boolean;
  dist: Distribution["dist"];
  sd: string;
  min: string;
  max: string;
}
type MaterialRows = Partial<Record<VariedQuantity, Row>> & { correlation: string };

const SYMBOL: Record<VariedQuantity, string> = { c: "c′ (kPa)", phi: "φ′ (°)", su: "su (kPa)", gamma: "γ (kN/m³)" };

const rowOf = (d: Distribution | undefined): Row => ({
  on: d !== undefined,
  dist: d?.dist ?? "normal",
  sd: d ? String(d.sd) : "",
  min: d?.min !== undefined ? String(d.min) : "",
  max: d?.max !== undefined ? String(d.max) : "",
});

const numOr = (s: string) => (s.trim() === "" ? undefined : Number(s));

function toDistribution(r: Row): Distribution {
  const min = numOr(r.min);
  const max = numOr(r.max);
  return {
    dist: r.dist,
    sd: Number(r.sd),
    ...(min !== undefined ? { min } : {}),
    ...(max !== undefined ? { max } : {}),
  };
}

interface FormProps {
  defaults: MaterialDefaults[];
  drawdownTo: number | null;
  fields: Record<string, string[]>;
  busy: boolean;
  onSubmit: (r: ProbabilisticRequest) => void;
}

/** The spreads per material (from the defaults), the lowered pool's, and how to sample. */
export function ScatterStudyForm({ defaults, drawdownTo, fields, busy, onSubmit }: FormProps) {
  const [rows, setRows] = useState<Record<string, MaterialRows>>(() =>
    Object.fromEntries(
      defaults.map((m) => [
        m.materialId,
        {
          ...Object.fromEntries(m.keys.map((k) => [k, rowOf(m.vary[k])])),
          correlation: m.vary.correlation !== undefined ? String(m.vary.correlation) : "",
        },
      ]),
    ),
  );
  const [level, setLevel] = useState<Row>({ on: false, dist: "normal", sd: "0.5", min: "", max: "" });
  const [sampling, setSampling] = useState<ProbabilisticRequest["sampling"]>("latin-hypercube");
  const [mode, setMode] = useState<ProbabilisticRequest["mode"]>("critical-surface");
  const [samples, setSamples] = useState("5000");
  const [seed, setSeed] = useState("1");

  const edit = (id: string, key: VariedQuantity, patch: Partial<Row>) =>
    setRows((r) => ({ ...r, [id]: { ...r[id], [key]: { ...r[id][key]!, ...patch } } }));

  function submit(e: React.FormEvent) {
    e.preventDefault();
    const materials: Record<string, Vary> = {};
    for (const m of defaults) {
      const r = rows[m.materialId];
      const vary: Vary = {};
      for (const k of m.keys) if (r[k]?.on) vary[k] = toDistribution(r[k]!);
      if (r.correlation.trim() !== "" && vary.c && vary.phi) vary.correlation = Number(r.correlation);
      if (Object.keys(vary).length > 0) materials[m.materialId] = vary;
    }
    onSubmit({
      samples: Number(samples),
      seed: Number(seed),
      sampling,
      mode,
      materials,
      ...(drawdownTo !== null && level.on ? { level: toDistribution(level) } : {}),
    });
  }

  const err = (key: string) => <FieldError messages={fields[key]} />;
  return (
    <form onSubmit={submit} className="space-y-3" noValidate data-testid="scatter-form">
      <table className="w-full text-sm">
        <thead className="text-left text-xs text-ink-soft">
          <tr>
            <th className="px-2 py-1">Material and quantity</th>
            <th className="px-2 py-1 text-right">mean</th>
            <th className="px-2 py-1">distribution</th>
            <th className="px-2 py-1">sd</th>
            <th className="px-2 py-1">min … max</th>
            <th className="px-2 py-1">from</th>
          </tr>
        </thead>
        <tbody>
          {defaults
            .filter((m) => m.keys.length > 0)
            .flatMap((m) => [
              ...m.keys.map((k) => {
                const r = rows[m.materialId][k]!;
                const id = `${m.materialId}-${k}`;
                return (
                  <tr key={id} className="border-t border-rule align-top" data-testid={`spread-${id}`}>
                    <td className="px-2 py-1">
                      <label className="flex items-center gap-2">
                        <input
                          type="checkbox"
                          checked={r.on}
                          onChange={(e) => edit(m.materialId, k, { on: e.target.checked })}
                        />
                        {m.name} {SYMBOL[k]}
                      </label>
                      {err(`materials.${m.materialId}.${k}`)}
                    </td>
                    <td className="px-2 py-1 text-right tabular-nums">{m.values[k]}</td>
                    <td className="px-2 py-1">
                      <select
                        className="field"
                        aria-label={`${m.name} ${SYMBOL[k]} distribution`}
                        value={r.dist}
                        onChange={(e) => edit(m.materialId, k, { dist: e.target.value as Row["dist"] })}
                      >
                        <option value="normal">normal</option>
                        <option value="lognormal">lognormal</option>
                      </select>
                    </td>
                    <td className="px-2 py-1">
                      <input
                        className="field w-20"
                        inputMode="decimal"
                        aria-label={`${m.name} ${SYMBOL[k]} sd`}
                        value={r.sd}
                        onChange={(e) => edit(m.materialId, k, { sd: e.target.value })}
                      />
                    </td>
                    <td className="px-2 py-1">
                      <div className="flex gap-1">
                        <input
                          className="field w-14"
                          inputMode="decimal"
                          aria-label={`${m.name} ${SYMBOL[k]} min`}
                          value={r.min}
                          onChange={(e) => edit(m.materialId, k, { min: e.target.value })}
                        />
                        <input
                          className="field w-14"
                          inputMode="decimal"
                          aria-label={`${m.name} ${SYMBOL[k]} max`}
                          value={r.max}
                          onChange={(e) => edit(m.materialId, k, { max: e.target.value })}
                        />
                      </div>
                    </td>
                    <td className="px-2 py-1 text-xs text-ink-soft">{m.basis[k] ?? "entered here"}</td>
                  </tr>
                );
              }),
              ...(m.keys.includes("c") && m.keys.includes("phi")
                ? [
                    <tr key={`${m.materialId}-rho`} className="align-top">
                      <td className="px-2 py-1 pl-7 text-xs">{m.name}: c′–φ′ correlation (−0.99 … 0.99)</td>
                      <td />
                      <td />
                      <td className="px-2 py-1">
                        <input
                          className="field w-20"
                          inputMode="decimal"
                          aria-label={`${m.name} c′–φ′ correlation`}
                          value={rows[m.materialId].correlation}
                          onChange={(e) =>
                            setRows((r) => ({
                              ...r,
                              [m.materialId]: { ...r[m.materialId], correlation: e.target.value },
                            }))
                          }
                        />
                        {err(`materials.${m.materialId}.correlation`)}
                      </td>
                      <td />
                      <td className="px-2 py-1 text-xs text-ink-soft">
                        {m.basis.correlation ?? "none unless entered"}
                      </td>
                    </tr>,
                  ]
                : []),
            ])}
          {drawdownTo !== null ? (
            <tr className="border-t border-rule align-top" data-testid="spread-level">
              <td className="px-2 py-1">
                <label className="flex items-center gap-2">
                  <input
                    type="checkbox"
                    checked={level.on}
                    onChange={(e) => setLevel({ ...level, on: e.target.checked })}
                  />
                  Lowered pool level (m)
                </label>
                {err("level")}
              </td>
              <td className="px-2 py-1 text-right tabular-nums">{drawdownTo}</td>
              <td className="px-2 py-1">
                <select
                  className="field"
                  aria-label="Pool level distribution"
                  value={level.dist}
                  onChange={(e) => setLevel({ ...level, dist: e.target.value as Row["dist"] })}
                >
                  <option value="normal">normal</option>
                  <option value="lognormal">lognormal</option>
                </select>
              </td>
              <td className="px-2 py-1">
                <input
                  className="field w-20"
                  aria-label="Pool level sd"
                  value={level.sd}
                  onChange={(e) => setLevel({ ...level, sd: e.target.value })}
                />
              </td>
              <td className="px-2 py-1">
                <div className="flex gap-1">
                  <input
                    className="field w-14"
                    aria-label="Pool level min"
                    value={level.min}
                    onChange={(e) => setLevel({ ...level, min: e.target.value })}
                  />
                  <input
                    className="field w-14"
                    aria-label="Pool level max"
                    value={level.max}
                    onChange={(e) => setLevel({ ...level, max: e.target.value })}
                  />
                </div>
              </td>
              <td className="px-2 py-1 text-xs text-ink-soft">the run&apos;s lowered pool as the mean</td>
            </tr>
          ) : null}
        </tbody>
      </table>
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col text-xs">
          Sampling
          <select className="field" value={sampling} onChange={(e) => setSampling(e.target.value as typeof sampling)}>
            <option value="latin-hypercube">Latin hypercube</option>
            <option value="monte-carlo">Monte Carlo</option>
          </select>
        </label>
        <label className="flex flex-col text-xs">
          Each sample
          <select className="field" value={mode} onChange={(e) => setMode(e.target.value as typeof mode)}>
            <option value="critical-surface">re-evaluates the kept critical circle (up to 100,000)</option>
            <option value="full-search">searches the whole grid again (up to 2,000)</option>
          </select>
        </label>
        <label className="flex flex-col text-xs">
          Samples
          <input
            className="field w-28"
            inputMode="numeric"
            aria-label="Samples"
            value={samples}
            onChange={(e) => setSamples(e.target.value)}
          />
        </label>
        <label className="flex flex-col text-xs">
          Seed
          <input
            className="field w-28"
            inputMode="numeric"
            aria-label="Seed"
            value={seed}
            onChange={(e) => setSeed(e.target.value)}
          />
        </label>
        <button type="submit" className="btn-primary" disabled={busy}>
          Queue the probabilistic run
        </button>
      </div>
      {err("samples")}
      {err("seed")}
      {err("_")}
    </form>
  );
}
