/**
 * The lognormal reliability index against its closed form (docs/probabilistic.md "Checks").
 * If ln FS is normal with mean λ and standard deviation ζ, then ζ² = ln(1 + V²) and
 * λ = ln μ − ζ²/2 (moments of the lognormal distribution, common practice), so
 * βLN = λ/ζ = ln(μ/√(1 + V²))/√(ln(1 + V²)) and pf = Φ(−βLN) exactly; Duncan (2000) uses this βLN.
 * On a φ = 0 slope with uniform su, both methods give FS = su·L/D on a fixed circle, so a
 * lognormal su makes FS exactly lognormal with V = sd/mean of su.
 */
import { describe, expect, test } from "vitest";
import { betaLognormalOf, normalCdf } from "@/lib/stability/probabilistic";
import { binomialSe, loadDoc, run } from "./helpers";

describe("betaLognormalOf(mean, sd) is λ/ζ of the lognormal with that mean and sd", () => {
  test.each([
    [0.2, 0.1],
    [0.5, 0.3],
    [0.05, 0.02],
    [-0.1, 0.25],
  ])("λ = %s, ζ = %s", (lambda, zeta) => {
    const mean = Math.exp(lambda + (zeta * zeta) / 2);
    const sd = mean * Math.sqrt(Math.exp(zeta * zeta) - 1);
    expect(Math.abs(betaLognormalOf(mean, sd) - lambda / zeta)).toBeLessThan(1e-12);
  });
});

describe("a lognormal su on a φ = 0 slope makes FS lognormal", () => {
  const doc = loadDoc("lognormal-undrained-slope.json");
  const su = doc.materials[0].su as number;
  const sdSu = (doc.materials[0].vary as { su: { sd: number } }).su.sd;
  const V = sdSu / su;
  const r = run(doc);

  test.each(["bishop", "fellenius"] as const)("%s: β and pf against the closed form", (m) => {
    const mu = r.results[m]?.fs as number; // FS at the mean su: the mean of FS, FS being proportional to su
    const zeta = Math.sqrt(Math.log(1 + V * V));
    const beta = (Math.log(mu) - (zeta * zeta) / 2) / zeta;
    const pfExact = normalCdf(-beta);
    const p = r.probabilistic[m];
    if (!p || p.pf === null) throw new Error("no result");
    expect(Math.abs(p.pf - pfExact)).toBeLessThanOrEqual(4 * binomialSe(pfExact, p.valid));
    // βLN from the sample moments: their sampling error over 20,000 samples is about 0.01.
    expect(Math.abs((p.betaLognormal as number) - beta)).toBeLessThan(0.05);
    // Taylor series: FS is linear in su, so ΔF/2 = V·μ and the estimate is the closed form itself.
    expect(Math.abs((p.fosm.betaLognormal as number) - beta)).toBeLessThan(1e-9);
    expect(Math.abs((p.fosm.pfLognormal as number) - pfExact)).toBeLessThan(1e-9);
  });
});
