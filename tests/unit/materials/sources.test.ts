import { describe, expect, test } from "vitest";
import { checkSources, kindsThatFeed, mergeSources, suggestedValues } from "@/lib/materials/sources";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import type { MaterialParameters } from "@/lib/materials/parameters";
import type { LabTestRecord } from "@/lib/materials/lab-kinds";

const mc = (c: number, phi: number): MaterialParameters => ({ model: "mohr-coulomb", gamma: 19, c, phi });

function derive(kind: Parameters<typeof checkAndDeriveLabTest>[0], data: unknown): LabTestRecord {
  const out = checkAndDeriveLabTest(kind, data);
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join("; "));
  return out.record;
}

describe("mergeSources", () => {
  test("mergeSources(...) keeps a source while its value is unchanged and drops it when typed over", () => {
    expect(mergeSources(mc(10, 26), { c: 4, phi: 4 }, mc(10, 27))).toEqual({ c: 4 });
  });

  test("mergeSources(...) lets new sources replace old ones and forgets parameters that are gone", () => {
    const undrained: MaterialParameters = { model: "undrained", gamma: 19, su: 35 };
    expect(mergeSources(mc(10, 26), { c: 4, phi: 4, gamma: 7 }, undrained, { su: 9 })).toEqual({ gamma: 7, su: 9 });
  });
});

describe("checkSources", () => {
  const sets = new Map([
    [4, { id: 4, kind: "direct-shear" as const, materialId: 1 }],
    [5, { id: 5, kind: "compaction" as const, materialId: 2 }],
    [6, { id: 6, kind: "compaction" as const, materialId: null }],
  ]);

  test("checkSources(...) accepts a set of the right kind that belongs to the material or to none", () => {
    expect(checkSources(1, mc(10, 26), { c: 4, phi: 4, gamma: 6 }, sets)).toEqual({});
  });

  test("checkSources(...) names each wrong claim by parameter", () => {
    const errors = checkSources(1, { model: "undrained", gamma: 18, su: 30 }, { c: 4, gamma: 5, su: 99 }, sets);
    expect(errors["sources.c"][0]).toMatch(/not set on this undrained material/);
    expect(errors["sources.gamma"][0]).toMatch(/another material/);
    expect(errors["sources.su"][0]).toMatch(/not found/);
    expect(checkSources(1, mc(10, 26), { phi: 6 }, sets)["sources.phi"][0]).toMatch(/does not give φ′/);
  });

  test("kindsThatFeed(key) inverts what each kind supplies", () => {
    expect(kindsThatFeed("phi")).toEqual(["direct-shear", "triaxial-cu"]);
    expect(kindsThatFeed("gammaSat")).toEqual(["compaction"]);
  });
});

describe("suggestedValues", () => {
  test("suggestedValues(direct shear) rounds c' and φ' to 0.1 (hand least squares: slope 0.9 → φ' = 41.99°, c' = 0.33 kPa)", () => {
    const r = derive("direct-shear", {
      tests: [
        { normalStress: 100, shearStress: 90 },
        { normalStress: 200, shearStress: 181 },
        { normalStress: 300, shearStress: 270 },
      ],
    });
    expect(suggestedValues(r)).toEqual([{ label: "c' and φ'", values: { c: 0.3, phi: 42 }, note: undefined }]);
  });

  test("suggestedValues(...) takes c' = 0 with a note when the fit gives a negative intercept", () => {
    // Hand calculation: through (100, 40) and (200, 100) the line is τ = −20 + 0.6σn.
    const r = derive("direct-shear", {
      tests: [
        { normalStress: 100, shearStress: 40 },
        { normalStress: 200, shearStress: 100 },
      ],
    });
    const [s] = suggestedValues(r);
    expect(s.values.c).toBe(0);
    expect(s.values.phi).toBeCloseTo((Math.atan(0.6) * 180) / Math.PI, 1);
    expect(s.note).toMatch(/-20\.0 kPa/);
  });

  test("suggestedValues(UU, constant) gives su = mean of q/2 (ASTM D2850: su is half the deviator stress)", () => {
    const r = derive("undrained", {
      source: "uu",
      model: "constant",
      tests: [{ deviatorStress: 60 }, { deviatorStress: 70 }, { deviatorStress: 80 }],
    });
    expect(suggestedValues(r)).toEqual([{ label: "su", values: { su: 35 } }]);
  });

  test("suggestedValues(atterberg) offers nothing: the limits only hint at a group", () => {
    expect(suggestedValues(derive("atterberg", { liquidLimit: 42, plasticLimit: 20 }))).toEqual([]);
  });
});
