/**
 * Target β in words (lib/probabilistic/targets.ts) and the panel's request (request.ts).
 * Sources of the checks:
 * - Φ(−β) against the standard normal table: Φ(−2) = 0.02275, Φ(−3) = 0.00135, Φ(−4) = 3.17e-5
 *   (Abramowitz & Stegun, Handbook of Mathematical Functions, Table 26.1).
 * - The levels of expected performance against β and their probabilities: U.S. Army Corps of Engineers
 *   (ETL 1110-2-547, 1997) as reproduced in Kar, "Probabilistic based reliability analysis of a finite
 *   soil slope", Table 1: hazardous 1.0 (0.16), unsatisfactory 1.5 (0.07), poor 2.0 (0.023), below
 *   average 2.5 (0.006), above average 3.0 (0.001), good 4.0 (0.00003), high 5.0 (0.0000003).
 * - Bad input: φ′ with a normal spread so wide that most samples are negative is meaningless
 *   (φ′ < 0 is not a friction angle: a fact of the trade); the sample bounds are the engine's.
 */
import { describe, expect, it } from "vitest";
import { buildDemoSection } from "@/db/seeds/demo-section";
import { documentForRun } from "@/lib/analysis/run-setup";
import { MAX_SAMPLES, runProbabilistic } from "@/lib/stability";
import { performanceLevel, pfOfBeta, reliabilityVerdict } from "@/lib/probabilistic/targets";
import {
  probabilisticDocument,
  probabilisticRequestSchema,
  requestFieldErrors,
  type ProbabilisticRequest,
} from "@/lib/probabilistic/request";
import { quickSetup } from "../../support/runs";

describe("target reliability index", () => {
  it("puts a β at its level of expected performance", () => {
    expect(performanceLevel(0.5).level).toBe("below the hazardous level");
    expect(performanceLevel(1.0).level).toBe("hazardous");
    expect(performanceLevel(2.2)).toEqual({ level: "poor", from: 2.0, to: 2.5 });
    expect(performanceLevel(3.4)).toEqual({ level: "above average", from: 3.0, to: 4.0 });
    expect(performanceLevel(6)).toEqual({ level: "high", from: 5.0, to: null });
  });

  it("turns β into pf as Φ(−β), as the table does", () => {
    expect(pfOfBeta(2)).toBeCloseTo(0.02275, 5);
    expect(pfOfBeta(3)).toBeCloseTo(0.00135, 5);
    expect(pfOfBeta(4)).toBeCloseTo(3.17e-5, 7);
  });

  it("gives the table's probabilities to the precision the table prints them", () => {
    // U.S. Army Corps of Engineers (1997) as reproduced in Kar, Table 1 (see the header).
    // [β, pf as printed, significant figures printed]
    const table: [number, number, number][] = [
      [1.0, 0.16, 2],
      [1.5, 0.07, 1],
      [2.0, 0.023, 2],
      [2.5, 0.006, 1],
      [3.0, 0.001, 1],
      [4.0, 0.00003, 1],
      [5.0, 0.0000003, 1],
    ];
    for (const [beta, pf, figures] of table) expect(Number(pfOfBeta(beta).toPrecision(figures))).toBeCloseTo(pf, 12);
  });

  it("judges the lower of the two forms of β against the target, in words", () => {
    const below = reliabilityVerdict({ betaNormal: 3.4, betaLognormal: 2.6, pf: 0.004, valid: 10_000, target: 3 });
    expect(below.beta).toBe(2.6);
    expect(below.meets).toBe(false);
    expect(below.sentence).toContain("below the project's target of 3.00");
    expect(below.sentence).toContain('"below average"');
    const above = reliabilityVerdict({ betaNormal: 4.2, betaLognormal: 4.6, pf: 0, valid: 5_000, target: 3 });
    expect(above.meets).toBe(true);
    expect(above.sentence).toContain("at or above the project's target");
    expect(above.sentence).toContain("No sample of 5,000 failed");
    expect(reliabilityVerdict({ betaNormal: null, betaLognormal: null, pf: null, valid: 0, target: 3 }).meets).toBe(
      null,
    );
  });
});

const demo = buildDemoSection();
const runDoc = documentForRun(demo, quickSetup(demo, "downstream"));

const request = (over: Partial<ProbabilisticRequest> = {}): ProbabilisticRequest => ({
  samples: 200,
  seed: 7,
  sampling: "latin-hypercube",
  mode: "critical-surface",
  materials: { fill: { phi: { dist: "normal", sd: 2 }, c: { dist: "lognormal", sd: 3 } } },
  ...over,
});

describe("the panel's request", () => {
  it("refuses more samples than the mode allows, naming both numbers", () => {
    const r = probabilisticRequestSchema.safeParse(request({ mode: "full-search", samples: 5_000 }));
    expect(r.success).toBe(false);
    const issue = r.error!.issues[0];
    expect(issue.path).toEqual(["samples"]);
    expect(issue.message).toContain("5,000");
    expect(issue.message).toContain(MAX_SAMPLES["full-search"].toLocaleString("en-US"));
    expect(probabilisticRequestSchema.safeParse(request({ samples: MAX_SAMPLES["critical-surface"] })).success).toBe(
      true,
    );
  });

  it("names the material and the quantity whose spread makes most φ′ samples negative", () => {
    const doc = probabilisticDocument(runDoc, request({ materials: { fill: { phi: { dist: "normal", sd: 40 } } } }));
    const fields = requestFieldErrors(doc);
    expect(Object.keys(fields)).toEqual(["materials.fill.phi"]);
    expect(fields["materials.fill.phi"][0]).toContain("'fill' φ′");
    expect(fields["materials.fill.phi"][0]).toMatch(/would fall outside/);
  });

  it("refuses a material the run does not have", () => {
    expect(() => probabilisticDocument(runDoc, request({ materials: { nowhere: {} } }))).toThrow(
      /no material 'nowhere'/,
    );
  });

  it("makes a document the engine runs: the demo downstream face, seeded and repeatable", () => {
    const doc = probabilisticDocument(runDoc, request());
    expect(requestFieldErrors(doc)).toEqual({});
    const a = runProbabilistic(doc);
    const b = runProbabilistic(doc);
    if (!a.ok || !b.ok) throw new Error("the demo run failed");
    expect(a.probabilisticRun.samplesDone).toBe(200);
    expect(a.probabilistic.bishop!.meanFs).toBe(b.probabilistic.bishop!.meanFs);
    // The run's own document is untouched: the spreads live only in the job's copy.
    expect((runDoc.materials[0] as { vary?: unknown }).vary).toBeUndefined();
  });
});
