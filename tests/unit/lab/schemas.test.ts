import { describe, expect, test } from "vitest";
import {
  atterbergInputSchema,
  compactionInputSchema,
  directShearInputSchema,
  triaxialCuInputSchema,
  undrainedStrengthInputSchema,
} from "@/lib/lab";

describe("lab zod schemas (what the server stores)", () => {
  test("accept well-formed sets and keep ids and specimen labels", () => {
    const ds = directShearInputSchema.parse({
      tests: [
        { id: "a", specimen: "S1", normalStress: 50, shearStress: 40 },
        { normalStress: 100, shearStress: 70 },
      ],
    });
    expect(ds.tests[0]).toEqual({ id: "a", specimen: "S1", normalStress: 50, shearStress: 40 });
    expect(
      triaxialCuInputSchema.safeParse({
        space: "s-t",
        specimens: [
          { cellPressure: 100, deviatorStress: 90, porePressure: 40 },
          { cellPressure: 200, deviatorStress: 150, porePressure: 80 },
        ],
      }).success,
    ).toBe(true);
    expect(
      compactionInputSchema.safeParse({
        points: [
          { moistureContent: 10, dryDensity: 1.8 },
          { moistureContent: 12, bulkDensity: 2.0 },
          { moistureContent: 14, dryDensity: 1.8 },
        ],
      }).success,
    ).toBe(true);
    expect(atterbergInputSchema.safeParse({ liquidLimit: 40, plasticLimit: 20 }).success).toBe(true);
  });

  test("refuse NaN, Infinity, negative stresses, unknown spaces and missing densities, with the path", () => {
    const bad = directShearInputSchema.safeParse({
      tests: [
        { normalStress: Number.NaN, shearStress: 40 },
        { normalStress: 100, shearStress: Infinity },
      ],
    });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues.map((i) => i.path.join("."))).toEqual(["tests.0.normalStress", "tests.1.shearStress"]);
    expect(triaxialCuInputSchema.safeParse({ space: "q-p", specimens: [] }).success).toBe(false);
    const noDensity = compactionInputSchema.safeParse({
      points: [
        { moistureContent: 10 },
        { moistureContent: 12, dryDensity: 1.8 },
        { moistureContent: 14, dryDensity: 1.7 },
      ],
    });
    expect(noDensity.error?.issues[0].path).toEqual(["points", 0, "dryDensity"]);
  });

  test("undrained sets need the strength their source uses", () => {
    const r = undrainedStrengthInputSchema.safeParse({ source: "uu", model: "constant", tests: [{ su: 20 }] });
    expect(r.error?.issues[0].path).toEqual(["tests", 0, "deviatorStress"]);
    expect(
      undrainedStrengthInputSchema.safeParse({
        source: "vane",
        model: "linear",
        groundElevation: 10,
        tests: [
          { su: 20, depth: 1 },
          { su: 25, depth: 3 },
        ],
      }).success,
    ).toBe(true);
  });
});
