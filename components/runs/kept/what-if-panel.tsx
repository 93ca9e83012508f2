"use client";

import { useMemo, useState } from "react";
import { ENGINE_VERSION, type Method, type SectionDocument } from "@/lib/stability";
import { describeChanges, inputParameters, withParameters } from "@/lib/sensitivity/parameters";
import { METHOD_SHORT } from "@/lib/runs/view/warning-text";
import { CAUTION_TEXT } from "@/lib/caution";
import { useLiveSearch } from "@/components/runs/setup/use-live-search";

interface WhatIfPanelProps {
  /** The document the run analysed (its analysis block included), as stored with the run. */
  document: SectionDocument;
  storedFs: Partial<Record<Method, number>>;
  engineVersion: string;
}

const STATE_WORDS = { off: "", waiting: "searching…", settling: "settling…", final: "final" } as const;

/**
 * Other values for a kept run's inputs, searched again as the sliders move (the same worker and
 * engine as live mode). Nothing here is stored; the kept run stays as it is.
 */
export function WhatIfPanel({ document: doc, storedFs, engineVersion }: WhatIfPanelProps) {
  const [open, setOpen] = useState(false);
  const params = useMemo(() => inputParameters(doc), [doc]);
  const [values, setValues] = useState<Record<string, number>>({});
  const tried = useMemo(() => withParameters(doc, params, values), [doc, params, values]);
  const display = useLiveSearch(open ? tried : null);
  const answer = display.state === "settling" || display.state === "final" ? display.result : null;
  const fsNow = Object.fromEntries(answer?.outcome.ghosts.map((g) => [g.method, g.fs]) ?? []) as Partial<
    Record<Method, number>
  >;
  const first = (Object.keys(storedFs) as Method[])[0];
  const words =
    first && storedFs[first] !== undefined && fsNow[first] !== undefined && display.state === "final"
      ? describeChanges(params, values, storedFs[first]!, fsNow[first]!)
      : null;

  return (
    <section className="panel space-y-3 p-3" data-testid="what-if" aria-labelledby="what-if-title">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="what-if-title" className="text-sm font-semibold">
          What if
        </h2>
        <button type="button" className="btn-quiet" onClick={() => setOpen(!open)} aria-expanded={open}>
          {open ? "Close" : "Try other values"}
        </button>
        {open ? (
          <button type="button" className="btn-quiet" onClick={() => setValues({})} data-testid="what-if-reset">
            Reset to the kept values
          </button>
        ) : null}
      </div>
      {open ? (
        <>
          {engineVersion !== ENGINE_VERSION ? (
            <p className="text-xs text-alarm-700">
              This run was kept with engine {engineVersion}; the browser has {ENGINE_VERSION}, so the kept values may
              not give the kept FS exactly.
            </p>
          ) : null}
          <output
            data-testid="what-if-fs"
            data-state={display.state}
            data-fs={answer ? JSON.stringify(fsNow) : undefined}
            aria-live="polite"
            className="block font-mono text-sm"
          >
            {(Object.keys(storedFs) as Method[])
              .map((m) => `${METHOD_SHORT[m]} ${fsNow[m]?.toFixed(3) ?? "…"} (kept ${storedFs[m]!.toFixed(3)})`)
              .join(" · ")}
            {display.state !== "off" ? ` — ${STATE_WORDS[display.state]}` : ""}
          </output>
          {words ? (
            <p className="text-sm" data-testid="what-if-words">
              {words}
            </p>
          ) : null}
          {answer?.outcome.problem ? <p className="text-xs text-alarm-700">{answer.outcome.problem}</p> : null}
          <div className="grid gap-x-6 gap-y-2 sm:grid-cols-2">
            {params.map((p) => {
              const v = values[p.key] ?? p.stored;
              const id = `what-if-${p.key.replace(/[^a-z0-9]+/gi, "-")}`;
              return (
                <div key={p.key} className="text-xs">
                  <label htmlFor={id} className="flex justify-between gap-2">
                    <span>{p.label}</span>
                    <span className="font-mono">
                      {v.toFixed(p.step >= 1 ? 0 : p.step >= 0.1 ? 1 : 2)}
                      {p.unit ? ` ${p.unit}` : ""}
                    </span>
                  </label>
                  <input
                    id={id}
                    type="range"
                    className="w-full"
                    min={p.min}
                    max={p.max}
                    step={p.step}
                    value={v}
                    data-key={p.key}
                    onChange={(e) => {
                      const next = Number(e.target.value);
                      setValues((old) => ({ ...old, [p.key]: next }));
                    }}
                  />
                  <span className="text-ink-faint">
                    {p.min} to {p.max}
                    {p.unit ? ` ${p.unit}` : ""}
                  </span>
                </div>
              );
            })}
          </div>
          <p className="text-xs text-ink-faint">Nothing here is stored. {CAUTION_TEXT}</p>
        </>
      ) : null}
    </section>
  );
}
