import { describe, expect, test } from "vitest";
import { DEFAULT_LAB_OPTIONS, buildLabInput, labInputToRows } from "@/lib/materials/lab-rows";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import { suggestedValues } from "@/lib/materials/sources";
import { formatScientific } from "@/lib/materials/parameter-form";

const reading = (head: string, headEnd: string, time: string, volume = "") => ({
  specimen: "",
  head,
  headEnd,
  time,
  volume,
});

describe("a permeability set typed in the library", () => {
  // Craig's Soil Mechanics, Example 2.1 (quoted from memory): k = 4.9 × 10⁻⁸ m/s.
  const options = {
    ...DEFAULT_LAB_OPTIONS,
    permeabilityMethod: "falling-head" as const,
    specimenLength: "200",
    specimenDiameter: "100",
    standpipeDiameter: "5",
  };

  test("falling head: the table and settings become lib/lab's input, derive Craig's k and offer kh", () => {
    // A stray volume typed on a falling-head row is not stored: that method reads only h1, h2 and t.
    const out = buildLabInput("permeability", [reading("1000", "350", "10800", "12")], options);
    expect(out).toEqual({
      ok: true,
      data: {
        method: "falling-head",
        length: 200,
        diameter: 100,
        standpipeDiameter: 5,
        readings: [{ head: 1000, headEnd: 350, time: 10800 }],
      },
    });
    if (!out.ok) return;
    const derived = checkAndDeriveLabTest("permeability", out.data);
    expect(derived.ok).toBe(true);
    if (!derived.ok) return;
    expect(suggestedValues(derived.record)).toEqual([{ label: "kh", values: { k: 4.9e-8 } }]);
    expect(labInputToRows("permeability", out.data).options).toMatchObject({
      permeabilityMethod: "falling-head",
      specimenLength: "200",
      standpipeDiameter: "5",
    });
  });

  test("a missing specimen length is named as a setting, not a row", () => {
    const out = checkAndDeriveLabTest("permeability", {
      method: "falling-head",
      diameter: 100,
      standpipeDiameter: 5,
      readings: [{ head: 1000, headEnd: 350, time: 10800 }],
    });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems[0]).toMatchObject({ row: null, column: "length" });
  });

  test("k is written as the trade writes it", () => {
    expect(formatScientific(6.31e-9)).toBe("6.31 × 10⁻⁹");
    expect(formatScientific(4.9e-8, 1)).toBe("4.9 × 10⁻⁸");
    expect(formatScientific(1.2e3)).toBe("1.20 × 10³");
  });
});
