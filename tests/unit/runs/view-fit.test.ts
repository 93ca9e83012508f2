import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_PADDING, fitView, panBy, toScreen, toWorld, zoomAt, type Box } from "@/lib/runs/view/view-fit";

const coord = fc.double({ min: -1e4, max: 1e4, noNaN: true });
const boxArb = fc
  .tuple(coord, coord, fc.double({ min: 0.5, max: 2e3, noNaN: true }), fc.double({ min: 0.5, max: 2e3, noNaN: true }))
  .map(([x, y, w, h]): Box => ({ minX: x, minY: y, maxX: x + w, maxY: y + h }));
const size = fc.tuple(fc.integer({ min: 200, max: 3000 }), fc.integer({ min: 150, max: 2000 }));

describe("fitView (screenX = offsetX + x·s, screenY = offsetY − y·s)", () => {
  it("toWorld undoes toScreen for any view and point", () => {
    fc.assert(
      fc.property(boxArb, size, coord, coord, (box, [w, h], x, y) => {
        const v = fitView(box, w, h);
        const [sx, sy] = toScreen(v, x, y);
        const [wx, wy] = toWorld(v, sx, sy);
        expect(wx).toBeCloseTo(x, 6);
        expect(wy).toBeCloseTo(y, 6);
      }),
      { numRuns: 300 },
    );
  });

  it("puts the whole box inside the padded area, touching it on one axis, with y up", () => {
    fc.assert(
      fc.property(boxArb, size, (box, [w, h]) => {
        const v = fitView(box, w, h);
        const p = DEFAULT_PADDING;
        const [x0, yTop] = toScreen(v, box.minX, box.maxY);
        const [x1, yBottom] = toScreen(v, box.maxX, box.minY);
        const tol = 1e-6 * Math.max(w, h);
        expect(x0).toBeGreaterThanOrEqual(p.left - tol);
        expect(x1).toBeLessThanOrEqual(w - p.right + tol);
        expect(yTop).toBeGreaterThanOrEqual(p.top - tol);
        expect(yBottom).toBeLessThanOrEqual(h - p.bottom + tol);
        expect(yTop).toBeLessThan(yBottom);
        const fillsX = Math.abs(x1 - x0 - (w - p.left - p.right)) < 1e-6 * w;
        const fillsY = Math.abs(yBottom - yTop - (h - p.top - p.bottom)) < 1e-6 * h;
        expect(fillsX || fillsY).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("keeps one scale for both axes: a 10 m square stays square on screen", () => {
    const v = fitView({ minX: 0, minY: 0, maxX: 100, maxY: 20 }, 900, 400);
    const [ax, ay] = toScreen(v, 10, 10);
    const [bx, by] = toScreen(v, 20, 20);
    expect(bx - ax).toBeCloseTo(ay - by, 9);
  });

  it("zoomAt keeps the world point under the cursor fixed; panBy shifts by pixels", () => {
    fc.assert(
      fc.property(
        boxArb,
        fc.double({ min: 0.2, max: 5, noNaN: true }),
        fc.integer({ min: 0, max: 800 }),
        fc.integer({ min: 0, max: 500 }),
        (box, f, sx, sy) => {
          const v = fitView(box, 800, 500);
          const before = toWorld(v, sx, sy);
          const after = toWorld(zoomAt(v, f, sx, sy), sx, sy);
          expect(after[0]).toBeCloseTo(before[0], 5);
          expect(after[1]).toBeCloseTo(before[1], 5);
        },
      ),
      { numRuns: 200 },
    );
    const v = fitView({ minX: 0, minY: 0, maxX: 10, maxY: 10 }, 400, 300);
    const moved = panBy(v, 12, -7);
    expect(toScreen(moved, 3, 4)[0] - toScreen(v, 3, 4)[0]).toBeCloseTo(12, 9);
    expect(toScreen(moved, 3, 4)[1] - toScreen(v, 3, 4)[1]).toBeCloseTo(-7, 9);
  });
});
