import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Point } from "@/lib/stability";
import { nearestVertexWithin, nudgeStep, snapPoint, snapToGrid } from "@/lib/editor/snapping";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const pointArb: fc.Arbitrary<Point> = fc.tuple(finite(-200, 200), finite(-200, 200));
const viewArb: fc.Arbitrary<ViewTransform> = fc.record({
  scale: finite(0.5, 200),
  offsetX: finite(-500, 500),
  offsetY: finite(-500, 500),
  exaggeration: fc.constantFrom(1, 2, 5),
});

function screenDistance(view: ViewTransform, a: Point, b: Point): number {
  const [ax, ay] = worldToScreen(view, a[0], a[1]);
  const [bx, by] = worldToScreen(view, b[0], b[1]);
  return Math.hypot(ax - bx, ay - by);
}

describe("snapping", () => {
  it("snapToGrid(p, 0.5) rounds to half metres without float dust", () => {
    expect(snapToGrid([1.26, -0.74], 0.5)).toEqual([1.5, -0.5]);
    expect(snapToGrid([0.29, 0.31], 0.1)).toEqual([0.3, 0.3]);
    expect(snapToGrid([1.26, 2], 0)).toEqual([1.26, 2]);
  });

  it("snapToGrid(p, step) never moves a coordinate more than half a step", () => {
    fc.assert(
      fc.property(pointArb, fc.constantFrom(0.1, 0.25, 0.5, 1, 2, 5), (p, step) => {
        const q = snapToGrid(p, step);
        expect(Math.abs(q[0] - p[0])).toBeLessThanOrEqual(step / 2 + 1e-8);
        expect(Math.abs(q[1] - p[1])).toBeLessThanOrEqual(step / 2 + 1e-8);
      }),
    );
  });

  it("snapPoint(p) to a vertex never moves the point farther than the pixel tolerance", () => {
    fc.assert(
      fc.property(
        pointArb,
        fc.array(pointArb, { maxLength: 20 }),
        viewArb,
        fc.integer({ min: 1, max: 20 }),
        (p, vertices, view, tol) => {
          const r = snapPoint(p, { gridStep: 0, vertices, view, tolerancePx: tol });
          if (r.kind === "vertex") expect(screenDistance(view, p, r.point)).toBeLessThanOrEqual(tol + 1e-9);
          else expect(r.point).toEqual(p);
        },
      ),
    );
  });

  it("snapPoint(p) prefers a nearby vertex over the grid and picks the nearest one", () => {
    const view = { scale: 10, offsetX: 0, offsetY: 0, exaggeration: 1 };
    const vertices: Point[] = [
      [1.13, 2.07],
      [1.2, 2.0],
    ];
    const r = snapPoint([1.14, 2.06], { gridStep: 0.5, vertices, view, tolerancePx: 8 });
    expect(r).toEqual({ point: [1.13, 2.07], kind: "vertex", vertexIndex: 0 });
    expect(snapPoint([4.1, 4.1], { gridStep: 0.5, vertices, view, tolerancePx: 8 })).toEqual({
      point: [4, 4],
      kind: "grid",
    });
  });

  it("nearestVertexWithin(p) measures in screen pixels, so exaggeration matters", () => {
    const flat = { scale: 10, offsetX: 0, offsetY: 0, exaggeration: 1 };
    const tall = { ...flat, exaggeration: 5 };
    expect(nearestVertexWithin([0, 0], [[0, 0.5]], flat, 8)).toBe(0);
    expect(nearestVertexWithin([0, 0], [[0, 0.5]], tall, 8)).toBe(-1);
  });

  it("nudgeStep(grid) uses the grid step, or 0.1 m with the grid off", () => {
    expect(nudgeStep(0.5)).toBe(0.5);
    expect(nudgeStep(0)).toBe(0.1);
  });
});
