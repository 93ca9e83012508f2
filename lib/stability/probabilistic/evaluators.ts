/**
 * Factor of safety of one set of sampled values, per method, in either mode
 * (docs/probabilistic.md "Modes"). "critical-surface": each method's deterministic critical
 * circle, re-evaluated with the sampled values by the engine's own circle evaluator.
 * "full-search": the engine's whole grid search, run on the sampled section.
 */
import type { ResolvedAnalysis } from "../defaults";
import { evaluateCircle } from "../evaluate-circle";
import { runGridSearch } from "../grid-search";
import { buildMaterialTable } from "../load-cases";
import { prepareSection, type PreparedSection } from "../prepare";
import type { Circle } from "../results";
import type { Material, Method, SectionDocument } from "../schema";
import { createScratch } from "../scratch";
import { OK } from "../status";
import type { RandomVariable } from "./variables";

/** Writes each method's FS (NaN when the sample gives none) into out[method index]. */
export type Evaluator = (point: ArrayLike<number>, offset: number, out: Float64Array) => void;

/** The section with one sample's values in place of the means; the input is not changed. */
export function sampledSection(
  section: SectionDocument,
  variables: ReadonlyArray<RandomVariable>,
  point: ArrayLike<number>,
  offset: number,
): SectionDocument {
  const materials: Material[] = section.materials.slice();
  let analysis = section.analysis;
  variables.forEach((v, j) => {
    const x = point[offset + j];
    if (v.key === "level") {
      if (analysis?.drawdown) analysis = { ...analysis, drawdown: { ...analysis.drawdown, to: x } };
      return;
    }
    const m = { ...materials[v.material] } as Material & Record<string, unknown>;
    if (v.key === "gamma" && m.model !== "impenetrable" && m.gammaSat !== undefined) {
      // γsat keeps its margin over γ: both come from the same density scatter.
      m.gammaSat = m.gammaSat + (x - (m.gamma ?? x));
    }
    m[v.key] = x;
    materials[v.material] = m;
  });
  return { ...section, materials, analysis };
}

/**
 * Re-evaluates fixed circles (one per method, null where a method has none). Only the material
 * table changes between samples unless the pool level varies or the drawdown is staged: then the
 * section is prepared again (water and stage-1 strengths depend on them).
 */
export function criticalSurfaceEvaluator(
  section: SectionDocument,
  analysis: ResolvedAnalysis,
  variables: ReadonlyArray<RandomVariable>,
  methods: ReadonlyArray<Method>,
  circles: ReadonlyArray<Circle | null>,
): Evaluator {
  const base = prepareSection(section, analysis);
  const S = createScratch();
  const reprepare = base.staged !== null || variables.some((v) => v.key === "level");
  return (point, offset, out) => {
    const s = sampledSection(section, variables, point, offset);
    let P: PreparedSection;
    if (reprepare) P = prepareSection(s, { ...analysis, drawdown: s.analysis?.drawdown ?? analysis.drawdown });
    else P = { ...base, mat: buildMaterialTable(s.materials, analysis.case).table };
    methods.forEach((m, i) => {
      const c = circles[i];
      out[i] = NaN;
      if (!c) return;
      const bishop = m === "bishop";
      if (evaluateCircle(P, S, c.xc, c.yc, c.r, bishop) !== OK) return;
      const fs = bishop ? S.fsB : S.fsO;
      if (Number.isFinite(fs) && fs > 0) out[i] = fs;
    });
  };
}

/** Runs the whole search on each sampled section. */
export function fullSearchEvaluator(
  section: SectionDocument,
  variables: ReadonlyArray<RandomVariable>,
  methods: ReadonlyArray<Method>,
): Evaluator {
  return (point, offset, out) => {
    const r = runGridSearch(sampledSection(section, variables, point, offset));
    methods.forEach((m, i) => {
      out[i] = r.ok ? (r.results[m]?.fs ?? NaN) : NaN;
    });
  };
}
