import { describe, expect, test } from "vitest";
import { deriveUndrainedStrength } from "@/lib/lab";

describe("deriveUndrainedStrength", () => {
  test("UU tests: su = q/2, the radius of the total-stress Mohr circle (ASTM D2850; Craig ch. 4); mean and sample std dev (hand calculation)", () => {
    const r = deriveUndrainedStrength({
      source: "uu",
      model: "constant",
      tests: [
        { deviatorStress: 80, id: "u1" },
        { deviatorStress: 90, id: "u2" },
        { deviatorStress: 100, id: "u3" },
      ],
    });
    expect(r.model).toBe("constant");
    expect(r.points.map((p) => p.su)).toEqual([40, 45, 50]);
    expect(r.su).toBeCloseTo(45, 12);
    expect(r.model === "constant" && r.standardDeviation).toBeCloseTo(5, 12); // √((25 + 0 + 25)/2)
    expect(r.engineFields).toEqual({ su: 45 });
    expect(r.sourceIds).toEqual(["u1", "u2", "u3"]);
  });

  test("vane su rising with depth: su at the ground and gradient, in the engine's su/suGradient/suDatum fields (docs/engine-io.md; hand calculation)", () => {
    // su = 12 + 1.5·z kPa exactly, ground at 100 m.
    const tests = [2, 4, 6, 9].map((z, i) => ({ depth: z, su: 12 + 1.5 * z, specimen: `V${i + 1}` }));
    const r = deriveUndrainedStrength({ source: "vane", model: "linear", tests, groundElevation: 100 });
    if (r.model !== "linear") throw new Error("expected linear");
    expect(r.suDatum).toBe(100);
    expect(r.su).toBeCloseTo(12, 9);
    expect(r.suGradient).toBeCloseTo(1.5, 10);
    // docs/engine-io.md: su(y) = su + suGradient·max(0, suDatum − y) reproduces every test.
    r.points.forEach((p, i) =>
      expect(r.su + r.suGradient * Math.max(0, r.suDatum - (p.elevation as number))).toBeCloseTo(tests[i].su, 9),
    );
    expect(r.line[0]).toEqual([r.su, 100]);
  });

  test("a vane correction factor multiplies su (Bjerrum's μ, a fact of the trade)", () => {
    const r = deriveUndrainedStrength({
      source: "vane",
      model: "constant",
      tests: [{ su: 30 }, { su: 40 }, { su: 50 }],
      vaneCorrectionFactor: 0.8,
    });
    expect(r.su).toBeCloseTo(32, 12);
  });

  test("problems are named: missing strength, depth without a ground level, too few elevations", () => {
    expect(() =>
      deriveUndrainedStrength({
        source: "uu",
        model: "constant",
        tests: [{ deviatorStress: 50 }, { deviatorStress: -1 }],
      }),
    ).toThrow("test 2: deviator stress must be positive");
    expect(() =>
      deriveUndrainedStrength({
        source: "vane",
        model: "linear",
        tests: [
          { su: 20, depth: 1 },
          { su: 25, depth: 3 },
        ],
      }),
    ).toThrow("test 1: depth is given but no ground elevation to turn it into an elevation");
    expect(() =>
      deriveUndrainedStrength({
        source: "vane",
        model: "linear",
        tests: [
          { su: 20, elevation: 5 },
          { su: 25, elevation: 5 },
        ],
      }),
    ).toThrow(/2 different elevations/);
    expect(() =>
      deriveUndrainedStrength({
        source: "vane",
        model: "linear",
        tests: [
          { su: 20, elevation: 5 },
          { su: 30, elevation: 4 },
        ],
        datumElevation: 20,
      }),
    ).toThrow(/choose a lower datum/);
  });

  test("su falling with depth is returned with a warning (the engine's model expects a rise)", () => {
    const r = deriveUndrainedStrength({
      source: "vane",
      model: "linear",
      tests: [
        { su: 30, elevation: 10 },
        { su: 25, elevation: 8 },
        { su: 20, elevation: 6 },
      ],
    });
    expect(r.model === "linear" && r.suGradient).toBeCloseTo(-2.5, 10);
    expect(r.warnings.join(" ")).toMatch(/falls with depth/);
  });
});
