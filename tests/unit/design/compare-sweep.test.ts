import { describe, expect, it } from "vitest";
import { compareKeptPoint, compareSweepPoints, type SweepPoint } from "@/lib/design";
import type { GridSearchSuccess } from "@/lib/stability";

// Sweep points are compared by job id; the values are placeholders, not engineering results.
const point = (id: string, fsBishop: number | null): SweepPoint => ({
  id,
  phase: "sweep",
  face: "downstream",
  caseKey: "steady-seepage",
  upstreamRatio: 3,
  downstreamRatio: 2.5,
  ratio: 2.5,
  fsBishop,
  fsOrdinary: fsBishop === null ? null : fsBishop - 0.1,
  circle: fsBishop === null ? null : { xc: 70, yc: 30, r: 25 },
  resolution: null,
  grid: null,
  radii: null,
  fillArea: 400,
  gridMoves: 0,
  gridEdge: false,
  warnings: [],
  error: fsBishop === null ? "No trial circle gave a factor of safety." : null,
  elapsedMs: 1,
});
const v = "engine-x";

describe("compareSweepPoints (issue 12 item 1: sweeps are the server's)", () => {
  const server = { points: [point("a", 1.41), point("b", 1.52), point("c", 1.63)], engineVersion: v };

  it("matches the same points", () => {
    expect(compareSweepPoints(structuredClone(server), server).status).toBe("matched");
  });

  it("reports a raised FS, a point sent without its FS, a point left out and one added", () => {
    const sent = {
      points: [point("a", 1.61), point("b", null), point("z", 2)],
      engineVersion: "engine-old",
    };
    const check = compareSweepPoints(sent, server);
    expect(check.status).toBe("differed");
    const fields = check.differences.map((d) => d.field);
    expect(fields).toEqual(
      expect.arrayContaining([
        "engineVersion",
        "points.a.fsBishop",
        "points.b.fsBishop",
        "points.b.error",
        "points.c",
        "points.z",
      ]),
    );
    expect(check.differences.find((d) => d.field === "points.a.fsBishop")).toMatchObject({
      sent: "1.61",
      server: "1.41",
    });
  });
});

describe("compareKeptPoint", () => {
  it("compares a kept point's FS and circle with the server's search of its section", () => {
    const circle = { fs: 1.41, circle: { xc: 70, yc: 30, r: 25 }, entry: [60, 18], exit: [90, 0], direction: "right" };
    const server = {
      results: { bishop: circle, fellenius: { ...circle, fs: 1.31 } },
    } as unknown as GridSearchSuccess;
    expect(compareKeptPoint(point("a", 1.41), server).status).toBe("matched");
    const moved = compareKeptPoint({ ...point("a", 1.41), circle: { xc: 71, yc: 30, r: 25 } }, server);
    expect(moved.differences.map((d) => d.field)).toEqual(["results.bishop.circle.xc"]);
    expect(moved.source).toBe("sweep");
  });
});
