import { describe, expect, it } from "vitest";
import { buildDemoSection } from "@/db/seeds/demo-section";
import { impenetrableTop, suggestGrid } from "@/lib/analysis/auto-grid";
import { readSweep } from "@/lib/design/pick-ratio";
import type { SweepPoint } from "@/lib/design/run-job";
import { runGridSearch } from "@/lib/stability";

/*
 * docs/engine.md §9 places the automatic grid's tangent levels "down to the foundation base": a circle
 * tangent below the top of impenetrable material enters it, and the engine rejects such circles
 * (docs/engine.md, material models: impenetrable = no slip surface may enter it).
 */
describe("the automatic grid's tangent levels", () => {
  const doc = buildDemoSection();

  it("find the top of the demo's bedrock (0.0 m) under the dam", () => {
    expect(impenetrableTop(doc, 0, 110)).toBe(0);
    expect(impenetrableTop({ ...doc, materials: doc.materials.filter((m) => m.id !== "rock") }, 0, 110)).toBeNull();
  });

  for (const direction of ["left", "right"] as const) {
    const face = direction === "left" ? "upstream" : "downstream";
    it(`stay above the bedrock for the ${face} face, so no circle is rejected for entering it`, () => {
      const g = suggestGrid(doc, direction, { nx: 6, ny: 6, nr: 6 });
      expect(Math.min(g.radii.tangentY1, g.radii.tangentY2)).toBeGreaterThan(0);
      const result = runGridSearch({
        ...doc,
        analysis: { case: "steady", methods: ["bishop"], direction, grid: g.grid, radii: g.radii, slices: 30 },
      });
      if (!result.ok) throw new Error("search failed");
      expect(result.circles.rejected.impenetrable ?? 0).toBe(0);
    });
  }
});

describe("reading a sweep whose minimum stays on the grid's edge", () => {
  const point = (ratio: number, fs: number, gridEdge = false): SweepPoint => ({
    id: `p${ratio}`,
    phase: "sweep",
    face: "downstream",
    caseKey: "steady-seepage",
    upstreamRatio: 3,
    downstreamRatio: ratio,
    ratio,
    fsBishop: fs,
    fsOrdinary: fs,
    circle: null,
    resolution: null,
    gridMoves: gridEdge ? 3 : 0,
    gridEdge,
    grid: null,
    radii: null,
    fillArea: 100,
    warnings: [],
    error: null,
    elapsedMs: 1,
  });
  const required = { "steady-seepage": 1.5, "drawdown-storage": 1.3, "drawdown-surcharge": 1.1 };

  // n* is the smallest ratio passing at n and every larger n (docs/engine.md §9); an FS whose minimum may lie
  // outside the grid is not a settled value, so it cannot be that pass.
  it("does not recommend a ratio on an unsettled FS", () => {
    const settled = readSweep([point(2.5, 1.45), point(3, 1.55), point(3.5, 1.6)], required);
    expect(settled.cases.find((c) => c.caseKey === "steady-seepage")!.steepest).toBe(3);
    const edge = readSweep([point(2.5, 1.45), point(3, 1.55, true), point(3.5, 1.6)], required);
    expect(edge.cases.find((c) => c.caseKey === "steady-seepage")!.steepest).toBe(3.5);
  });
});
