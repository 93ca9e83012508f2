import { describe, expect, it } from "vitest";
import { LabInputError, derivePermeability, permeabilityInputSchema } from "@/lib/lab";

describe("derivePermeability: falling head", () => {
  // Craig's Soil Mechanics, Example 2.1 (quoted from memory): a falling-head test on a specimen
  // 200 mm long and 100 mm in diameter, standpipe 5 mm in diameter, head falls from 1.00 m to
  // 0.35 m in 3 h; the book's answer is k = 4.9 × 10⁻⁸ m/s.
  const craig = {
    method: "falling-head" as const,
    length: 200,
    diameter: 100,
    standpipeDiameter: 5,
    readings: [{ head: 1000, headEnd: 350, time: 3 * 3600 }],
  };

  it("reproduces Craig's worked example to the two figures the book gives", () => {
    const r = derivePermeability(craig);
    expect(r.k).toBeGreaterThan(4.85e-8);
    expect(r.k).toBeLessThan(4.95e-8);
    expect(r.source).toMatch(/Craig/);
  });

  it("takes the geometric mean of readings, as k spreads over orders of magnitude", () => {
    // Halving the time of a second identical reading doubles its k (k ∝ 1/t, Craig's formula):
    // the geometric mean of k and 2k is √2·k.
    const one = derivePermeability(craig).k;
    const two = derivePermeability({
      ...craig,
      readings: [...craig.readings, { head: 1000, headEnd: 350, time: 5400 }],
    });
    expect(two.readings.map((x) => x.k / one)).toEqual([expect.closeTo(1, 9), expect.closeTo(2, 9)]);
    expect(two.k / one).toBeCloseTo(Math.SQRT2, 9);
  });

  it("names the reading whose end head is not below its start head", () => {
    const bad = { ...craig, readings: [craig.readings[0], { specimen: "S-2", head: 300, headEnd: 350, time: 60 }] };
    expect(() => derivePermeability(bad)).toThrow(LabInputError);
    expect(() => derivePermeability(bad)).toThrow(/test 2 \(S-2\): end head must be below the start head/);
  });

  it("refuses a falling-head set without the standpipe diameter at the schema", () => {
    const parsed = permeabilityInputSchema.safeParse({ ...craig, standpipeDiameter: undefined });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0].path).toEqual(["standpipeDiameter"]);
  });
});

describe("derivePermeability: constant head", () => {
  // Das, Principles of Geotechnical Engineering, constant-head example (quoted from memory):
  // L = 300 mm, A = 175 cm², head difference 500 mm, 350 cm³ collected in 5 min; k = 0.004 cm/s
  // = 4 × 10⁻⁵ m/s. The diameter here gives A = 175 cm² exactly.
  const diameter = Math.sqrt((17500 * 4) / Math.PI);
  const das = {
    method: "constant-head" as const,
    length: 300,
    diameter,
    readings: [{ head: 500, time: 300, volume: 350 }],
  };

  it("reproduces the worked example's k = 4 × 10⁻⁵ m/s", () => {
    expect(derivePermeability(das).k).toBeCloseTo(4e-5, 12);
  });

  it("warns that a fine soil is better tested by falling head", () => {
    const slow = { ...das, readings: [{ head: 500, time: 300, volume: 0.0035 }] };
    expect(derivePermeability(slow).warnings.join(" ")).toMatch(/falling-head/);
  });

  it("names a reading with no volume", () => {
    expect(() => derivePermeability({ ...das, readings: [{ head: 500, time: 300 }] })).toThrow(
      /test 1: volume collected must be a finite number/,
    );
  });
});
