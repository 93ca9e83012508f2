import { describe, expect, test } from "vitest";
import { SECTION_LIMITS, sectionLimitErrors } from "@/lib/validations/section-limits";

const square = (n: number) => Array.from({ length: n }, (_, i) => ({ x: i, y: i % 2 }));

describe("sectionLimitErrors(document)", () => {
  test("a section of the usual size (tens of regions and points, common practice) passes", () => {
    const doc = { version: 1, regions: Array.from({ length: 20 }, () => ({ material: "m", points: square(30) })) };
    expect(sectionLimitErrors(doc)).toBeNull();
  });

  test("a region of 20,000 vertices is refused with the region's path and the limit in the message", () => {
    const fields = sectionLimitErrors({ version: 1, regions: [{ material: "m", points: square(20_000) }] });
    expect(Object.keys(fields ?? {})).toContain("document.regions.0.points");
    expect(fields?.["document.regions.0.points"]?.[0]).toContain(String(SECTION_LIMITS.pointsPerRegion));
  });

  test("many regions each under the limit are refused on their total", () => {
    const regions = Array.from({ length: 10 }, () => ({
      material: "m",
      points: square(SECTION_LIMITS.pointsPerRegion),
    }));
    expect(sectionLimitErrors({ version: 1, regions })?.["document.regions"]?.[0]).toMatch(/50000 points together/);
  });

  test("materials, phreatic points and surcharges are bounded; wrong shapes are left to the engine", () => {
    const fields = sectionLimitErrors({
      materials: square(SECTION_LIMITS.materials + 1),
      water: { phreatic: square(SECTION_LIMITS.phreaticPoints + 1) },
      loads: { surcharges: square(SECTION_LIMITS.surcharges + 1) },
    });
    expect(Object.keys(fields ?? {}).sort()).toEqual([
      "document.loads.surcharges",
      "document.materials",
      "document.water.phreatic",
    ]);
    expect(sectionLimitErrors({ regions: "not a list", water: null })).toBeNull();
  });
});
