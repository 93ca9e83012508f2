import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatCell, numberSlices, sliceColumns, sortSlices } from "@/lib/runs/view/slice-columns";
import { SLICES, slice } from "./fixtures";

const cols = sliceColumns("bishop");
const col = (k: string) => cols.find((c) => c.key === k)!;

describe("slice table columns", () => {
  it("derive width as xRight − xLeft and carry a unit for every physical quantity", () => {
    const s = numberSlices([slice({ xLeft: 3.25, xRight: 4.5 })])[0];
    expect(col("width").value(s, "bishop")).toBeCloseTo(1.25, 12);
    for (const k of [
      "xLeft",
      "weight",
      "alpha",
      "baseLength",
      "porePressure",
      "c",
      "phi",
      "normal",
      "resisting",
      "driving",
    ])
      expect(col(k).unit).not.toBe("");
  });

  it("formatCell uses fixed decimals and never prints a negative zero", () => {
    expect(formatCell(col("alpha"), -0.04)).toBe("0.0");
    expect(formatCell(col("mAlpha"), 0.12345)).toBe("0.123");
    expect(formatCell(col("mAlpha"), null)).toBe("");
  });
});

describe("sortSlices", () => {
  it("orders by the column, keeps empty values last either way, and is stable", () => {
    const n = numberSlices(SLICES);
    expect(sortSlices(n, col("alpha"), "ascending", "bishop").map((s) => s.n)).toEqual([3, 2, 1]);
    expect(sortSlices(n, col("mAlpha"), "ascending", "bishop").map((s) => s.n)).toEqual([3, 1, 2]);
    expect(sortSlices(n, col("mAlpha"), "descending", "bishop").map((s) => s.n)).toEqual([1, 3, 2]);
  });

  it("gives a permutation in non-decreasing order for any weights (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e4, max: 1e4, noNaN: true }), { maxLength: 60 }), (ws) => {
        const n = numberSlices(ws.map((w) => slice({ weight: w })));
        const sorted = sortSlices(n, col("weight"), "ascending", "bishop");
        expect(sorted.map((s) => s.n).sort((a, b) => a - b)).toEqual(n.map((s) => s.n));
        for (let i = 1; i < sorted.length; i++)
          expect(sorted[i].row.weight).toBeGreaterThanOrEqual(sorted[i - 1].row.weight);
      }),
    );
  });
});
