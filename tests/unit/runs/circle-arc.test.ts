import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { arcPoints, arcY, sliceSides } from "@/lib/runs/view/circle-arc";

// A circle, and two abscissae on its lower arc (docs/engine.md §3: ya(x) = yc − √(R² − (x − xc)²)).
const circleWithEnds = fc
  .record({
    xc: fc.double({ min: -500, max: 500, noNaN: true }),
    yc: fc.double({ min: -200, max: 200, noNaN: true }),
    r: fc.double({ min: 0.5, max: 300, noNaN: true }),
    a: fc.double({ min: -1, max: 1, noNaN: true }),
    b: fc.double({ min: -1, max: 1, noNaN: true }),
  })
  .map(({ xc, yc, r, a, b }) => {
    const c = { xc, yc, r };
    const xa = xc + a * r;
    const xb = xc + b * r;
    return { c, entry: [xa, arcY(c, xa)] as [number, number], exit: [xb, arcY(c, xb)] as [number, number] };
  });

describe("arcPoints", () => {
  it("puts every point on the circle, on its lower half, between entry and exit", () => {
    fc.assert(
      fc.property(circleWithEnds, ({ c, entry, exit }) => {
        const pts = arcPoints(c, entry, exit);
        const lo = Math.min(entry[0], exit[0]);
        const hi = Math.max(entry[0], exit[0]);
        const tol = 1e-9 * Math.max(1, c.r, Math.abs(c.xc), Math.abs(c.yc));
        for (let i = 0; i < pts.length; i += 2) {
          const [x, y] = [pts[i], pts[i + 1]];
          expect(Math.abs(Math.hypot(x - c.xc, y - c.yc) - c.r)).toBeLessThan(1e-7 * Math.max(1, c.r));
          expect(y).toBeLessThanOrEqual(c.yc + tol);
          expect(x).toBeGreaterThanOrEqual(lo - tol * 10);
          expect(x).toBeLessThanOrEqual(hi + tol * 10);
        }
      }),
      { numRuns: 400 },
    );
  });

  it("starts at the entry and ends at the exit", () => {
    fc.assert(
      fc.property(circleWithEnds, ({ c, entry, exit }) => {
        const pts = arcPoints(c, entry, exit);
        const n = pts.length;
        const tol = 1e-6 * Math.max(1, c.r);
        expect(Math.abs(pts[0] - entry[0])).toBeLessThan(tol);
        expect(Math.abs(pts[1] - entry[1])).toBeLessThan(tol);
        expect(Math.abs(pts[n - 2] - exit[0])).toBeLessThan(tol);
        expect(Math.abs(pts[n - 1] - exit[1])).toBeLessThan(tol);
      }),
      { numRuns: 300 },
    );
  });

  it("follows the arc closely: no chord strays more than r·(1 − cos 1°) from it", () => {
    const c = { xc: 30, yc: 40, r: 25 };
    const pts = arcPoints(c, [10, arcY(c, 10)], [50, arcY(c, 50)]);
    for (let i = 2; i < pts.length; i += 2) {
      const mx = (pts[i] + pts[i - 2]) / 2;
      const my = (pts[i + 1] + pts[i - 1]) / 2;
      expect(c.r - Math.hypot(mx - c.xc, my - c.yc)).toBeLessThanOrEqual(c.r * (1 - Math.cos(Math.PI / 180)) + 1e-12);
    }
  });
});

describe("sliceSides", () => {
  it("runs each side from the arc up to the ground, with n + 1 sides for n slices", () => {
    const c = { xc: 0, yc: 10, r: 10 };
    const bounds = [
      { xLeft: -6, xRight: -2 },
      { xLeft: -2, xRight: 2 },
      { xLeft: 2, xRight: 6 },
    ];
    const sides = sliceSides(c, bounds, () => 5);
    expect(sides.map((s) => s.x)).toEqual([-6, -2, 2, 6]);
    // Lower arc at x = ±6: 10 − √(100 − 36) = 2 (a 6-8-10 triangle).
    expect(sides[0].yBase).toBeCloseTo(2, 12);
    expect(sides[3].yBase).toBeCloseTo(2, 12);
    for (const s of sides) expect(s.yTop).toBe(5);
  });
});
