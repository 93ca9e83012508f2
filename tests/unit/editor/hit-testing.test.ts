import { describe, expect, it } from "vitest";
import { hitEdge, hitRegion, hitVertex, pointInPolygon } from "@/lib/editor/hit-testing";
import { clampSelection, pointAt, selectedVertex } from "@/lib/editor/refs";
import { worldToScreen } from "@/lib/editor/view-transform";
import { embankment } from "./fixtures";

const view = { scale: 10, offsetX: 20, offsetY: 300, exaggeration: 1 };

describe("hit testing", () => {
  it("hitVertex prefers the selected region where two regions share a vertex", () => {
    const doc = embankment();
    const [sx, sy] = worldToScreen(view, 20, 10);
    expect(hitVertex(doc, view, sx + 2, sy, 8, { kind: "region", region: 1 })).toEqual({
      kind: "region",
      region: 1,
      index: 4,
    });
    expect(hitVertex(doc, view, sx + 2, sy, 8, { kind: "region", region: 0 })).toEqual({
      kind: "region",
      region: 0,
      index: 0,
    });
    expect(hitVertex(doc, view, sx + 40, sy - 40, 8)).toBeNull();
  });

  it("hitVertex finds phreatic points", () => {
    const [sx, sy] = worldToScreen(view, 22, 12);
    expect(hitVertex(embankment(), view, sx, sy, 6)).toEqual({ kind: "phreatic", index: 1 });
  });

  it("hitEdge returns the edge and the projected point in metres", () => {
    const doc = embankment();
    const [sx, sy] = worldToScreen(view, 30, 20);
    const hit = hitEdge(doc, { kind: "region", region: 0 }, view, sx, sy - 3, 6);
    expect(hit?.after).toBe(1);
    expect(hit?.point[0]).toBeCloseTo(30, 9);
    expect(hit?.point[1]).toBeCloseTo(20, 9);
    // The closing edge of a polygon counts; the phreatic line has no closing edge.
    const [cx, cy] = worldToScreen(view, 35, 10);
    expect(hitEdge(doc, { kind: "region", region: 0 }, view, cx, cy, 4)?.after).toBe(3);
    const [px, py] = worldToScreen(view, 30, 10);
    expect(hitEdge(doc, { kind: "phreatic" }, view, px, py, 4)).toBeNull();
  });

  it("hitRegion and pointInPolygon pick the region under a point", () => {
    const doc = embankment();
    expect(hitRegion(doc, [30, 15])).toBe(0);
    expect(hitRegion(doc, [5, 5])).toBe(1);
    expect(hitRegion(doc, [5, 15])).toBe(-1);
    expect(
      pointInPolygon(
        [1, 1],
        [
          [0, 0],
          [2, 0],
          [2, 2],
          [0, 2],
        ],
      ),
    ).toBe(true);
  });

  it("clampSelection drops indices that no longer exist", () => {
    const doc = embankment();
    expect(clampSelection(doc, { kind: "region", region: 5, vertex: null })).toBeNull();
    expect(clampSelection(doc, { kind: "region", region: 0, vertex: 9 })).toEqual({
      kind: "region",
      region: 0,
      vertex: null,
    });
    const sel = { kind: "phreatic" as const, vertex: 2 };
    expect(clampSelection(doc, sel)).toBe(sel);
    expect(pointAt(doc, selectedVertex(sel)!)).toEqual([50, 9]);
  });
});
