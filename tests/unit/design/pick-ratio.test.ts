import { describe, expect, test } from "vitest";
import { planRecheck, planSweep, readSweep, steepestPassingRatio, sweepRatios, type SweepPoint } from "@/lib/design";

// The rule of docs/engine.md §9: n* is the smallest n with FS ≥ FSreq at n and at every larger n.
describe("steepestPassingRatio(points, required)", () => {
  const pts = (fs: (number | null)[]) => fs.map((f, i) => ({ ratio: 2 + i * 0.5, fs: f }));

  test("takes the first ratio from which every flatter one passes", () => {
    expect(steepestPassingRatio(pts([1.2, 1.4, 1.5, 1.6]), 1.5)).toBe(3);
  });

  test("ignores a passing dip below a failing ratio", () => {
    // 2.0 passes by luck, 2.5 fails: recommending 2.0 would put a failing slope inside the range.
    expect(steepestPassingRatio(pts([1.55, 1.45, 1.6, 1.7]), 1.5)).toBe(3);
  });

  test("is null when the flattest ratio fails or has no result", () => {
    expect(steepestPassingRatio(pts([1.6, 1.7, 1.4]), 1.5)).toBeNull();
    expect(steepestPassingRatio(pts([1.6, 1.7, null]), 1.5)).toBeNull();
  });

  test("counts FS exactly at the required value as meeting it", () => {
    expect(steepestPassingRatio(pts([1.5, 1.5]), 1.5)).toBe(2);
  });
});

describe("planSweep and readSweep", () => {
  test("2:1 to 4:1 in steps of 0.25 gives 9 ratios and 27 jobs, the other face kept", () => {
    expect(sweepRatios({ from: 2, to: 4, step: 0.25 })).toEqual([2, 2.25, 2.5, 2.75, 3, 3.25, 3.5, 3.75, 4]);
    const jobs = planSweep({ upstreamSlope: 3, downstreamSlope: 2.5 }, { from: 2, to: 4, step: 0.25 });
    expect(jobs).toHaveLength(27);
    expect(jobs.filter((j) => j.face === "downstream").every((j) => j.upstreamRatio === 3)).toBe(true);
    expect(jobs.filter((j) => j.face === "upstream").every((j) => j.downstreamRatio === 2.5)).toBe(true);
    expect(new Set(jobs.map((j) => j.id)).size).toBe(27);
  });

  test("each face takes the flattest n* of its cases", () => {
    const point = (caseKey: SweepPoint["caseKey"], ratio: number, fs: number): SweepPoint => ({
      id: `${caseKey}${ratio}`,
      phase: "sweep",
      face: caseKey === "steady-seepage" ? "downstream" : "upstream",
      caseKey,
      upstreamRatio: ratio,
      downstreamRatio: ratio,
      ratio,
      fsBishop: fs,
      fsOrdinary: fs,
      circle: null,
      resolution: null,
      gridMoves: 0,
      gridEdge: false,
      grid: null,
      radii: null,
      fillArea: 100 * ratio,
      warnings: [],
      error: null,
      elapsedMs: 1,
    });
    const points = [
      point("steady-seepage", 2, 1.4),
      point("steady-seepage", 3, 1.6),
      point("drawdown-storage", 2, 1.35),
      point("drawdown-storage", 3, 1.4),
      point("drawdown-surcharge", 2, 1.0),
      point("drawdown-surcharge", 3, 1.2),
    ];
    const r = readSweep(points, { "steady-seepage": 1.5, "drawdown-storage": 1.3, "drawdown-surcharge": 1.1 });
    expect(r.faces.downstream).toMatchObject({ ratio: 3, governing: "steady-seepage", fillArea: 300 });
    expect(r.faces.upstream).toMatchObject({ ratio: 3, governing: "drawdown-surcharge" });
    expect(r.pair).toEqual({ upstream: 3, downstream: 3 });
    expect(planRecheck(r.pair!).map((j) => j.caseKey)).toEqual([
      "steady-seepage",
      "drawdown-storage",
      "drawdown-surcharge",
    ]);
  });
});
