/**
 * The exact case (issue 17 item 4; docs/probabilistic.md "Checks"): a dry slope, the ordinary
 * method of slices on a fixed circle, c′ normal. The ordinary method's FS is
 * Σ(c′·l + N′·tan φ′)/D with N′ = W·cos α independent of c′, so FS = μ + (L/D)(c′ − c̄′) is
 * normal with σ = σc·L/D, and pf = Φ((1 − μ)/σ) exactly (normal distribution closed form,
 * common practice). μ, L and D come from the engine's own slice table, not from this module.
 */
import { spawnSync } from "node:child_process";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { normalCdf } from "@/lib/stability/probabilistic";
import { binomialSe, FIXTURE_DIR, loadDoc, run, sliceReport, withSettings, type Doc } from "./helpers";

const doc = loadDoc("linear-dry-slope.json");
const SD_C = 3.6;

/** μ and σ of FS on the run's critical circle, from the slice table at the mean c′. */
function exactMoments(d: Doc, circle: { xc: number; yc: number; r: number }) {
  const rep = sliceReport(d, circle);
  const mu = rep.fs.fellenius as number;
  const D = rep.drivingSum as number;
  const L = rep.slices.reduce((s, r) => s + r.baseLength, 0);
  return { rep, mu, D, L, sigma: (SD_C * L) / D };
}

describe("FS linear in c′ on a fixed circle (ordinary method, dry)", () => {
  const base = run(doc);
  const circle = base.probabilisticRun.circles?.fellenius;
  if (!circle) throw new Error("no critical circle");
  const { rep, mu, D, L, sigma } = exactMoments(doc, circle);
  const pfExact = normalCdf((1 - mu) / sigma);

  test("the case is linear: no slice's N′ is clamped and FS moves by L/D per kPa of c′", () => {
    expect(rep.slices.every((s) => s.normalOrdinary > 0)).toBe(true);
    const resisting = rep.slices.reduce((s, r) => s + r.resistingOrdinary, 0);
    expect(Math.abs(resisting / D - mu)).toBeLessThan(1e-12);
    const up = JSON.parse(JSON.stringify(doc)) as Doc;
    up.materials[0].c = (up.materials[0].c as number) + 5;
    const moved = sliceReport(up, circle).fs.fellenius as number;
    expect(Math.abs(moved - mu - (5 * L) / D)).toBeLessThan(1e-9);
    expect(pfExact).toBeGreaterThan(0.01); // a pf that 20,000 samples can resolve
  });

  test.each(["monte-carlo", "latin-hypercube"])("%s: pf within 4 binomial standard errors of Φ((1 − μ)/σ)", (s) => {
    const r = s === "monte-carlo" ? base : run(withSettings(doc, { sampling: s }));
    const p = r.probabilistic.fellenius;
    if (!p || p.pf === null || p.meanFs === null || p.sdFs === null) throw new Error("no result");
    const n = p.valid;
    expect(n).toBe(20000);
    expect(Math.abs(p.pf - pfExact)).toBeLessThanOrEqual(4 * binomialSe(pfExact, n));
    // Sample mean within 4 standard errors σ/√n; sample sd within 4·σ/√(2n) (normal theory).
    expect(Math.abs(p.meanFs - mu)).toBeLessThanOrEqual((4 * sigma) / Math.sqrt(n));
    expect(Math.abs(p.sdFs - sigma)).toBeLessThanOrEqual((4 * sigma) / Math.sqrt(2 * n));
    expect(Math.abs((p.betaNormal as number) - (mu - 1) / sigma)).toBeLessThan(0.1);
  });

  test("the Taylor-series estimate is exact for a linear FS: F at the mean and σF = σc·L/D", () => {
    const f = base.probabilistic.fellenius?.fosm;
    expect(Math.abs((f?.fs as number) - mu)).toBeLessThan(1e-12);
    expect(Math.abs((f?.sdFs as number) - sigma)).toBeLessThan(1e-9);
    expect(Math.abs((f?.pfNormal as number) - pfExact)).toBeLessThan(1e-9);
  });

  test("Latin hypercube converges faster than Monte Carlo: smaller error over 20 seeds of 400 samples", () => {
    const err = { "monte-carlo": 0, "latin-hypercube": 0 };
    for (const sampling of ["monte-carlo", "latin-hypercube"] as const) {
      for (let seed = 1; seed <= 20; seed++) {
        const p = run(withSettings(doc, { samples: 400, seed, sampling })).probabilistic.fellenius;
        err[sampling] += ((p?.pf as number) - pfExact) ** 2 + ((p?.meanFs as number) - mu) ** 2;
      }
    }
    // For one stratified variable the LHS error is of order 1/n against 1/√n for Monte Carlo.
    expect(Math.sqrt(err["latin-hypercube"] / 20)).toBeLessThan(0.5 * Math.sqrt(err["monte-carlo"] / 20));
  });

  test("from the command line: scripts/analyze.ts reports the same pf within its sampling error", () => {
    const out = spawnSync("npx", ["tsx", "scripts/analyze.ts", path.join(FIXTURE_DIR, "linear-dry-slope.json")], {
      cwd: path.resolve(__dirname, "../../.."),
      encoding: "utf8",
      timeout: 60_000,
    });
    expect(out.status).toBe(0);
    const r = JSON.parse(out.stdout) as { ok: boolean; probabilistic: { fellenius: { pf: number; samples: number } } };
    expect(r.ok).toBe(true);
    const p = r.probabilistic.fellenius;
    expect(Math.abs(p.pf - pfExact)).toBeLessThanOrEqual(4 * binomialSe(pfExact, p.samples));
  }, 60_000);
});
