import { describe, expect, test } from "vitest";
import { deriveTriaxialCuStrength } from "@/lib/lab";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import { suggestedValues } from "@/lib/materials/sources";

const RAD = Math.PI / 180;

/**
 * Hand calculation with the Mohr–Coulomb failure criterion in principal stresses,
 * σ1 = σ3·tan²(45° + φ/2) + 2c·tan(45° + φ/2) (Craig's Soil Mechanics, ch. 4), for an
 * R envelope cR = 10 kPa, φR = 15°: tan 52.5° = 1.303225, tan² = 1.698396, so
 * σ3c = 100 → σ1 = 195.904 (q = 95.904); 200 → 365.744 (q = 165.744); 400 → 705.423 (q = 305.423).
 */
const cR = 10;
const phiR = 15;
function qAtFailure(s3: number): number {
  const k = Math.tan((45 + phiR / 2) * RAD);
  return s3 * k * k + 2 * cR * k - s3;
}

describe("R envelope (cR, φR) from CU triaxial sets: total-stress Mohr circles at failure", () => {
  test("the hand-calculated q values are those of the criterion (check of the check)", () => {
    expect(qAtFailure(100)).toBeCloseTo(95.904, 2);
    expect(qAtFailure(200)).toBeCloseTo(165.744, 2);
    expect(qAtFailure(400)).toBeCloseTo(305.423, 2);
  });

  for (const space of ["s-t", "p-q"] as const)
    test(`circles lying on cR = 10 kPa, φR = 15° give back that envelope (${space} fit)`, () => {
      // Pore pressures are those of an effective envelope; the R envelope must not depend on them.
      const specimens = [100, 200, 400].map((s3, i) => ({
        specimen: `CU-${i + 1}`,
        cellPressure: s3,
        deviatorStress: Number(qAtFailure(s3).toFixed(3)),
        porePressure: 0.4 * s3,
      }));
      const r = deriveTriaxialCuStrength({ specimens, space });
      expect(r.totalStress).toBeTruthy();
      expect(r.totalStress!.cohesion).toBeCloseTo(cR, 1);
      expect(r.totalStress!.frictionAngle).toBeCloseTo(phiR, 2);
      expect(r.totalStress!.fit.rSquared).toBeCloseTo(1, 9);
    });

  test("the back pressure is taken off the cell pressure: σ3c = σ3 − back pressure", () => {
    const specimens = [100, 200, 400].map((s3) => ({
      cellPressure: s3 + 300,
      deviatorStress: Number(qAtFailure(s3).toFixed(3)),
      porePressure: 300 + 0.4 * s3,
    }));
    const r = deriveTriaxialCuStrength({ specimens, space: "s-t", backPressure: 300 });
    expect(r.totalStress!.cohesion).toBeCloseTo(cR, 1);
    expect(r.totalStress!.frictionAngle).toBeCloseTo(phiR, 2);
    // The effective envelope is unchanged by the back pressure (σ3' = σ3 − u either way).
    const without = deriveTriaxialCuStrength({
      specimens: specimens.map((s) => ({
        ...s,
        cellPressure: s.cellPressure - 300,
        porePressure: s.porePressure - 300,
      })),
      space: "s-t",
    });
    expect(r.frictionAngle).toBeCloseTo(without.frictionAngle, 9);
  });

  test("a back pressure at or above a cell pressure is refused, naming the specimen row", () => {
    const out = checkAndDeriveLabTest("triaxial-cu", {
      space: "s-t",
      backPressure: 250,
      specimens: [
        { cellPressure: 250, deviatorStress: 100, porePressure: 200 },
        { cellPressure: 400, deviatorStress: 180, porePressure: 300 },
      ],
    });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems[0]).toMatchObject({ row: 1, column: "cellPressure" });
  });

  test("the set offers cR and φR to a material, rounded as design values, beside c' and φ'", () => {
    const specimens = [100, 200, 400].map((s3) => ({
      cellPressure: s3,
      deviatorStress: Number(qAtFailure(s3).toFixed(3)),
      porePressure: 0.4 * s3,
    }));
    const out = checkAndDeriveLabTest("triaxial-cu", { space: "s-t", specimens });
    if (!out.ok) throw new Error("derive failed");
    const offers = suggestedValues(out.record);
    expect(offers.map((o) => o.label)).toEqual(["c' and φ'", "cR and φR (R envelope, staged drawdown)"]);
    expect(offers[1].values).toEqual({ cR: 10, phiR: 15 });
  });
});
