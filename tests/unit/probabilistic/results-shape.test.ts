/**
 * The figures that go with pf (docs/probabilistic.md "Results"): the
 * histogram counts every valid sample, the empirical CDF read at FS = 1 is pf (definition of the
 * CDF), the convergence record ends at the final pf, and a cancelled run says so and keeps the
 * samples done (as the grid search does).
 */
import { describe, expect, test } from "vitest";
import { hasProbabilisticSettings, runProbabilistic } from "@/lib/stability/probabilistic";
import { loadDoc, run, withSettings } from "./helpers";

const doc = withSettings(loadDoc("linear-dry-slope.json"), { samples: 5000, seed: 9 });

describe("result figures", () => {
  const p = run(doc).probabilistic.fellenius;
  if (!p || p.pf === null) throw new Error("no result");

  test("histogram counts sum to the valid samples and span min…max", () => {
    expect(p.histogram.counts.reduce((a, b) => a + b, 0)).toBe(p.valid);
    expect(p.histogram.min).toBe(p.minFs);
    expect(p.histogram.min + p.histogram.binWidth * p.histogram.counts.length).toBeCloseTo(p.maxFs as number, 9);
  });

  test("the CDF is non-decreasing, ends at 1, and reads pf at FS = 1 within one CDF step", () => {
    for (let i = 1; i < p.cdf.length; i++) {
      expect(p.cdf[i][0]).toBeGreaterThanOrEqual(p.cdf[i - 1][0]);
      expect(p.cdf[i][1]).toBeGreaterThanOrEqual(p.cdf[i - 1][1]);
    }
    expect(p.cdf[p.cdf.length - 1][1]).toBe(1);
    const below = p.cdf.filter(([fs]) => fs < 1);
    const atOne = below.length > 0 ? below[below.length - 1][1] : 0;
    expect(Math.abs(atOne - (p.pf as number))).toBeLessThanOrEqual(1 / (p.cdf.length - 1) + 1 / p.valid);
  });

  test("the convergence record rises in sample count and ends at the final pf", () => {
    const last = p.convergence[p.convergence.length - 1];
    expect(last).toEqual([5000, p.pf]);
    for (let i = 1; i < p.convergence.length; i++) expect(p.convergence[i][0]).toBeGreaterThan(p.convergence[i - 1][0]);
  });

  test("a cancelled run keeps the samples done and says so", () => {
    let calls = 0;
    const r = runProbabilistic(doc, { onProgress: () => ++calls < 3 });
    if (!r.ok) throw new Error("run failed");
    expect(r.probabilisticRun.cancelled).toBe(true);
    expect(r.probabilisticRun.samplesDone).toBe(150);
    expect(r.probabilistic.fellenius?.samples).toBe(150);
    expect(r.warnings.map((w) => w.code)).toContain("probabilistic-cancelled");
  });

  test("hasProbabilisticSettings tells a probabilistic document from a plain one", () => {
    expect(hasProbabilisticSettings(doc)).toBe(true);
    expect(hasProbabilisticSettings({ ...doc, analysis: { methods: ["bishop"] } })).toBe(false);
    expect(hasProbabilisticSettings(null)).toBe(false);
  });
});

describe("methods the sampling does not cover", () => {
  // Spencer and Morgenstern–Price are searched deterministically but not sampled: the output must say
  // so rather than leave them out in silence (docs/probabilistic.md).
  test("a run asking for Spencer reports Bishop's and the ordinary method's pf and warns for Spencer", () => {
    const base = loadDoc("linear-dry-slope.json");
    const doc = withSettings(base, { samples: 200, seed: 4 });
    doc.analysis.methods = ["bishop", "fellenius", "spencer"];
    const r = run(doc);
    expect(Object.keys(r.probabilistic).sort()).toEqual(["bishop", "fellenius"]);
    const w = r.warnings.find((x) => x.code === "rigorous-not-sampled");
    expect(w?.message).toMatch(/^Spencer's method: not sampled/);
  });
});
