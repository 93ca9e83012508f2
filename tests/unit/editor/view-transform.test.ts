import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  fitToBounds,
  panBy,
  screenToWorld,
  worldToScreen,
  zoomAbout,
  type ViewTransform,
} from "@/lib/editor/view-transform";

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const viewArb: fc.Arbitrary<ViewTransform> = fc.record({
  scale: finite(0.05, 500),
  offsetX: finite(-5000, 5000),
  offsetY: finite(-5000, 5000),
  exaggeration: fc.constantFrom(1, 2, 5),
});

function close(a: number, b: number, tol: number) {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(tol);
}

describe("view transform", () => {
  it("worldToScreen(view) follows the documented formula with y flipped and exaggerated", () => {
    const view = { scale: 10, offsetX: 50, offsetY: 400, exaggeration: 2 };
    expect(worldToScreen(view, 3, 4)).toEqual([80, 320]);
    expect(screenToWorld(view, 80, 320)).toEqual([3, 4]);
  });

  it("screenToWorld(worldToScreen(p)) round-trips for any view", () => {
    fc.assert(
      fc.property(viewArb, finite(-1e4, 1e4), finite(-1e4, 1e4), (view, x, y) => {
        const [sx, sy] = worldToScreen(view, x, y);
        const [wx, wy] = screenToWorld(view, sx, sy);
        close(wx, x, 1e-9 * (1 + Math.abs(x) + Math.abs(view.offsetX) / view.scale));
        close(wy, y, 1e-9 * (1 + Math.abs(y) + Math.abs(view.offsetY) / view.scale));
      }),
    );
  });

  it("zoomAbout(view, f, sx, sy) keeps the world point under the cursor still", () => {
    fc.assert(
      fc.property(viewArb, finite(0.2, 5), finite(0, 1000), finite(0, 600), (view, f, sx, sy) => {
        const before = screenToWorld(view, sx, sy);
        const after = screenToWorld(zoomAbout(view, f, sx, sy), sx, sy);
        close(after[0], before[0], 1e-6 * (1 + Math.abs(before[0])));
        close(after[1], before[1], 1e-6 * (1 + Math.abs(before[1])));
      }),
    );
  });

  it("zoomAbout(view) ignores a non-positive factor", () => {
    const view = { scale: 2, offsetX: 0, offsetY: 0, exaggeration: 1 };
    expect(zoomAbout(view, 0, 10, 10)).toBe(view);
  });

  it("panBy(view, dx, dy) shifts every screen point by (dx, dy)", () => {
    const view = { scale: 4, offsetX: 10, offsetY: 300, exaggeration: 5 };
    const [sx, sy] = worldToScreen(panBy(view, 7, -3), 2, 2);
    const [sx0, sy0] = worldToScreen(view, 2, 2);
    expect([sx - sx0, sy - sy0]).toEqual([7, -3]);
  });

  it("fitToBounds(bounds) puts the whole box inside the margins and centres it", () => {
    fc.assert(
      fc.property(
        finite(-500, 500),
        finite(-500, 500),
        finite(0.1, 800),
        finite(0.1, 300),
        fc.constantFrom(1, 2, 5),
        (x0, y0, w, h, ex) => {
          const b = { minX: x0, minY: y0, maxX: x0 + w, maxY: y0 + h };
          const m = { left: 50, right: 20, top: 20, bottom: 40 };
          const view = fitToBounds(b, 800, 500, ex, m);
          const [ax, ay] = worldToScreen(view, b.minX, b.minY);
          const [bx, by] = worldToScreen(view, b.maxX, b.maxY);
          expect(ax).toBeGreaterThanOrEqual(m.left - 1e-6);
          expect(bx).toBeLessThanOrEqual(800 - m.right + 1e-6);
          expect(by).toBeGreaterThanOrEqual(m.top - 1e-6);
          expect(ay).toBeLessThanOrEqual(500 - m.bottom + 1e-6);
          close((ax + bx) / 2, m.left + (800 - m.left - m.right) / 2, 1e-6);
          expect(view.exaggeration).toBe(ex);
        },
      ),
    );
  });

  it("fitToBounds(point) still gives a finite view", () => {
    const view = fitToBounds({ minX: 5, minY: 5, maxX: 5, maxY: 5 }, 400, 300);
    expect(Number.isFinite(view.scale) && Number.isFinite(view.offsetX) && Number.isFinite(view.offsetY)).toBe(true);
  });
});
