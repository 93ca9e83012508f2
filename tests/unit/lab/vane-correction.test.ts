import { describe, expect, test } from "vitest";
import { bjerrumMu, deriveUndrainedStrength } from "@/lib/lab";
import { buildLabInput, labInputToRows, DEFAULT_LAB_OPTIONS } from "@/lib/materials/lab-rows";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";

describe("Bjerrum's (1972) vane correction μ(PI)", () => {
  test("follows Bjerrum's curve: about 1.0 at PI 20, 0.85 at 40, 0.75 at 60, 0.65 at 100 (values from memory)", () => {
    // Points read from memory of the curve as reproduced in textbooks; not re-read from the paper.
    expect(bjerrumMu(20)).toBeCloseTo(1.0, 1);
    expect(Math.abs(bjerrumMu(40) - 0.85)).toBeLessThan(0.03);
    expect(Math.abs(bjerrumMu(60) - 0.75)).toBeLessThan(0.03);
    expect(Math.abs(bjerrumMu(100) - 0.65)).toBeLessThan(0.04);
    // Falls as PI rises, as the curve does.
    for (let pi = 6; pi <= 120; pi++) expect(bjerrumMu(pi)).toBeLessThan(bjerrumMu(pi - 1));
  });

  test("is not extrapolated outside the curve's range of PI", () => {
    expect(bjerrumMu(2)).toBeNaN();
    expect(bjerrumMu(150)).toBeNaN();
  });

  test("is applied only when chosen; each reading keeps its measured value beside the corrected one", () => {
    const tests = [
      { su: 20, specimen: "V1" },
      { su: 30, specimen: "V2" },
    ];
    const raw = deriveUndrainedStrength({ source: "vane", model: "constant", tests });
    expect(raw.su).toBe(25);
    expect(raw.vaneCorrection).toEqual({ basis: "none", factor: 1 });

    const r = deriveUndrainedStrength({ source: "vane", model: "constant", tests, vanePlasticityIndex: 40 });
    const mu = 1.7 - 0.54 * Math.log10(40);
    expect(r.vaneCorrection).toEqual({ basis: "bjerrum", factor: mu, plasticityIndex: 40 });
    expect(r.points.map((p) => p.measuredSu)).toEqual([20, 30]);
    expect(r.points[0].su).toBeCloseTo(20 * mu, 12);
    expect(r.su).toBeCloseTo(25 * mu, 12);
  });

  test("a PI outside the curve, or PI together with a typed factor, is refused with words", () => {
    const far = checkAndDeriveLabTest("undrained", {
      source: "vane",
      model: "constant",
      tests: [{ su: 20 }],
      vanePlasticityIndex: 200,
    });
    expect(far.ok).toBe(false);
    if (!far.ok) expect(far.problems[0].message).toMatch(/outside Bjerrum's curve/);
    const both = checkAndDeriveLabTest("undrained", {
      source: "vane",
      model: "constant",
      tests: [{ su: 20 }],
      vanePlasticityIndex: 30,
      vaneCorrectionFactor: 0.9,
    });
    expect(both.ok).toBe(false);
  });

  test("the form's choice round-trips through the stored input", () => {
    const options = { ...DEFAULT_LAB_OPTIONS, source: "vane" as const, vaneCorrection: "bjerrum" as const };
    const missing = buildLabInput(
      "undrained",
      [{ specimen: "V1", depth: "", elevation: "", deviatorStress: "", su: "20" }],
      options,
    );
    expect(missing.ok).toBe(false);
    const built = buildLabInput(
      "undrained",
      [{ specimen: "V1", depth: "", elevation: "", deviatorStress: "", su: "20" }],
      { ...options, vanePlasticityIndex: "35", vaneCorrectionFactor: "0.5" },
    );
    if (!built.ok) throw new Error("build failed");
    // Only the chosen correction is stored.
    expect(built.data.vanePlasticityIndex).toBe(35);
    expect(built.data.vaneCorrectionFactor).toBeUndefined();
    expect(labInputToRows("undrained", built.data).options.vaneCorrection).toBe("bjerrum");
  });
});
