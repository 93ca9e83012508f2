/**
 * The report's probabilistic section, written when the run has a kept probabilistic result: the
 * sampling used, mean and sd of FS, pf and β per method with the Taylor-series estimate beside
 * them, the spreads sampled, and pf and β against the project's target in words.
 */
import { formatProbability } from "@/lib/format";
import { METHOD_NAME, METHOD_SHORT } from "@/lib/vocabulary";
import type { ReliabilityTarget, StoredProbabilistic } from "@/lib/probabilistic/types";
import { reliabilityVerdict } from "@/lib/probabilistic/targets";
import type { ReportWriter } from "./report-writer";
import { SOFT } from "./report-writer";

export interface ReportProbabilistic {
  stored: StoredProbabilistic;
  target: ReliabilityTarget;
}

const METHOD: Record<string, string> = METHOD_NAME;
// Table rows carry two words more, so they take the short names to fit their column.
const SHORT: Record<string, string> = METHOD_SHORT;
const n = (v: number | null | undefined, d: number) => (v === null || v === undefined ? "—" : v.toFixed(d));
const pf = (v: number | null | undefined) => formatProbability(v);

export function writeProbabilistic(w: ReportWriter, { stored, target }: ReportProbabilistic): void {
  const o = stored.outcome;
  w.heading("Probabilistic analysis");
  w.paragraph(
    `${o.run.samplesDone.toLocaleString("en-US")} samples, ` +
      `${o.run.sampling === "latin-hypercube" ? "Latin hypercube" : "Monte Carlo"} sampling, seed ${o.run.seed}, ` +
      `${o.run.mode === "full-search" ? "a whole grid search per sample" : "the critical circle of each method re-evaluated"}; ` +
      `run by ${stored.createdByName} on the job queue (engine ${o.engineVersion}). pf is the share of samples with FS < 1; ` +
      "β normal = (μ − 1)/σ; β lognormal = ln(μ/√(1 + V²))/√(ln(1 + V²)). The Taylor-series estimate follows Duncan (2000).",
    { size: 8.5, color: SOFT },
  );
  const methods = o.methods.filter((m) => o.probabilistic[m]);
  w.table(
    [
      { header: "Method", width: 150 },
      { header: "mean FS", width: 50, align: "right" },
      { header: "sd FS", width: 45, align: "right" },
      { header: "pf", width: 65, align: "right" },
      { header: "β normal", width: 55, align: "right" },
      { header: "β lognormal", width: 60, align: "right" },
    ],
    methods.flatMap((m) => {
      const s = o.probabilistic[m]!;
      return [
        [
          `${SHORT[m] ?? m}, sampled`,
          n(s.meanFs, 3),
          n(s.sdFs, 3),
          pf(s.pf),
          n(s.betaNormal, 2),
          n(s.betaLognormal, 2),
        ],
        [
          `${SHORT[m] ?? m}, Taylor series`,
          n(s.fosm.fs, 3),
          n(s.fosm.sdFs, 3),
          pf(s.fosm.pfLognormal),
          n(s.fosm.betaNormal, 2),
          n(s.fosm.betaLognormal, 2),
        ],
      ];
    }),
  );
  for (const m of methods) {
    const s = o.probabilistic[m]!;
    const v = reliabilityVerdict({
      betaNormal: s.betaNormal,
      betaLognormal: s.betaLognormal,
      pf: s.pf,
      valid: s.valid,
      target: target.beta,
    });
    w.paragraph(`${METHOD[m] ?? m}: ${v.sentence}`);
  }
  w.table(
    [
      { header: "Varied quantity", width: 190 },
      { header: "distribution", width: 70 },
      { header: "mean", width: 55, align: "right" },
      { header: "sd", width: 55, align: "right" },
      { header: "min … max", width: 75, align: "right" },
    ],
    o.run.variables.map((v) => [
      v.label,
      v.dist,
      n(v.mean, 2),
      n(v.sd, 3),
      v.min === undefined && v.max === undefined ? "—" : `${n(v.min, 2)} … ${n(v.max, 2)}`,
    ]),
  );
  if (o.run.correlations.length > 0)
    w.paragraph(`c′–φ′ correlation: ${o.run.correlations.map((c) => `${c.path} = ${c.rho}`).join("; ")}.`, {
      size: 8.5,
    });
  for (const warning of o.warnings) w.paragraph(`Note: ${warning.message}`, { size: 8, color: SOFT });
  w.paragraph(
    `Target β ${target.beta.toFixed(2)}: ${target.reason ? `set for this project (${target.reason}).` : target.basis} ` +
      "pf and β are only as good as the spreads given and ignore spatial variation; they support, and do not replace, " +
      "engineering judgement, local codes and the engineer of record.",
    { size: 8, color: SOFT },
  );
}
