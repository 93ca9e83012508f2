/**
 * Issue 15, the screens: drawing a slip surface (ends on the ground, typed points), what a run keeps
 * of Spencer and Morgenstern–Price, the four methods side by side in words, and the same in the
 * calculation report. Checked against statics by hand and the demo seam section.
 */
import { describe, expect, test } from "vitest";
import type { SectionDocument } from "@/lib/stability";
import { searchRecord } from "@/lib/runs/record/search-record";
import { analyzeDrawnSurface, checkDrawnSurface, rigorousPart } from "@/lib/runs/record/rigorous-part";
import { methodRows, placeAlong } from "@/lib/runs/view/rigorous-text";
import { solutionChoices } from "@/lib/runs/view/surface-overlay";
import { addClick, moveVertex, parseSurfaceText, surfaceText, type Pt } from "@/lib/runs/view/surface-draw";
import { groundLine } from "@/lib/runs/view/section-outline";
import { documentForRun } from "@/lib/analysis/run-setup";
import { buildWeakLayerSection, weakLayerSetup } from "@/db/seeds/demo-weak-layer";
import { buildRunReport, type ReportInput } from "@/lib/report/build-report";
import { ENGINE_VERSION } from "@/lib/stability";
import { pdfText } from "../../support/pdf-text";

/** A dry 2H:1V slope 10 m high in one soil (γ 20 kN/m³, c′ 5 kPa, φ′ 20°), toe at (0, 0). */
const slope: SectionDocument = {
  version: 1,
  materials: [{ id: "soil", name: "Silty clay", model: "mohr-coulomb", gamma: 20, c: 5, phi: 20 }],
  regions: [
    {
      material: "soil",
      points: [
        [-10, -5],
        [40, -5],
        [40, 10],
        [20, 10],
        [0, 0],
        [-10, 0],
      ],
    },
  ],
  analysis: {
    methods: ["bishop", "fellenius", "spencer", "morgenstern-price"],
    slices: 40,
    grid: { x1: 5, y1: 12, x2: 25, y2: 30, nx: 6, ny: 6 },
    radii: { tangentY1: 2, tangentY2: -4, n: 4 },
  },
};

describe("drawing a slip surface", () => {
  const ground = groundLine(slope);

  test("the first click starts on the ground, a click in the soil bends, a click above the ground ends on it", () => {
    let s = addClick({ points: [], finished: false }, 30, 4, ground, 0.2);
    // On the crest at x = 30 the ground is at 10 m (the section's own top).
    expect(s.points).toEqual([[30, 10]]);
    s = addClick(s, 15, 2, ground, 0.2);
    expect(s.points[1]).toEqual([15, 2]);
    expect(s.finished).toBe(false);
    // Above the face at x = 2 (ground 1.0 m on a 2H:1V face): the surface ends on the ground there.
    s = addClick(s, 2, 3, ground, 0.2);
    expect(s.finished).toBe(true);
    expect(s.points[2][0]).toBe(2);
    expect(s.points[2][1]).toBeCloseTo(1, 12);
    // A further click starts a new surface.
    expect(addClick(s, 25, 0, ground, 0.2).points).toEqual([[25, 10]]);
  });

  test("moving an end keeps it on the ground; a bend moves freely", () => {
    const pts: Pt[] = [
      [30, 10],
      [15, 2],
      [2, 1],
    ];
    expect(moveVertex(pts, 0, 26, 3, ground)).toEqual([
      [26, 10],
      [15, 2],
      [2, 1],
    ]);
    expect(moveVertex(pts, 1, 14, 1.5, ground)[1]).toEqual([14, 1.5]);
  });

  test("typed points read back; a bad pair is named by its place in the list", () => {
    const parsed = parseSurfaceText("30,10 15,2\n2,1");
    expect(parsed).toEqual({
      ok: true,
      points: [
        [30, 10],
        [15, 2],
        [2, 1],
      ],
    });
    expect(surfaceText(parsed.ok ? parsed.points : [])).toBe("30,10 15,2 2,1");
    const bad = parseSurfaceText("30,10 15,x 2,1");
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.error).toMatch(/Point 2 \(“15,x”\)/);
    expect(parseSurfaceText("30,10").ok).toBe(false);
  });
});

describe("a run with a drawn planar surface and all four methods", () => {
  test("Spencer and Morgenstern–Price give the rigid block's factor; Bishop and ordinary read 'circle only'", () => {
    // Force equilibrium of a rigid block on one plane (any interslice assumption; hand calculation,
    // e.g. Duncan & Wright, Soil Strength and Slope Stability, 2nd ed., ch. 6, from memory):
    // F = (c′L + W cos α tan φ′) / (W sin α). Plane from (30, 10) on the crest to the toe (0, 0):
    // the wedge is the triangle (0,0)–(20,10)–(30,10), area 50 m², W = 1000 kN/m.
    const surface: Pt[] = [
      [30, 10],
      [0, 0],
    ];
    const L = Math.hypot(30, 10);
    const a = Math.atan2(10, 30);
    const W = 50 * 20;
    const hand = (5 * L + W * Math.cos(a) * Math.tan((20 * Math.PI) / 180)) / (W * Math.sin(a));
    expect(hand).toBeCloseTo(1.5918, 3);

    const record = searchRecord(slope);
    if (!record.ok) throw new Error("search failed");
    const drawn = analyzeDrawnSurface(slope, surface);
    const part = rigorousPart(slope, record.result, drawn);
    expect(part).not.toBeNull();
    const rows = methodRows(record.result, part!);
    expect(rows.map((r) => r.method)).toEqual(["bishop", "fellenius", "spencer", "morgenstern-price"]);
    const byMethod = Object.fromEntries(rows.map((r) => [r.method, r]));
    expect(byMethod.bishop.surface).toEqual({ note: "circle only" });
    expect(byMethod.fellenius.surface).toEqual({ note: "circle only" });
    for (const m of ["spencer", "morgenstern-price"]) {
      const cell = byMethod[m].surface;
      if (!cell || !("fs" in cell)) throw new Error(`${m}: no factor on the plane`);
      // Slices of one plane: the block's statics hold to the solver's tolerance.
      expect(cell.fs).toBeCloseTo(hand, 3);
      const onCircle = byMethod[m].circle;
      if (!onCircle || !("fs" in onCircle)) throw new Error(`${m}: no factor on the circle`);
      // On circles of an ordinary slope the rigorous methods fall within a few per cent of Bishop's
      // simplified method (Fredlund & Krahn 1977, Table 3, from memory; Duncan & Wright ch. 7).
      const bishop = record.result.results.bishop!.fs;
      expect(Math.abs(onCircle.fs - bishop) / bishop).toBeLessThan(0.05);
      expect(onCircle.lambda).not.toBeNull();
    }
  });

  test("a surface that leaves the section's soil at its base is refused with a reason and no number", () => {
    // Down through the base of the section (y = −5) and back: the engine refuses it.
    const check = checkDrawnSurface(slope, [
      [30, 10],
      [15, -8],
      [0, 0],
    ]);
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.text).toMatch(/bottom of the regions\. Near \(\d/);
  });

  test("warnings are placed along the surface in words", () => {
    expect(placeAlong(36, [37, 20], [80, 8])).toBe("near the crest end");
    expect(placeAlong(78, [37, 20], [80, 8])).toBe("near the toe");
    expect(placeAlong(60, [37, 20], [80, 8])).toBe("part-way along");
  });
});

describe("the demo spoil bank over a clay seam", () => {
  const section = buildWeakLayerSection();
  const setup = weakLayerSetup();
  const doc = documentForRun(section, setup);
  const record = searchRecord(doc);
  if (!record.ok) throw new Error("demo search failed");
  const drawn = analyzeDrawnSurface(doc, setup.surface!);
  const part = rigorousPart(doc, record.result, drawn)!;

  test("the surface along the seam is clearly below the critical circle (a seam governs, common practice)", () => {
    const circle = record.result.results.bishop!.fs;
    const spencer = part.surface!.fs.spencer!;
    expect(spencer).toBeLessThan(circle * 0.9);
    // The surfaces search (analysis.search "surfaces") finds a surface along the seam at least as low.
    const searched = part.searched.spencer!.solution.fs!;
    expect(searched).toBeLessThan(part.circles.spencer!.solution.fs! * 0.9);
    expect(searched).toBeLessThanOrEqual(spencer + 1e-6);
    expect(methodRows(record.result, part).find((r) => r.method === "bishop")!.searched).toEqual({
      note: "circle only",
    });
    expect(solutionChoices(part).map((c) => c.label)).toEqual([
      "Spencer, drawn surface",
      "Morgenstern–Price, drawn surface",
      "Spencer, searched surface",
      "Morgenstern–Price, searched surface",
      "Spencer, critical circle",
      "Morgenstern–Price, critical circle",
    ]);
  });

  test("the report shows the methods side by side, 'circle only', and the forces between slices", async () => {
    const input: ReportInput = {
      projectName: "Invented project",
      run: {
        id: 7,
        title: "Seam run",
        status: "draft",
        sectionName: "Spoil bank",
        sectionVersion: 1,
        loadingCondition: "steady-seepage",
        waterCondition: null,
        face: "downstream",
        requiredFs: 1.5,
        fsBishop: record.result.results.bishop!.fs,
        fsFellenius: record.result.results.fellenius!.fs,
        authorName: "Engineer",
        createdAt: "2026-01-01T00:00:00.000Z",
        engineVersion: ENGINE_VERSION,
        revisesRunId: null,
        document: doc,
        result: { ...record.result, setup, rigorous: part },
        sliceTables: {},
      },
      review: { submittedByName: null, submittedAt: null, reviewedByName: null, reviewedAt: null, reviewNote: null },
      checklist: [],
      comments: [],
      materials: [],
      sourcesFrozen: false,
      generatedAt: "2026-01-04T00:00:00.000Z",
      generatedBy: "Engineer",
    };
    const text = await pdfText(await buildRunReport(input));
    expect(text).toContain("Methods side by side");
    expect(text).toContain("circle only");
    expect(text).toContain(part.surface!.fs.spencer!.toFixed(3));
    expect(text).toContain("Forces between slices: Spencer, drawn surface");
    expect(text).toContain("Searched slip surface (lowest)");
    expect(text).toContain(part.searched.spencer!.solution.fs!.toFixed(3));
  }, 30_000);
});
