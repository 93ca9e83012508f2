/**
 * Sampled distributions against their closed forms (moments of the normal, truncated normal and
 * lognormal distributions, common practice; e.g. Johnson, Kotz & Balakrishnan, "Continuous
 * univariate distributions", vol. 1): truncated samples stay within min…max with the truncated
 * mean μ + σ·(φ(a) − φ(b))/(Φ(b) − Φ(a)); a lognormal keeps the mean and sd it was given; a c′–φ′
 * correlation ρ shows as the sample correlation. Tolerances are 4 standard errors of each estimate.
 */
import { describe, expect, test } from "vitest";
import { normalCdf } from "@/lib/stability/probabilistic";
import { drawSamples } from "@/lib/stability/probabilistic/sampling";
import { buildVariables } from "@/lib/stability/probabilistic/variables";
import type { Issue, SectionDocument } from "@/lib/stability";
import type { Vary } from "@/lib/stability/probabilistic";

const N = 40_000;

function section(c: number, phi: number): SectionDocument {
  return {
    version: 1,
    materials: [{ id: "m", model: "mohr-coulomb", gamma: 19, c, phi }],
    regions: [
      {
        material: "m",
        points: [
          [0, 0],
          [10, 0],
          [10, 5],
        ],
      },
    ],
  };
}

function draw(c: number, phi: number, vary: Vary, sampling: "monte-carlo" | "latin-hypercube" = "monte-carlo") {
  const errors: Issue[] = [];
  const { variables, correlations } = buildVariables(section(c, phi), [vary], { samples: N, seed: 4 }, errors);
  expect(errors).toEqual([]);
  const m = drawSamples(variables, correlations, N, sampling, 4);
  const column = (j: number) => Array.from({ length: N }, (_, i) => m.values[i * m.k + j]);
  return { m, column };
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
const sd = (xs: number[]) => {
  const mu = mean(xs);
  return Math.sqrt(xs.reduce((a, b) => a + (b - mu) ** 2, 0) / (xs.length - 1));
};
const pdf = (x: number) => Math.exp((-x * x) / 2) / Math.sqrt(2 * Math.PI);

describe("drawSamples against closed forms", () => {
  test("a normal c′ truncated to [8, 14] stays inside and has the truncated-normal mean", () => {
    const { column } = draw(10, 25, { c: { dist: "normal", sd: 3, min: 8, max: 14 } });
    const xs = column(0);
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(8);
    expect(Math.max(...xs)).toBeLessThanOrEqual(14);
    const a = (8 - 10) / 3;
    const b = (14 - 10) / 3;
    const exact = 10 + (3 * (pdf(a) - pdf(b))) / (normalCdf(b) - normalCdf(a));
    expect(Math.abs(mean(xs) - exact)).toBeLessThan((4 * 3) / Math.sqrt(N));
  });

  test("a lognormal c′ keeps its mean and standard deviation and stays positive", () => {
    const { column } = draw(10, 25, { c: { dist: "lognormal", sd: 4 } });
    const xs = column(0);
    expect(Math.min(...xs)).toBeGreaterThan(0);
    expect(Math.abs(mean(xs) - 10)).toBeLessThan((4 * 4) / Math.sqrt(N));
    // The sd of a sample sd is larger than σ/√(2n) for a skewed variable; 3 % covers V = 0.4 here.
    expect(Math.abs(sd(xs) - 4) / 4).toBeLessThan(0.03);
  });

  test.each(["monte-carlo", "latin-hypercube"] as const)("%s: a c′–φ′ correlation of −0.5 shows up", (s) => {
    const { column } = draw(
      10,
      30,
      { c: { dist: "normal", sd: 2 }, phi: { dist: "normal", sd: 2 }, correlation: -0.5 },
      s,
    );
    const c = column(0);
    const p = column(1);
    const mc = mean(c);
    const mp = mean(p);
    let cov = 0;
    for (let i = 0; i < N; i++) cov += (c[i] - mc) * (p[i] - mp);
    const r = cov / (N - 1) / (sd(c) * sd(p));
    // Standard error of a sample correlation ≈ (1 − ρ²)/√n.
    expect(Math.abs(r + 0.5)).toBeLessThan((4 * 0.75) / Math.sqrt(N));
  });
});
