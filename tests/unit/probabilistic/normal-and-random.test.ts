/**
 * The building blocks: Φ and Φ⁻¹ against standard normal table values (any statistics table,
 * e.g. Abramowitz & Stegun 1964, Table 26.1; values to the digits printed there), the seeded
 * stream's uniformity, and the Latin hypercube's one-sample-per-stratum property
 * (McKay, Beckman & Conover 1979).
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { normalCdf, normalQuantile } from "@/lib/stability/probabilistic";
import { createStream } from "@/lib/stability/probabilistic/random";
import { drawSamples } from "@/lib/stability/probabilistic/sampling";
import type { RandomVariable } from "@/lib/stability/probabilistic/variables";

describe("normalCdf / normalQuantile", () => {
  test.each([
    [0, 0.5],
    [1, 0.841344746068543],
    [-1.96, 0.0249978951482204],
    [-3, 0.00134989803163009],
    [2.326347874, 0.99],
    [-5, 2.86651571879194e-7],
  ])("Φ(%s) = %s", (x, p) => {
    expect(Math.abs(normalCdf(x) - p) / p).toBeLessThan(1e-9);
  });

  test("Φ⁻¹(0.975) = 1.959964 and Φ⁻¹(0.999) = 3.090232 (table values)", () => {
    expect(Math.abs(normalQuantile(0.975) - 1.959964)).toBeLessThan(1e-6);
    expect(Math.abs(normalQuantile(0.999) - 3.090232)).toBeLessThan(1e-6);
  });

  test("Φ(Φ⁻¹(p)) = p to 1e-12 relative, across (1e-12, 1 − 1e-12)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }), (p) => {
        expect(Math.abs(normalCdf(normalQuantile(p)) - p) / Math.min(p, 1 - p)).toBeLessThan(1e-9);
      }),
    );
  });
});

describe("createStream(seed)", () => {
  test("uniform: chi-square over 100 bins of 100,000 draws below the 0.1 % point (148.2 for 99 dof)", () => {
    const rng = createStream(12345);
    const bins = new Array<number>(100).fill(0);
    for (let i = 0; i < 100_000; i++) {
      const u = rng.next();
      expect(u > 0 && u < 1).toBe(true);
      bins[Math.floor(u * 100)]++;
    }
    const chi2 = bins.reduce((s, b) => s + (b - 1000) ** 2 / 1000, 0);
    expect(chi2).toBeLessThan(148.2);
  });

  test("the same seed gives the same stream; neighbouring seeds give different ones", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 0xfffffffe }), (seed) => {
        const a = createStream(seed);
        const b = createStream(seed);
        const c = createStream(seed + 1);
        const xa = Array.from({ length: 8 }, () => a.next());
        expect(Array.from({ length: 8 }, () => b.next())).toEqual(xa);
        expect(Array.from({ length: 8 }, () => c.next())).not.toEqual(xa);
      }),
    );
  });
});

describe("drawSamples with latin-hypercube", () => {
  const v: RandomVariable = {
    path: "materials[0].vary.c",
    label: "c",
    material: 0,
    key: "c",
    mean: 10,
    sd: 2,
    dist: "normal",
    mu: 10,
    sigma: 2,
    pLo: 0,
    pHi: 1,
    low: 0,
    high: 1e5,
    highOpen: false,
  };
  test("each variable has exactly one sample in each of the n equal-probability strata", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 300 }), fc.integer({ min: 0, max: 1000 }), (n, seed) => {
        const m = drawSamples([v, { ...v, mean: 20, mu: 20 }], [], n, "latin-hypercube", seed);
        for (let j = 0; j < 2; j++) {
          const seen = new Set<number>();
          for (let i = 0; i < n; i++) {
            const p = normalCdf((m.values[i * 2 + j] - (j === 0 ? 10 : 20)) / 2);
            seen.add(Math.min(n - 1, Math.floor(p * n)));
          }
          expect(seen.size).toBe(n);
        }
      }),
      { numRuns: 50 },
    );
  });
});
