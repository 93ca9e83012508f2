import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { LabInputError, deriveDirectShearStrength } from "@/lib/lab";

const DEG = 180 / Math.PI;

describe("deriveDirectShearStrength", () => {
  test("Craig's Soil Mechanics, direct shear on sand (from memory: σn 100/200/300 kPa, peak τ 90/181/270 → φ' ≈ 42°, c' ≈ 0)", () => {
    const r = deriveDirectShearStrength({
      tests: [
        { normalStress: 100, shearStress: 90 },
        { normalStress: 200, shearStress: 181 },
        { normalStress: 300, shearStress: 270 },
      ],
    });
    expect(r.frictionAngle).toBeCloseTo(42, 0);
    expect(Math.abs(r.cohesion)).toBeLessThan(2);
    // hand calculation: slope = Σ(x − x̄)(y − ȳ)/Σ(x − x̄)² = (−100·−90.33 + 0 + 100·89.67)/20000 = 0.9
    expect(Math.tan(r.frictionAngle / DEG)).toBeCloseTo(0.9, 10);
    expect(r.cohesion).toBeCloseTo(180.333333 - 0.9 * 200, 5);
  });

  test("forcing c' = 0 fits tan φ' = Σστ/Σσ² (hand calculation)", () => {
    const tests = [
      { normalStress: 50, shearStress: 30, id: "t1", specimen: "A" },
      { normalStress: 100, shearStress: 62, id: "t2", specimen: "B" },
      { normalStress: 150, shearStress: 88, id: "t3", specimen: "C" },
    ];
    const r = deriveDirectShearStrength({ tests, zeroCohesion: true });
    expect(r.cohesion).toBe(0);
    expect(Math.tan(r.frictionAngle / DEG)).toBeCloseTo((50 * 30 + 100 * 62 + 150 * 88) / (2500 + 10000 + 22500), 12);
    expect(r.sourceIds).toEqual(["t1", "t2", "t3"]);
    expect(r.points[1]).toEqual({ x: 100, y: 62, index: 2, id: "t2", specimen: "B" });
    expect(r.line[0]).toEqual([0, 0]);
    expect(r.line[1][0]).toBe(150);
  });

  test("two tests work with a warning; bad rows are all named", () => {
    const two = deriveDirectShearStrength({
      tests: [
        { normalStress: 50, shearStress: 40 },
        { normalStress: 100, shearStress: 70 },
      ],
    });
    expect(two.cohesion).toBeCloseTo(10, 10); // hand calculation: slope 0.6, c' = 40 − 0.6·50
    expect(two.warnings).toEqual([expect.stringMatching(/3 or more/)]);
    expect(() =>
      deriveDirectShearStrength({
        tests: [
          { normalStress: 50, shearStress: 40 },
          { normalStress: 100, shearStress: 70 },
          { normalStress: -5, shearStress: 10, specimen: "S-3" },
        ],
      }),
    ).toThrow("test 3 (S-3): normal stress must be positive");
    expect(() => deriveDirectShearStrength({ tests: [{ normalStress: 50, shearStress: 40 }] })).toThrow(LabInputError);
    expect(() =>
      deriveDirectShearStrength({
        tests: [
          { normalStress: 50, shearStress: 40 },
          { normalStress: 50, shearStress: 45 },
        ],
      }),
    ).toThrow(/different normal stresses/);
    expect(() =>
      deriveDirectShearStrength({
        tests: [
          { normalStress: 50, shearStress: 40 },
          { normalStress: 100, shearStress: 20 },
        ],
      }),
    ).toThrow(/does not rise/);
  });

  test("property: exact Mohr–Coulomb data give back c' and φ'; scaling σ and τ by k scales c' by k and keeps φ'", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.double({ min: 10, max: 45, noNaN: true }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        fc.uniqueArray(fc.integer({ min: 10, max: 800 }), { minLength: 3, maxLength: 8 }),
        (c, phi, k, sigmas) => {
          const tests = sigmas.map((s) => ({ normalStress: s, shearStress: c + s * Math.tan(phi / DEG) }));
          const base = deriveDirectShearStrength({ tests });
          expect(base.cohesion).toBeCloseTo(c, 6);
          expect(base.frictionAngle).toBeCloseTo(phi, 8);
          const scaled = deriveDirectShearStrength({
            tests: tests.map((t) => ({ normalStress: k * t.normalStress, shearStress: k * t.shearStress })),
          });
          expect(scaled.cohesion).toBeCloseTo(k * base.cohesion, 5);
          expect(scaled.frictionAngle).toBeCloseTo(base.frictionAngle, 8);
        },
      ),
    );
  });
});
