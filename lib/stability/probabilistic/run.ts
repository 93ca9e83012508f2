/**
 * A probabilistic run (docs/probabilistic.md): the deterministic grid
 * search, then n sampled sets of c′, φ′, su, γ and pool level evaluated in the chosen mode, with
 * the Taylor-series estimate beside them. Synchronous, deterministic for a seed, cancellable
 * through the progress callback like the grid search.
 */
import { METHOD_LABEL } from "../method-labels";
import { resolveAnalysis } from "../defaults";
import { runGridSearch, type GridSearchSuccess } from "../grid-search";
import { issue, type EngineWarning, type Issue } from "../issues";
import type { Circle, EngineFailure, MethodRecord } from "../results";
import { validateSection } from "../validate";
import { fromZodIssues } from "../zod-issues";
import { criticalSurfaceEvaluator, fullSearchEvaluator, type Evaluator } from "./evaluators";
import { taylorSeries, type FosmResult } from "./fosm";
import { drawSamples } from "./sampling";
import { MAX_SAMPLES, MIN_SAMPLES, probabilisticDocumentSchema, type ProbabilisticMode, type Sampling } from "./schema";
import { summarise, type FsSummary } from "./statistics";
import { buildVariables, type RandomVariable } from "./variables";

export interface ProbabilisticOptions {
  /** Called with the fraction done (about 100 times); return false to cancel. */
  onProgress?: (fraction: number) => boolean | void;
}

/** One method's sampled result and its Taylor-series estimate. */
export interface MethodProbabilistic extends FsSummary {
  fosm: FosmResult;
}

/** How the run was made: settings, the variables as read, and whether it finished. */
export interface ProbabilisticRunInfo {
  samples: number;
  samplesDone: number;
  seed: number;
  sampling: Sampling;
  mode: ProbabilisticMode;
  variables: { path: string; label: string; dist: string; mean: number; sd: number; min?: number; max?: number }[];
  correlations: { path: string; rho: number }[];
  /** critical-surface mode: the circle re-evaluated for each method. */
  circles?: MethodRecord<Circle | null>;
  cancelled: boolean;
}

export interface ProbabilisticSuccess extends GridSearchSuccess {
  probabilistic: MethodRecord<MethodProbabilistic | null>;
  probabilisticRun: ProbabilisticRunInfo;
}

export type ProbabilisticResult = ProbabilisticSuccess | EngineFailure;

/** True when a document asks for a probabilistic run (has analysis.probabilistic), whether or not it is valid. */
export function hasProbabilisticSettings(doc: unknown): boolean {
  if (typeof doc !== "object" || doc === null) return false;
  const analysis = (doc as { analysis?: unknown }).analysis;
  return typeof analysis === "object" && analysis !== null && "probabilistic" in analysis;
}

/** Reads and checks everything a run needs; every problem is reported with its path. */
function readInput(doc: unknown) {
  const parsed = probabilisticDocumentSchema.safeParse(doc);
  const v = validateSection(doc);
  const errors: Issue[] = v.ok ? [] : [...v.errors];
  if (!parsed.success) {
    const own = fromZodIssues(parsed.error.issues).map((e) =>
      e.path === "analysis" || e.path === "analysis.probabilistic"
        ? issue(
            "probabilistic-missing",
            "analysis.probabilistic",
            "A probabilistic run needs analysis.probabilistic = {samples, seed, sampling, mode}.",
          )
        : e,
    );
    const known = new Set(errors.map((e) => e.path));
    errors.push(...own.filter((e) => !known.has(e.path) || e.code === "probabilistic-missing"));
  }
  if (!parsed.success || !v.ok) return { errors, warnings: v.warnings };
  const settings = parsed.data.analysis.probabilistic;
  const mode: ProbabilisticMode = settings.mode ?? "critical-surface";
  const sampling: Sampling = settings.sampling ?? "monte-carlo";
  const max = MAX_SAMPLES[mode];
  if (settings.samples < MIN_SAMPLES || settings.samples > max)
    errors.push(
      issue(
        "samples-out-of-range",
        "analysis.probabilistic.samples",
        `analysis.probabilistic.samples = ${settings.samples}: mode "${mode}" takes ${MIN_SAMPLES} to ` +
          `${max.toLocaleString("en-US")} samples` +
          (mode === "full-search" ? ' (each runs a whole search; "critical-surface" takes up to 100,000).' : "."),
      ),
    );
  const vary = parsed.data.materials.map((m) => m.vary);
  const { variables, correlations } = buildVariables(v.section, vary, settings, errors);
  if (errors.length === 0 && variables.length === 0)
    errors.push(
      issue(
        "nothing-varies",
        "materials",
        "No quantity varies: give at least one material a vary entry with sd > 0, or analysis.probabilistic.level.",
      ),
    );
  return { errors, warnings: v.warnings, section: v.section, settings, mode, sampling, variables, correlations };
}

/** Every error a probabilistic document has, with its path, without running anything (for checks at the edge). */
export function probabilisticInputErrors(doc: unknown): Issue[] {
  return readInput(doc).errors;
}

/**
 * Runs a probabilistic analysis of a section document that carries analysis.probabilistic.
 * @returns the deterministic search result plus `probabilistic` (per method) and `probabilisticRun`
 */
export function runProbabilistic(doc: unknown, opts: ProbabilisticOptions = {}): ProbabilisticResult {
  const input = readInput(doc);
  if (input.errors.length > 0 || !input.section) return { ok: false, errors: input.errors, warnings: input.warnings };
  const { section, settings, mode, sampling, variables, correlations } = input;
  const det = runGridSearch(section);
  if (!det.ok) return det;
  const methods = det.methods;
  const analysis = resolveAnalysis(section.analysis);
  const circles = methods.map((m) => det.results[m]?.circle ?? null);
  const evaluate: Evaluator =
    mode === "critical-surface"
      ? criticalSurfaceEvaluator(section, analysis, variables, methods, circles)
      : fullSearchEvaluator(section, variables, methods);
  const n = settings.samples;
  const matrix = drawSamples(variables, correlations, n, sampling, settings.seed);
  const fs = methods.map(() => new Float64Array(n).fill(NaN));
  const out = new Float64Array(methods.length);
  const step = mode === "full-search" ? 1 : Math.max(1, Math.floor(n / 100));
  let done = 0;
  let cancelled = false;
  for (let i = 0; i < n && !cancelled; i++) {
    evaluate(matrix.values, i * matrix.k, out);
    for (let m = 0; m < methods.length; m++) fs[m][i] = out[m];
    done = i + 1;
    if (opts.onProgress && (done % step === 0 || done === n) && opts.onProgress(done / n) === false) cancelled = true;
  }
  const fosm = taylorSeries(variables, correlations, methods.length, evaluate);
  const probabilistic: MethodRecord<MethodProbabilistic | null> = {};
  const warnings: EngineWarning[] = [...det.warnings];
  methods.forEach((m, i) => {
    if (mode === "critical-surface" && !circles[i]) {
      probabilistic[m] = null;
      return;
    }
    const summary = summarise(fs[i].subarray(0, done));
    probabilistic[m] = { ...summary, fosm: fosm[i] };
    const bad = summary.samples - summary.valid;
    if (bad > 0)
      warnings.push({
        code: "samples-without-fs",
        message: `${m}: ${bad} of ${summary.samples} samples gave no factor of safety and are left out of pf and β.`,
      });
  });
  warnings.push(...sampleWarnings(variables, matrix.moved, n, sampling, correlations.length > 0, cancelled));
  const unsampled = det.rigorousMethods ?? [];
  if (unsampled.length > 0)
    warnings.push({
      code: "rigorous-not-sampled",
      message:
        `${unsampled.map((m) => METHOD_LABEL[m]).join(" and ")}: not sampled; the probabilistic run covers ` +
        "Bishop's simplified and the ordinary method (the deterministic results of all methods stand as searched).",
    });
  return {
    ...det,
    warnings,
    probabilistic,
    probabilisticRun: {
      samples: n,
      samplesDone: done,
      seed: settings.seed,
      sampling,
      mode,
      variables: variables.map(describeVariable),
      correlations: correlations.map((c) => ({
        path: `materials[${variables[c.a].material}].vary.correlation`,
        rho: c.rho,
      })),
      ...(mode === "critical-surface" ? { circles: Object.fromEntries(methods.map((m, i) => [m, circles[i]])) } : {}),
      cancelled,
    },
  };
}

function describeVariable(v: RandomVariable): ProbabilisticRunInfo["variables"][number] {
  const out: ProbabilisticRunInfo["variables"][number] = {
    path: v.path,
    label: v.label,
    dist: v.dist,
    mean: v.mean,
    sd: v.sd,
  };
  if (v.min !== undefined) out.min = v.min;
  if (v.max !== undefined) out.max = v.max;
  return out;
}

/** Warnings about the samples themselves: values put back on a limit, correlation under LHS, cancel. */
function sampleWarnings(
  variables: ReadonlyArray<RandomVariable>,
  moved: ReadonlyArray<number>,
  n: number,
  sampling: Sampling,
  correlated: boolean,
  cancelled: boolean,
): EngineWarning[] {
  const out: EngineWarning[] = [];
  variables.forEach((v, j) => {
    if (moved[j] > 0)
      out.push({
        code: "samples-on-limit",
        message:
          `${v.path}: ${moved[j]} of ${n} samples of ${v.label} fell outside ${v.low} … ${v.high} ` +
          "and were set to the limit.",
      });
  });
  if (correlated && sampling === "latin-hypercube")
    out.push({
      code: "correlation-loosens-strata",
      message:
        "Latin hypercube with a c′–φ′ correlation: φ′ is mixed with c′ after stratifying, " +
        "so φ′ itself no longer has exactly one sample per stratum.",
    });
  if (cancelled)
    out.push({
      code: "probabilistic-cancelled",
      message: "The run was cancelled; the figures cover the samples done.",
    });
  return out;
}
