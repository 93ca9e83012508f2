import { describe, expect, it } from "vitest";
import { arcY } from "@/lib/runs/view/circle-arc";
import { criticalAttribute } from "@/lib/runs/view/circle-styles";
import { buildRunScene, gridCentres } from "@/lib/runs/view/run-scene";
import { embankment, smallRun } from "./engine-run";

const inside = (b: { minX: number; minY: number; maxX: number; maxY: number }, x: number, y: number) =>
  x >= b.minX - 1e-9 && x <= b.maxX + 1e-9 && y >= b.minY - 1e-9 && y <= b.maxY + 1e-9;

describe("buildRunScene with a grid search of the embankment fixture", () => {
  const { doc, result, bishop } = smallRun();
  const scene = buildRunScene({ document: doc, result, slices: bishop.slices, requiredFs: 1.5 });

  it("draws each method's critical circle as the engine reports it, Bishop solid and the ordinary method dashed", () => {
    const drawn = JSON.parse(criticalAttribute(scene.critical)) as {
      method: string;
      xc: number;
      yc: number;
      r: number;
      fs: number;
      dashed: boolean;
    }[];
    expect(drawn.map((d) => d.method)).toEqual(["bishop", "fellenius"]);
    expect(drawn[0]).toMatchObject({
      xc: expect.closeTo(result.results.bishop!.circle.xc, 3),
      r: expect.closeTo(result.results.bishop!.circle.r, 3),
      fs: result.results.bishop!.fs,
      dashed: false,
    });
    expect(drawn[1].dashed).toBe(true);
  });

  it("colours one map cell per centre and fits the section, the map and the centres", () => {
    expect(scene.method).toBe("bishop");
    expect(scene.cells).toHaveLength(8 * 6);
    const section = { minX: 0, minY: 0, maxX: 100, maxY: 22 };
    for (const [x, y] of [
      [section.minX, section.minY],
      [section.maxX, section.maxY],
    ])
      expect(inside(scene.fitBox, x, y)).toBe(true);
    for (const c of scene.cells)
      expect(inside(scene.fitBox, c.x1, c.y1) && inside(scene.fitBox, c.x2, c.y2)).toBe(true);
  });

  it("draws the lowest circles and one side per slice boundary, each from the arc up to the ground", () => {
    expect(scene.lowest).toHaveLength(result.lowest.bishop!.length);
    expect(scene.slices).toHaveLength(bishop.slices.length + 1);
    const c = result.results.bishop!.circle;
    for (const s of scene.slices) {
      expect(s.yBase).toBeCloseTo(arcY(c, s.x), 9);
      expect(s.yTop).toBeGreaterThanOrEqual(s.yBase);
    }
    expect(scene.ponds).toHaveLength(1);
  });

  it("shows the ordinary method's map and lowest circles when asked", () => {
    const o = buildRunScene({ document: doc, result, method: "fellenius" });
    expect(o.method).toBe("fellenius");
    expect(o.lowest).toHaveLength(result.lowest.fellenius!.length);
  });
});

describe("buildRunScene in set-up and compare modes", () => {
  it("shows trial centres as dots and the tangent band when there is no result", () => {
    const doc = embankment();
    const grid = { x1: 60, y1: 30, x2: 70, y2: 40, nx: 3, ny: 2 };
    const scene = buildRunScene({ document: doc, grid, radii: { tangentY1: 2, tangentY2: 9, n: 4 } });
    expect(scene.centres).toEqual(gridCentres(grid));
    expect(scene.centres).toEqual([
      [60, 30],
      [65, 30],
      [70, 30],
      [60, 40],
      [65, 40],
      [70, 40],
    ]);
    expect(scene.band.map((b) => b.y)).toEqual([2, 9]);
    expect(scene.cells).toEqual([]);
    expect(scene.critical).toEqual([]);
  });

  it("draws overlays instead of the result's circles, keeping their labels and colours", () => {
    const doc = embankment();
    const scene = buildRunScene({
      document: doc,
      overlays: [
        { label: "Run A 1.41", color: "#0072B2", circle: { xc: 70, yc: 35, r: 30 }, entry: [50, 22], exit: [86, 10] },
        { label: "Run B 1.38", color: "#D55E00", circle: { xc: 72, yc: 33, r: 28 }, entry: [53, 22], exit: [88, 10] },
      ],
      drawdownTo: 14,
    });
    expect(scene.critical.map((c) => [c.label, c.style.colour])).toEqual([
      ["Run A 1.41", "#0072B2"],
      ["Run B 1.38", "#D55E00"],
    ]);
    expect(scene.critical[0].style.dash).not.toEqual(scene.critical[1].style.dash);
    expect(scene.pool?.spans).toHaveLength(1);
  });
});
