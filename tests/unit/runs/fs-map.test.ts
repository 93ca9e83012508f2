import { describe, expect, it } from "vitest";
import { CIVIDIS, scaleHex } from "@/lib/runs/view/colour-scale";
import { buildFsLegend } from "@/lib/runs/view/fs-legend";
import { cellEdges, fsMapCells, fsRange } from "@/lib/runs/view/fs-map-cells";
import { smallRun } from "./engine-run";

describe("fsRange", () => {
  it("spans the minimum to 1.5 above it, or to the maximum when lower, ignoring empty cells", () => {
    expect(fsRange([null, 1.2, 2.0, 3.5])).toEqual({ lo: 1.2, hi: 2.7, clipped: true });
    expect(fsRange([1.2, 1.9])).toEqual({ lo: 1.2, hi: 1.9, clipped: false });
    expect(fsRange([null, null])).toBeNull();
  });

  it("stretches to show a required FS just above the range, and never collapses", () => {
    expect(fsRange([1.2, 1.4], 1.5)!.hi).toBeCloseTo(1.6, 12);
    expect(fsRange([1.3, 1.3])!.hi).toBeCloseTo(1.4, 12);
  });
});

describe("fsMapCells on the engine's map (values[iy·nx + ix], docs/engine-io.md)", () => {
  it("puts cell edges halfway between centres", () => {
    expect(cellEdges([0, 2, 4], 1)).toEqual([-1, 1, 3, 5]);
    expect(cellEdges([7], 2)).toEqual([6, 8]);
  });

  it("reads row by row and leaves empty centres uncoloured", () => {
    const cells = fsMapCells(
      { nx: 3, ny: 2, xs: [0, 1, 2], ys: [10, 12], values: [1, 2, null, 4, 5, 6] },
      { lo: 1, hi: 6, clipped: false },
    );
    const at = (ix: number, iy: number) => cells.find((c) => c.ix === ix && c.iy === iy)!;
    expect(at(2, 1).fs).toBe(6);
    expect(at(2, 0).colour).toBeNull();
    expect(at(1, 1)).toMatchObject({ x1: 0.5, x2: 1.5, y1: 11, y2: 13 });
  });

  it("gives the darkest colour to the centre of the engine's critical circle (no refinement)", () => {
    const { result } = smallRun();
    const map = result.fsMap.bishop!;
    const range = fsRange(map.values)!;
    const cells = fsMapCells(map, range);
    const crit = result.results.bishop!;
    const cell = cells.find(
      (c) => crit.circle.xc >= c.x1 && crit.circle.xc <= c.x2 && crit.circle.yc >= c.y1 && crit.circle.yc <= c.y2,
    )!;
    expect(cell.fs).toBeCloseTo(crit.fs, 9);
    expect(cell.colour).toBe(scaleHex(CIVIDIS, 0));
  });
});

describe("buildFsLegend", () => {
  it("places ticks and the required FS along the bar, pinned with a note when off the range", () => {
    const l = buildFsLegend({ lo: 1.1, hi: 2.6, clipped: true }, 1.5);
    for (const t of l.ticks) expect(t.at).toBeCloseTo((t.value - 1.1) / 1.5, 12);
    expect(l.required).toEqual({ value: 1.5, at: expect.closeTo(0.4 / 1.5, 12), outside: null });
    expect(l.highLabel).toBe("≥ 2.60");
    expect(buildFsLegend({ lo: 1.6, hi: 2.1, clipped: false }, 1.3).required).toMatchObject({
      at: 0,
      outside: "below",
    });
    expect(l.gradient[0].colour).toBe(scaleHex(CIVIDIS, 0));
  });
});
