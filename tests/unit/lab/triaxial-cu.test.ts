import { describe, expect, test } from "vitest";
import fc from "fast-check";
import { deriveTriaxialCuStrength, toMohrCoulomb } from "@/lib/lab";

const DEG = 180 / Math.PI;

// Craig's Soil Mechanics, consolidated-undrained tests with pore pressure (from memory, values not
// re-read): σ3 150/300/450 kPa, σ1 − σ3 at failure 192/341/504 kPa, u 80/154/222 kPa; the book's
// Mohr-circle answer is about c' = 16 kPa, φ' = 29°.
const craigSpecimens = [
  { cellPressure: 150, deviatorStress: 192, porePressure: 80, id: "cu-1" },
  { cellPressure: 300, deviatorStress: 341, porePressure: 154, id: "cu-2" },
  { cellPressure: 450, deviatorStress: 504, porePressure: 222, id: "cu-3" },
];

describe("deriveTriaxialCuStrength", () => {
  test("Craig's CU example (from memory): c' ≈ 16 kPa, φ' ≈ 29° in s'–t space", () => {
    const r = deriveTriaxialCuStrength({ specimens: craigSpecimens, space: "s-t" });
    expect(Math.abs(r.frictionAngle - 29)).toBeLessThan(1.5);
    expect(Math.abs(r.cohesion - 16)).toBeLessThan(3);
    expect(r.sourceIds).toEqual(["cu-1", "cu-2", "cu-3"]);
  });

  test("s'–t points and line match a hand calculation of the same data", () => {
    const r = deriveTriaxialCuStrength({ specimens: craigSpecimens, space: "s-t" });
    // hand calculation: σ3' = 70, 146, 228; σ1' = 262, 487, 732
    expect(r.points.map((p) => [p.x, p.y])).toEqual([
      [166, 96],
      [316.5, 170.5],
      [480, 252],
    ]);
    expect(r.points.map((p) => [p.sigma3Effective, p.sigma1Effective])).toEqual([
      [70, 262],
      [146, 487],
      [228, 732],
    ]);
    const xs = [166, 316.5, 480];
    const ys = [96, 170.5, 252];
    const mx = (166 + 316.5 + 480) / 3;
    const my = (96 + 170.5 + 252) / 3;
    const b = xs.reduce((s, x, i) => s + (x - mx) * (ys[i] - my), 0) / xs.reduce((s, x) => s + (x - mx) ** 2, 0);
    expect(r.lineSlope).toBeCloseTo(b, 12);
    expect(r.frictionAngle).toBeCloseTo(Math.asin(b) * DEG, 10);
    expect(r.cohesion).toBeCloseTo((my - b * mx) / Math.cos(Math.asin(b)), 9);
  });

  test("p'–q conversion: M = 6 sin φ'/(3 − sin φ') and k = 6c' cos φ'/(3 − sin φ') invert (Wood 1990, triaxial compression)", () => {
    const phi = 30 / DEG;
    const M = (6 * Math.sin(phi)) / (3 - Math.sin(phi)); // 1.2 for φ' = 30°
    expect(M).toBeCloseTo(1.2, 12);
    const k = (6 * 10 * Math.cos(phi)) / (3 - Math.sin(phi));
    const back = toMohrCoulomb("p-q", k, M);
    expect(back.frictionAngle).toBeCloseTo(30, 10);
    expect(back.cohesion).toBeCloseTo(10, 10);
    expect(() => toMohrCoulomb("p-q", 0, 3.2)).toThrow(/between 0 and 3/);
    expect(() => toMohrCoulomb("s-t", 0, 1.1)).toThrow(/between 0 and 1/);
  });

  test("property: for exact Mohr–Coulomb failures p'–q and s'–t fits give the same c', φ' (σ1' = σ3'·N + 2c'√N)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 60, noNaN: true }),
        fc.double({ min: 15, max: 42, noNaN: true }),
        fc.uniqueArray(fc.integer({ min: 20, max: 900 }), { minLength: 2, maxLength: 6 }),
        fc.double({ min: -50, max: 300, noNaN: true }),
        (c, phiDeg, sigma3s, u) => {
          const sinPhi = Math.sin(phiDeg / DEG);
          const N = (1 + sinPhi) / (1 - sinPhi); // Rankine's passive coefficient, Craig ch. 4
          const specimens = sigma3s.map((s3) => ({
            cellPressure: s3 + Math.max(u, 0),
            porePressure: Math.max(u, 0),
            deviatorStress: s3 * N + 2 * c * Math.sqrt(N) - s3,
          }));
          const pq = deriveTriaxialCuStrength({ specimens, space: "p-q" });
          const st = deriveTriaxialCuStrength({ specimens, space: "s-t" });
          expect(pq.frictionAngle).toBeCloseTo(phiDeg, 7);
          expect(st.frictionAngle).toBeCloseTo(phiDeg, 7);
          expect(pq.cohesion).toBeCloseTo(c, 5);
          expect(st.cohesion).toBeCloseTo(pq.cohesion, 5);
          expect(pq.fit.rSquared).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  test("bad specimens are named with their label", () => {
    expect(() =>
      deriveTriaxialCuStrength({
        specimens: [...craigSpecimens, { cellPressure: 100, deviatorStress: 50, porePressure: 120, specimen: "T4" }],
        space: "p-q",
      }),
    ).toThrow("test 4 (T4): effective cell pressure σ3 − u must be positive");
    expect(() =>
      deriveTriaxialCuStrength({
        specimens: [{ cellPressure: 100, deviatorStress: 0, porePressure: 0 }, craigSpecimens[0]],
        space: "p-q",
      }),
    ).toThrow("test 1: deviator stress must be positive");
    expect(() => deriveTriaxialCuStrength({ specimens: craigSpecimens, space: "x" as "p-q" })).toThrow(/space/);
  });
});
