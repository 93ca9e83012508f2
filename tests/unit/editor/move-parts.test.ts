import { describe, expect, it } from "vitest";
import { groundSurface } from "@/lib/editor/ground-surface";
import { hitSurcharge, moveRegion, moveSurcharge, SURCHARGE_BAND_PX } from "@/lib/editor/move-parts";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { embankment } from "./fixtures";

/**
 * Moving whole parts of a section (lib/editor/move-parts.ts). Checked against geometry: a rigid
 * shift moves every corner by the same vector and keeps a region's shape (definition), shared
 * corners stay shared unless detached (the editor's rule, lib/editor/document-edits.ts), and a surcharge
 * keeps its width and pressure and cannot leave the section it loads (common practice: a load
 * acts on the ground it stands on).
 */
const withLoad = () => ({ ...embankment(), loads: { surcharges: [{ x1: 27, x2: 33, q: 20 }], kh: 0.1 } });

describe("moveRegion", () => {
  it("shifts every corner by the same vector and leaves the input untouched", () => {
    const doc = embankment();
    const before = JSON.stringify(doc);
    const moved = moveRegion(doc, 0, 1.5, -0.5);
    expect(JSON.stringify(doc)).toBe(before);
    moved.regions[0].points.forEach((p, i) => {
      expect(p[0] - doc.regions[0].points[i][0]).toBeCloseTo(1.5, 12);
      expect(p[1] - doc.regions[0].points[i][1]).toBeCloseTo(-0.5, 12);
    });
  });

  it("takes the shared corners of its neighbours along, unless detached", () => {
    const shared = moveRegion(embankment(), 0, 2, 0);
    expect(shared.regions[1].points).toContainEqual([22, 10]);
    expect(shared.regions[1].points).not.toContainEqual([20, 10]);
    const alone = moveRegion(embankment(), 0, 2, 0, true);
    expect(alone.regions[1]).toEqual(embankment().regions[1]);
  });

  it("names a region that does not exist", () => {
    expect(() => moveRegion(embankment(), 5, 1, 1)).toThrow("region 5 does not exist");
  });
});

describe("moveSurcharge", () => {
  it("keeps width, pressure and the other loads", () => {
    const m = moveSurcharge(withLoad(), 0, -4);
    expect(m.loads).toEqual({ surcharges: [{ x1: 23, x2: 29, q: 20 }], kh: 0.1 });
  });

  it("stops at the section's sides (x = 0 and 60)", () => {
    expect(moveSurcharge(withLoad(), 0, -100).loads?.surcharges?.[0]).toEqual({ x1: 0, x2: 6, q: 20 });
    expect(moveSurcharge(withLoad(), 0, 100).loads?.surcharges?.[0]).toEqual({ x1: 54, x2: 60, q: 20 });
  });
});

describe("hitSurcharge", () => {
  const view: ViewTransform = { scale: 10, offsetX: 50, offsetY: 400, exaggeration: 1 };
  const doc = withLoad();
  const ground = groundSurface(doc.regions);
  it("finds the band just above the ground over the strip, and nothing below the ground or beside it", () => {
    const [sx, sy] = worldToScreen(view, 30, 20);
    expect(hitSurcharge(doc, ground, view, sx, sy - SURCHARGE_BAND_PX / 2)).toBe(0);
    expect(hitSurcharge(doc, ground, view, sx, sy + 10)).toBe(-1);
    const [bx] = worldToScreen(view, 40, 20);
    expect(hitSurcharge(doc, ground, view, bx, sy - SURCHARGE_BAND_PX / 2)).toBe(-1);
  });
});
