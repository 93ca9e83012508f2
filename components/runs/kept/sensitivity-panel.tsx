"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import type { Method, SectionDocument } from "@/lib/stability";
import { inputParameters } from "@/lib/sensitivity/parameters";
import type { TornadoBar, Variation } from "@/lib/sensitivity/sensitivity";
import { sensitivityCsv, sweepStudy, tornadoStudy, type SweepStudy } from "@/lib/sensitivity/study";
import { downloadText, slug } from "@/lib/client/download";
import { searchSequence } from "@/components/runs/setup/search-worker";
import { SensitivityCharts } from "@/components/runs/kept/sensitivity-charts";

interface SensitivityPanelProps {
  runId: number;
  projectId: number;
  title: string;
  document: SectionDocument;
  method: Method;
  baseFs: number;
  requiredFs: number;
}

type Status = { kind: "idle" } | { kind: "running"; what: string } | { kind: "failed"; message: string };

/** The run's sensitivity: a tornado of every input, and FS along one input against the required FS. */
export function SensitivityPanel({
  runId,
  projectId,
  title,
  document: doc,
  method,
  baseFs,
  requiredFs,
}: SensitivityPanelProps) {
  const params = useMemo(() => inputParameters(doc), [doc]);
  const [amount, setAmount] = useState<string>("10");
  const [lineKey, setLineKey] = useState(params.find((p) => p.key.endsWith(":phi"))?.key ?? params[0]?.key ?? "");
  const [bars, setBars] = useState<TornadoBar[] | null>(null);
  const [sweep, setSweep] = useState<SweepStudy | null>(null);
  const [status, setStatus] = useState<Status>({ kind: "idle" });
  const seq = useRef<ReturnType<typeof searchSequence> | null>(null);
  useEffect(() => () => seq.current?.close(), []);

  const variation: Variation = amount === "sd" ? { kind: "sd" } : { kind: "percent", percent: Number(amount) };

  async function run() {
    seq.current?.close();
    const s = searchSequence();
    seq.current = s;
    const fsOf = async (d: SectionDocument) => {
      const m = await s.search(d);
      return m.type === "done" && m.result.ok ? (m.result.results[method]?.fs ?? null) : null;
    };
    try {
      setStatus({ kind: "running", what: "moving each input" });
      setBars(await tornadoStudy(doc, params, variation, fsOf));
      const p = params.find((q) => q.key === lineKey);
      if (p) {
        setStatus({ kind: "running", what: `FS along ${p.label}` });
        setSweep(await sweepStudy(doc, params, p, 11, requiredFs, fsOf));
      }
      setStatus({ kind: "idle" });
    } catch (err) {
      setStatus({ kind: "failed", message: err instanceof Error ? err.message : String(err) });
    } finally {
      s.close();
      if (seq.current === s) seq.current = null;
    }
  }

  const reportHref = `/api/projects/${projectId}/runs/${runId}/report?sensitivity=${amount}`;
  return (
    <section className="panel space-y-3 p-3" data-testid="sensitivity" aria-labelledby="sensitivity-title">
      <h2 id="sensitivity-title" className="text-sm font-semibold">
        Sensitivity
      </h2>
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col text-xs">
          Move each input by
          <select className="field" value={amount} onChange={(e) => setAmount(e.target.value)}>
            <option value="5">±5 %</option>
            <option value="10">±10 %</option>
            <option value="20">±20 %</option>
            <option value="sd">one standard deviation (where the material gives one)</option>
          </select>
        </label>
        <label className="flex flex-col text-xs">
          FS along
          <select className="field" value={lineKey} onChange={(e) => setLineKey(e.target.value)}>
            {params.map((p) => (
              <option key={p.key} value={p.key}>
                {p.label}
              </option>
            ))}
          </select>
        </label>
        <button type="button" className="btn-primary" onClick={run} disabled={status.kind === "running"}>
          {status.kind === "running" ? `Searching: ${status.what}…` : "Run the study"}
        </button>
        {bars ? (
          <button
            type="button"
            className="btn-quiet"
            onClick={() =>
              downloadText(`${slug(title)}-sensitivity.csv`, sensitivityCsv(baseFs, bars, sweep), "text/csv")
            }
          >
            CSV
          </button>
        ) : null}
        <a className="btn-quiet" href={reportHref} target="_blank" rel="noreferrer">
          PDF report with this section
        </a>
      </div>
      {status.kind === "failed" ? <p className="text-xs text-alarm-700">{status.message}</p> : null}
      {bars ? <SensitivityCharts bars={bars} baseFs={baseFs} sweep={sweep} /> : null}
      <p className="text-xs text-ink-faint">
        One input at a time, the others at their kept values; the searches run in this browser and nothing is stored.
      </p>
    </section>
  );
}
