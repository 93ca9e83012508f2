import { describe, expect, test } from "vitest";
import { aLine, classifyAtterbergLimits, uLine } from "@/lib/lab";

const group = (liquidLimit: number, plasticLimit?: number) =>
  classifyAtterbergLimits({ liquidLimit, plasticLimit }).hint.group;

describe("classifyAtterbergLimits: ASTM D2487 plasticity chart rules (fine-grained, inorganic)", () => {
  test("A-line PI = 0.73(LL − 20) and U-line PI = 0.9(LL − 8) (ASTM D2487 Fig. 3; hand calculation)", () => {
    expect(aLine(50)).toBeCloseTo(21.9, 12);
    expect(uLine(50)).toBeCloseTo(37.8, 12);
  });

  test("LL < 50: PI > 7 on or above the A-line → CL; PI 4–7 on or above → CL-ML; below or PI < 4 → ML", () => {
    expect(group(40, 20)).toBe("CL"); // PI 20 ≥ 14.6
    expect(group(22, 16)).toBe("CL-ML"); // PI 6, A-line 1.46
    expect(group(25, 21)).toBe("CL-ML"); // PI 4, the hatched zone's lower edge
    expect(group(30, 25)).toBe("ML"); // PI 5 < A-line 7.3
    expect(group(45, 30)).toBe("ML"); // PI 15 < A-line 18.25
    expect(group(18, 16)).toBe("ML"); // PI 2 < 4
  });

  test("LL ≥ 50: on or above the A-line → CH; below → MH; LL = 50 counts as high (ASTM D2487: 'LL 50 or more')", () => {
    expect(group(60, 25)).toBe("CH"); // PI 35 ≥ 29.2
    expect(group(60, 40)).toBe("MH"); // PI 20 < 29.2
    expect(group(50, 25)).toBe("CH"); // PI 25 ≥ 21.9
    expect(group(49.9, 25)).toBe("CL");
    expect(group(70, 32)).toBe("CH"); // PI 38 exactly on the A-line: "on or above"
  });

  test("PL ≥ LL or no PL → NP (ASTM D4318 reports such soils as non-plastic)", () => {
    expect(group(25, 25)).toBe("NP");
    expect(group(25, 28)).toBe("NP");
    expect(group(25)).toBe("NP");
    expect(classifyAtterbergLimits({ liquidLimit: 30, plasticLimit: 20, nonPlastic: true }).hint.group).toBe("NP");
  });

  test("PI and liquidity index LI = (w − PL)/PI (Craig ch. 1; hand calculation)", () => {
    const r = classifyAtterbergLimits({ liquidLimit: 40, plasticLimit: 20, waterContent: 35, id: "a1" });
    expect(r.plasticityIndex).toBe(20);
    expect(r.liquidityIndex).toBeCloseTo(0.75, 12);
    expect(r.sourceIds).toEqual(["a1"]);
    expect(r.hint.explanation).toMatch(/CL, lean clay/);
    expect(r.hint.explanation).toMatch(/OL, OH/); // organic groups are not inferable from LL and PL alone
  });

  test("a point above the U-line warns; bad limits throw with the field", () => {
    expect(classifyAtterbergLimits({ liquidLimit: 30, plasticLimit: 5 }).warnings.join(" ")).toMatch(
      /above the U-line/,
    );
    expect(() => classifyAtterbergLimits({ liquidLimit: 0, plasticLimit: 5, specimen: "BH1-2" })).toThrow(
      "sample (BH1-2): liquid limit must be positive",
    );
  });
});
