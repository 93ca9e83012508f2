/**
 * The engine against the slow reference implementation (./reference/reference-fs.ts) on random
 * sections: several materials (Mohr–Coulomb and undrained), a phreatic line that may pond water
 * on the ground, or ru, a surcharge strip and kh, both methods, slopes facing either way, circles
 * that cut one piece or several. The reference uses 2,000 thin uniform slices per circle width,
 * exact piece ends, cuts at changes of base material and plain polygon geometry.
 * Tolerances (derived; docs/engine.md §10), measured on about 1,600 random circles and given a
 * margin: at 400 slices the two agree to 0.05 % at worst and 1e-6 at the median, the reference's
 * own resolution; at the default 50 slices to 0.1 % at worst and 3e-5 at the median, the
 * engine's slice resolution.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { analyzeCircle, validateSection } from "@/lib/stability";
import { referenceFactors } from "./reference/reference-fs";
import { circleIn, placeCircle, randomSection } from "./reference/random-section";

/** Compares the engine at `slices` with the reference on random circles; returns the sorted errors. */
function compare(slices: number, worst: number, runs: number): number[] {
  const errors: number[] = [];
  fc.assert(
    fc.property(randomSection, circleIn, (s, drawn) => {
      const v = validateSection(s.doc);
      expect(v.ok).toBe(true);
      if (!v.ok) return;
      const c = placeCircle(drawn, s.groundAt);
      const e = analyzeCircle({ ...v.section, analysis: { slices } }, c);
      if (!e.ok) throw new Error("invalid");
      if (e.fs.bishop === null || e.fs.fellenius === null) return;
      // Near-limit circles (a tiny driving moment, or mα near zero) are ill-conditioned in both.
      if (e.fs.bishop > 20 || (e.minMAlpha ?? 1) < 0.2) return;
      const ref = referenceFactors(v.section, c.xc, c.yc, c.r, 2000);
      const eb = ref.bishop === null ? Infinity : Math.abs(e.fs.bishop / ref.bishop - 1);
      const eo = ref.fellenius === null ? Infinity : Math.abs(e.fs.fellenius / ref.fellenius - 1);
      if (!(eb <= worst && eo <= worst))
        throw new Error(
          `engine ${e.fs.bishop} / ${e.fs.fellenius}, reference ${ref.bishop} / ${ref.fellenius} ` +
            `at ${JSON.stringify(c)}`,
        );
      errors.push(Math.max(eb, eo));
    }),
    { numRuns: runs, seed: 20261202 },
  );
  // Most random circles must reach the comparison, not be skipped.
  expect(errors.length).toBeGreaterThan(runs / 3);
  return errors.sort((a, b) => a - b);
}

describe("engine = reference implementation on random sections", () => {
  test("400 slices: within 0.1 % each, 1e-5 at the median", () => {
    const errors = compare(400, 1e-3, 80);
    expect(errors[errors.length >> 1]).toBeLessThan(1e-5);
  }, 120_000);

  test("the default 50 slices: within 0.3 % each, 1e-4 at the median", () => {
    const errors = compare(50, 3e-3, 120);
    expect(errors[errors.length >> 1]).toBeLessThan(1e-4);
  }, 120_000);
});
