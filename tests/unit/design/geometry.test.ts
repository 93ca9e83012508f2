import { describe, expect, test } from "vitest";
import {
  embankmentGeometry,
  embankmentParamsSchema,
  fillQuantities,
  generateEmbankment,
  DesignInputError,
} from "@/lib/design";
import { polygonArea } from "@/lib/plane-geometry";
import { validateSection } from "@/lib/stability";
import { assertInDelta, MATERIALS, params } from "./helpers";

// Hand-worked dimensions of the demo embankment: H = 18 − 6 = 12 m; margin max(20, 2H) = 24 m;
// upstream run 3 × 12 = 36 m, downstream run 2.5 × 12 = 30 m; base width 6 + 36 + 30 = 72 m;
// trapezoid area (6 + 72)/2 × 12 = 468 m².
describe("embankmentGeometry(demo)", () => {
  const g = embankmentGeometry(params());

  test("places toes and crest corners at the hand-worked coordinates", () => {
    expect(g.height).toBe(12);
    expect(g.upstreamToe).toEqual([24, 6]);
    expect(g.upstreamCrest).toEqual([60, 18]);
    expect(g.downstreamCrest).toEqual([66, 18]);
    expect(g.downstreamToe).toEqual([96, 6]);
    expect(g.xmax).toBe(120);
  });

  test("cuts a drain whose top meets the downstream face 2.5 × 0.5 m inside the toe", () => {
    expect(g.drain.start).toEqual([84, 6]);
    expect(g.drain.faceX).toBeCloseTo(94.75, 12);
    // Trapezoid: bottom 12 m, top 94.75 − 84 = 10.75 m, 0.5 m thick.
    assertInDelta(polygonArea(g.drain.polygon), ((12 + 10.75) / 2) * 0.5, 1e-9);
  });

  test("fillQuantities gives the trapezoid's 468 m² and the volume for 300 m of crest", () => {
    const q = fillQuantities(g, 300);
    assertInDelta(q.sectionArea, 468, 1e-9);
    assertInDelta(q.fillArea, 468 - 5.6875, 1e-9);
    assertInDelta(q.fillVolume, (468 - 5.6875) * 300, 1e-6);
  });
});

describe("embankmentGeometry with berms and a core", () => {
  test("an upstream berm 4 m wide at 12.0 m adds a 4 × 6 m parallelogram of fill", () => {
    const g = embankmentGeometry(params({ upstreamBerm: { elevation: 12, width: 4 } }));
    // Toe at 24; 3 × 6 = 18 m up to the berm's outer edge at 42; berm to 46; 18 m more to the crest at 64.
    expect(g.upstreamFace).toEqual([
      [24, 6],
      [42, 12],
      [46, 12],
      [64, 18],
    ]);
    assertInDelta(polygonArea(g.outline), 468 + 4 * 6, 1e-9);
  });

  test("a downstream berm at 10.0 m, 3 m wide, moves the toe 3 m out", () => {
    const g = embankmentGeometry(params({ downstreamBerm: { elevation: 10, width: 3 } }));
    expect(g.downstreamFace).toEqual([
      [66, 18],
      [86, 10],
      [89, 10],
      [99, 6],
    ]);
    assertInDelta(polygonArea(g.outline), 468 + 3 * 4, 1e-9);
  });

  test("a core 4 m wide at the top with 0.5:1 sides has (4 + 16)/2 × 12 = 120 m²", () => {
    const g = embankmentGeometry(
      params({ zoning: { kind: "zoned", core: "fill", shell: "drain", coreTopWidth: 4, coreSlope: 0.5 } }),
    );
    assertInDelta(polygonArea(g.core!.polygon), 120, 1e-9);
    // Crest centre at (60 + 66)/2 = 63; the core top runs 2 m either side of it.
    expect(g.core!.upstreamTop).toEqual([61, 18]);
    expect(g.core!.downstreamBase).toEqual([71, 6]);
  });

  test("polygonArea(unit square) is 1 in either orientation", () => {
    expect(
      polygonArea([
        [0, 0],
        [1, 0],
        [1, 1],
        [0, 1],
      ]),
    ).toBe(1);
    expect(
      polygonArea([
        [0, 1],
        [1, 1],
        [1, 0],
        [0, 0],
      ]),
    ).toBe(1);
  });
});

describe("generateEmbankment(params, materials)", () => {
  for (const [name, p] of [
    ["homogeneous demo", params()],
    [
      "berms on both faces",
      params({ upstreamBerm: { elevation: 17, width: 3 }, downstreamBerm: { elevation: 11, width: 3 } }),
    ],
    [
      "zoned, no foundation layer",
      params({
        foundationThickness: 0,
        zoning: { kind: "zoned", core: "fill", shell: "foundation", coreTopWidth: 4, coreSlope: 0.5 },
      }),
    ],
  ] as const) {
    test(`${name}: the document validates with the engine`, () => {
      const out = generateEmbankment(p, MATERIALS);
      const v = validateSection(out.document);
      expect(v.ok ? [] : v.errors).toEqual([]);
      expect(out.document.regions.map((r) => r.material)).toContain("drain");
    });
  }

  test("a missing material is refused naming the field", () => {
    const run = () => generateEmbankment(params({ drainMaterial: "gravel" }), MATERIALS);
    expect(run).toThrow(DesignInputError);
    expect(run).toThrow(/toe drain material 'gravel' is not in the project's materials library/);
  });

  test("low freeboard draws a warning", () => {
    const out = generateEmbankment(params({ floodPool: 17.5, minFreeboard: 1 }), MATERIALS);
    expect(out.warnings.map((w) => w.code)).toContain("W_DESIGN_LOW_FREEBOARD");
  });
});

describe("embankmentParamsSchema", () => {
  test("says which field is wrong and why", () => {
    const r = embankmentParamsSchema.safeParse({ ...params(), floodPool: 19, drawdownTo: 17 });
    expect(r.success).toBe(false);
    const byPath = Object.fromEntries(r.error!.issues.map((i) => [i.path.join("."), i.message]));
    expect(byPath.floodPool).toMatch(/above the crest \(18 m\)/);
    expect(byPath.drawdownTo).toMatch(/below the normal pool \(16 m\)/);
  });

  test("a blank number asks for it with its unit", () => {
    const r = embankmentParamsSchema.safeParse({ ...params(), crestWidth: undefined });
    expect(r.error!.issues[0]).toMatchObject({ path: ["crestWidth"], message: "Enter the crest width in metres." });
  });
});
