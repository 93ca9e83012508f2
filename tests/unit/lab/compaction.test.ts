import { describe, expect, test } from "vitest";
import { deriveCompactionCurve, zeroAirVoidsDensity } from "@/lib/lab";

// Craig's Soil Mechanics, standard compaction test example (from memory, values not re-read): mould
// 1000 cm³, bulk masses 2010/2092/2114/2100/2055 g at w 12.8/14.5/15.6/16.8/19.2 %; the book reads
// w_opt ≈ 15 % and ρd,max ≈ 1.83 Mg/m³ off the plotted curve.
const craigPoints = [
  { moistureContent: 12.8, bulkDensity: 2.01, id: "c1" },
  { moistureContent: 14.5, bulkDensity: 2.092, id: "c2" },
  { moistureContent: 15.6, bulkDensity: 2.114, id: "c3" },
  { moistureContent: 16.8, bulkDensity: 2.1, id: "c4" },
  { moistureContent: 19.2, bulkDensity: 2.055, id: "c5" },
];

describe("deriveCompactionCurve", () => {
  test("Craig's compaction example (from memory): w_opt ≈ 15 %, ρd,max ≈ 1.83 Mg/m³", () => {
    const r = deriveCompactionCurve({ points: craigPoints, specificGravity: 2.73 });
    expect(Math.abs(r.optimumMoistureContent - 15)).toBeLessThan(0.6);
    expect(Math.abs(r.maxDryDensity - 1.83)).toBeLessThan(0.01);
    // ρd = ρ/(1 + w): hand calculation for the first point
    expect(r.points[0].y).toBeCloseTo(2.01 / 1.128, 12);
    expect(r.sourceIds).toEqual(["c1", "c2", "c3", "c4", "c5"]);
  });

  test("an exact parabola gives its vertex and its 95 % crossings (ASTM D698: the peak of the curve; hand calculation)", () => {
    const ws = [10, 12, 14, 16, 18];
    const r = deriveCompactionCurve({
      points: ws.map((w) => ({ moistureContent: w, dryDensity: 1.9 - 0.002 * (w - 14) ** 2 })),
    });
    expect(r.optimumMoistureContent).toBeCloseTo(14, 9);
    expect(r.maxDryDensity).toBeCloseTo(1.9, 12);
    const half = Math.sqrt((0.05 * 1.9) / 0.002); // 0.002·Δw² = 5 % of 1.9
    expect(r.acceptance.dryDensity).toBeCloseTo(0.95 * 1.9, 12);
    expect(r.acceptance.dryLimit.moistureContent).toBeCloseTo(14 - half, 8);
    expect(r.acceptance.wetLimit.moistureContent).toBeCloseTo(14 + half, 8);
    expect(r.acceptance.dryLimit.extrapolated).toBe(true); // 7.1 % lies outside the tested 10–18 %
    expect(r.warnings.join(" ")).toMatch(/dry-side limit/);
    const r90 = deriveCompactionCurve({
      points: ws.map((w) => ({ moistureContent: w, dryDensity: 1.9 - 0.002 * (w - 14) ** 2 })),
      acceptancePercent: 99,
    });
    expect(r90.acceptance.wetLimit.moistureContent).toBeCloseTo(14 + Math.sqrt(0.019 / 0.002), 8);
    expect(r90.acceptance.wetLimit.extrapolated).toBe(false);
  });

  test("zero-air-voids line ρd = Gs·ρw/(1 + w·Gs) (Craig ch. 1; Das): Gs 2.70, w 20 % → 1.7532 Mg/m³ (hand calculation)", () => {
    expect(zeroAirVoidsDensity(20, 2.7)).toBeCloseTo(2.7 / 1.54, 12);
    const r = deriveCompactionCurve({ points: craigPoints });
    r.zeroAirVoids.forEach(([w, rho]) => expect(rho).toBeCloseTo(2.7 / (1 + (w / 100) * 2.7), 12));
    r.curve.forEach(([w], i) => expect(w).toBe(r.zeroAirVoids[i][0]));
  });

  test("unit weights at the optimum follow γ = ρd(1 + w)g and γsat = (Gs + e)γw/(1 + e), e = Gs·ρw/ρd − 1 (hand calculation)", () => {
    const r = deriveCompactionCurve({ points: craigPoints, specificGravity: 2.7 });
    const rho = r.maxDryDensity;
    const w = r.optimumMoistureContent / 100;
    const e = 2.7 / rho - 1;
    expect(r.voidRatio).toBeCloseTo(e, 12);
    expect(r.unitWeight).toBeCloseTo(rho * (1 + w) * 9.81, 10);
    expect(r.saturatedUnitWeight).toBeCloseTo(((2.7 + e) * 9.81) / (1 + e), 10);
    expect(r.degreeOfSaturation).toBeCloseTo((w * 2.7) / e, 12);
    // γsat = (Gs + e)γw/(1 + e) also equals ρd·g + n·γw with n = e/(1 + e) (Craig ch. 1 phase relations)
    expect(r.saturatedUnitWeight).toBeCloseTo(rho * 9.81 + (e / (1 + e)) * 9.81, 10);
  });

  test("bulk density with w gives the same result as the equivalent dry density", () => {
    const dry = craigPoints.map((p) => ({
      moistureContent: p.moistureContent,
      dryDensity: p.bulkDensity / (1 + p.moistureContent / 100),
    }));
    const a = deriveCompactionCurve({ points: craigPoints });
    const b = deriveCompactionCurve({ points: dry });
    expect(b.maxDryDensity).toBeCloseTo(a.maxDryDensity, 12);
    expect(b.optimumMoistureContent).toBeCloseTo(a.optimumMoistureContent, 10);
  });

  test("an unbracketed peak, missing densities, kg/m³ values and points above the zero-air-voids line are reported", () => {
    const rising = [10, 12, 14].map((w, i) => ({ moistureContent: w, dryDensity: 1.7 + 0.05 * i }));
    expect(() => deriveCompactionCurve({ points: rising })).toThrow(/not bracketed; add a wetter test/);
    expect(() => deriveCompactionCurve({ points: [...craigPoints.slice(0, 4), { moistureContent: 20 }] })).toThrow(
      "test 5: dry density or bulk density is needed",
    );
    expect(() =>
      deriveCompactionCurve({ points: craigPoints.map((p) => ({ ...p, bulkDensity: p.bulkDensity * 1000 })) }),
    ).toThrow(/not plausible in Mg\/m³/);
    const tooDense = deriveCompactionCurve({
      points: [
        { moistureContent: 10, dryDensity: 1.9 },
        { moistureContent: 14, dryDensity: 2.05 },
        { moistureContent: 18, dryDensity: 1.9 },
      ],
    });
    expect(tooDense.warnings.join(" ")).toMatch(/test 3 plots above the zero-air-voids line/);
  });
});
