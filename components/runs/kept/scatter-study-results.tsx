"use client";

import { formatProbability } from "@/lib/format";
import type { MethodProbabilistic } from "@/lib/stability";
import type { ReliabilityTarget, StoredProbabilistic } from "@/lib/probabilistic/types";
import { reliabilityVerdict } from "@/lib/probabilistic/targets";
import { formatDateTime } from "@/lib/format";
import { ScatterStudyCharts } from "@/components/runs/kept/scatter-study-charts";

const METHOD_LABEL: Record<string, string> = { bishop: "Bishop's simplified", fellenius: "Ordinary method" };
const n3 = (v: number | null | undefined) => (v === null || v === undefined ? "—" : v.toFixed(3));
const n2 = (v: number | null | undefined) => (v === null || v === undefined ? "—" : v.toFixed(2));
const pfText = (v: number | null | undefined) => formatProbability(v);

function MethodRows({ method, s, fs }: { method: string; s: MethodProbabilistic; fs: number | null | undefined }) {
  const f = s.fosm;
  return (
    <>
      <tr className="border-t border-rule" data-testid={`scatter-row-${method}`}>
        <td className="px-2 py-1">{METHOD_LABEL[method] ?? method}, sampled</td>
        <td className="px-2 py-1 text-right tabular-nums">{n3(fs)}</td>
        <td className="px-2 py-1 text-right tabular-nums" data-testid="scatter-mean">
          {n3(s.meanFs)}
        </td>
        <td className="px-2 py-1 text-right tabular-nums">{n3(s.sdFs)}</td>
        <td className="px-2 py-1 text-right tabular-nums" data-testid="scatter-pf">
          {pfText(s.pf)}
          {s.pfStandardError ? <span className="text-ink-faint"> ± {pfText(s.pfStandardError)}</span> : null}
        </td>
        <td className="px-2 py-1 text-right tabular-nums" data-testid="scatter-beta-normal">
          {n2(s.betaNormal)}
        </td>
        <td className="px-2 py-1 text-right tabular-nums" data-testid="scatter-beta-lognormal">
          {n2(s.betaLognormal)}
        </td>
      </tr>
      <tr className="text-ink-soft" data-testid={`fosm-row-${method}`}>
        <td className="px-2 py-1 pl-5">Taylor series (FOSM, {f.evaluations} evaluations)</td>
        <td className="px-2 py-1 text-right tabular-nums">{n3(f.fs)}</td>
        <td className="px-2 py-1 text-right tabular-nums">—</td>
        <td className="px-2 py-1 text-right tabular-nums">{n3(f.sdFs)}</td>
        <td className="px-2 py-1 text-right tabular-nums">{pfText(f.pfLognormal)} (lognormal)</td>
        <td className="px-2 py-1 text-right tabular-nums">{n2(f.betaNormal)}</td>
        <td className="px-2 py-1 text-right tabular-nums">{n2(f.betaLognormal)}</td>
      </tr>
    </>
  );
}

/** The kept probabilistic result: figures per method with the Taylor series beside them, the verdict, the charts. */
export function ScatterStudyResults({ stored, target }: { stored: StoredProbabilistic; target: ReliabilityTarget }) {
  const o = stored.outcome;
  const methods = o.methods.filter((m) => o.probabilistic[m]);
  const first = methods[0] ? o.probabilistic[methods[0]]! : null;
  const verdicts = methods.map((m) => {
    const p = o.probabilistic[m]!;
    const v = reliabilityVerdict({
      betaNormal: p.betaNormal,
      betaLognormal: p.betaLognormal,
      pf: p.pf,
      valid: p.valid,
      target: target.beta,
    });
    return { method: m, ...v };
  });
  return (
    <div className="space-y-3" data-testid="scatter-results">
      <p className="text-xs text-ink-soft">
        {o.run.samplesDone.toLocaleString("en-US")} samples (
        {o.run.sampling === "latin-hypercube" ? "Latin hypercube" : "Monte Carlo"}, seed {o.run.seed},{" "}
        {o.run.mode === "full-search" ? "a whole search per sample" : "the critical circle re-evaluated"}), by{" "}
        {stored.createdByName}, {formatDateTime(stored.createdAt)}, in {(o.elapsedMs / 1000).toFixed(1)} s.
      </p>
      {verdicts.map((v) => (
        <p
          key={v.method}
          className={`rounded-md border-l-4 px-3 py-2 text-sm ${v.meets ? "border-moss-600 bg-moss-50" : "border-alarm-600 bg-alarm-50"}`}
          data-testid="scatter-verdict"
        >
          {METHOD_LABEL[v.method] ?? v.method}: {v.sentence}
        </p>
      ))}
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="text-left text-xs text-ink-soft">
            <tr>
              <th className="px-2 py-1">Method</th>
              <th className="px-2 py-1 text-right">FS kept</th>
              <th className="px-2 py-1 text-right">mean FS</th>
              <th className="px-2 py-1 text-right">sd FS</th>
              <th className="px-2 py-1 text-right">pf (FS &lt; 1)</th>
              <th className="px-2 py-1 text-right">β normal</th>
              <th className="px-2 py-1 text-right">β lognormal</th>
            </tr>
          </thead>
          <tbody>
            {methods.map((m) => (
              <MethodRows key={m} method={m} s={o.probabilistic[m]!} fs={o.deterministicFs[m]} />
            ))}
          </tbody>
        </table>
      </div>
      {first ? <ScatterStudyCharts s={first} /> : null}
      {o.warnings.length > 0 ? (
        <ul className="list-disc pl-5 text-xs text-ink-soft" data-testid="scatter-warnings">
          {o.warnings.map((w, i) => (
            <li key={i}>{w.message}</li>
          ))}
        </ul>
      ) : null}
      <p className="text-xs text-ink-faint">
        pf and β are only as good as the spreads given; each material takes one value per sample (no spatial variation),
        which tends to overstate pf for long slip surfaces. These figures support engineering judgement and do not
        replace it: local codes and the engineer of record govern. Target β {target.beta.toFixed(2)}:{" "}
        {target.reason ? `set for this project (${target.reason})` : target.basis}
      </p>
    </div>
  );
}
