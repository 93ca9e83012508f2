import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  GRID_CORNERS,
  SNAP_STEP,
  bandLines,
  cornerPoint,
  dragBandLine,
  dragCorner,
  moveGrid,
  snap,
} from "@/lib/runs/view/grid-edit";

const onStep = (v: number) => Math.abs(v / SNAP_STEP - Math.round(v / SNAP_STEP)) < 1e-9;
const coord = fc.double({ min: -500, max: 500, noNaN: true });
const gridArb = fc
  .tuple(coord, coord, fc.integer({ min: 1, max: 200 }), fc.integer({ min: 1, max: 200 }))
  .map(([x, y, w, h]) => ({
    x1: snap(x),
    y1: snap(y),
    x2: snap(x) + w * SNAP_STEP,
    y2: snap(y) + h * SNAP_STEP,
    nx: 11,
    ny: 9,
  }));

describe("grid editing on 0.5 m steps", () => {
  it("snap rounds to the nearest half metre", () => {
    expect(snap(12.24)).toBe(12);
    expect(snap(12.26)).toBe(12.5);
    expect(snap(-0.2)).toBe(0);
    expect(Object.is(snap(-0.2), -0)).toBe(false);
  });

  it("moveGrid keeps the size and lands the corners on the step", () => {
    fc.assert(
      fc.property(gridArb, coord, coord, (g, x, y) => {
        const m = moveGrid(g, x, y);
        expect(m.x2 - m.x1).toBeCloseTo(g.x2 - g.x1, 9);
        expect(m.y2 - m.y1).toBeCloseTo(g.y2 - g.y1, 9);
        for (const v of [m.x1, m.y1, m.x2, m.y2]) expect(onStep(v)).toBe(true);
        expect([m.nx, m.ny]).toEqual([g.nx, g.ny]);
      }),
    );
  });

  it("dragCorner moves only that corner, snapped, keeping at least one step of size", () => {
    fc.assert(
      fc.property(gridArb, fc.constantFrom(...GRID_CORNERS), coord, coord, (g, corner, x, y) => {
        const d = dragCorner(g, corner, x, y);
        const opposite = GRID_CORNERS.find((k) => k !== corner && !k.split("-").some((part) => corner.includes(part)))!;
        expect(cornerPoint(d, opposite)).toEqual(cornerPoint(g, opposite));
        expect(d.x2 - d.x1).toBeGreaterThanOrEqual(SNAP_STEP - 1e-9);
        expect(d.y2 - d.y1).toBeGreaterThanOrEqual(SNAP_STEP - 1e-9);
        for (const v of cornerPoint(d, corner)) expect(onStep(v)).toBe(true);
      }),
    );
  });

  it("tangent band lines sit at the tangent elevations and drag to snapped ones", () => {
    const g = { x1: 20, y1: 25, x2: 45, y2: 45, nx: 21, ny: 21 };
    const radii = { tangentY1: 0, tangentY2: 15, n: 11 };
    expect(bandLines(radii, g)).toEqual([
      { key: "tangentY1", y: 0 },
      { key: "tangentY2", y: 15 },
    ]);
    expect(dragBandLine(radii, g, "tangentY2", 12.3)).toEqual({ tangentY1: 0, tangentY2: 12.5, n: 11 });
  });

  it("a radius range is drawn where circles from mid-grid reach deepest (yMid − r)", () => {
    const g = { x1: 20, y1: 30, x2: 40, y2: 40, nx: 5, ny: 5 };
    const radii = { r1: 10, r2: 30, n: 5 };
    expect(bandLines(radii, g)).toEqual([
      { key: "r1", y: 25 },
      { key: "r2", y: 5 },
    ]);
    expect(dragBandLine(radii, g, "r2", 7.9)).toEqual({ r1: 10, r2: 27, n: 5 });
    // A radius never drops below one step.
    expect(dragBandLine(radii, g, "r1", 80)).toEqual({ r1: SNAP_STEP, r2: 30, n: 5 });
  });
});
