/**
 * The Taylor-series (FOSM) estimate against a published figure.
 *
 * Source, and its limits: Duncan (2000), "Factors of safety and reliability in geotechnical
 * engineering", J. Geotech. Geoenviron. Eng. 126(4), works the lognormal reliability index for a
 * most-likely factor of safety F_MLV = 1.50 with a coefficient of variation V_F = 0.17 and gets
 * βLN = 2.32, pf ≈ 1 %. The paper itself was not at hand: the search tool reached only its first
 * page. These figures are as quoted secondhand, in a public repository's validation notes that
 * cite the paper; Duncan's full worked slope examples (the Taylor-series table of ΔF per variable)
 * could not be found, so they are not checked here and are not quoted from memory.
 *
 * The case: on a φ = 0 slope with uniform su, FS = su·L/D on a fixed circle, so FS is linear in su,
 * the Taylor series' ΔF/2 is exactly V·F, and scaling su sets F_MLV = 1.50 and V_F = 0.17.
 */
import { describe, expect, test } from "vitest";
import { loadDoc, run } from "../probabilistic/helpers";

describe("Taylor series against Duncan (2000): F_MLV = 1.50, V_F = 0.17 gives βLN = 2.32, pf ≈ 1 %", () => {
  const base = loadDoc("lognormal-undrained-slope.json");
  const fs0 = run(base).results.bishop!.fs;
  const doc = structuredClone(base);
  const su = (base.materials[0].su as number) * (1.5 / fs0);
  doc.materials[0].su = su;
  doc.materials[0].vary = { su: { dist: "normal", sd: 0.17 * su } };
  doc.analysis.probabilistic = { ...doc.analysis.probabilistic, samples: 1000, seed: 5 };
  const r = run(doc);

  test.each(["bishop", "fellenius"] as const)("%s", (m) => {
    const f = r.probabilistic[m]!.fosm;
    expect(f.fs).toBeCloseTo(r.results[m]!.fs, 9);
    expect(f.cov).toBeCloseTo(0.17, 9);
    if (m === "bishop") {
      expect(f.fs).toBeCloseTo(1.5, 9);
      // Published to two decimals.
      expect(Math.abs(f.betaLognormal! - 2.32)).toBeLessThan(0.005);
      expect(Math.abs(f.pfLognormal! - 0.01)).toBeLessThan(0.001);
    }
  });
});
