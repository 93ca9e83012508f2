import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Point, SectionDocument } from "@/lib/stability";
import {
  addRegion,
  deletePoint,
  deleteRegion,
  deleteVertex,
  insertPoint,
  insertVertex,
  moveSharedVertex,
  moveVertex,
  setPhreatic,
  setRegionMaterial,
} from "@/lib/editor/document-edits";
import { embankment } from "./fixtures";

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const pointArb: fc.Arbitrary<Point> = fc.tuple(finite(-100, 100), finite(-100, 100));

describe("document edits", () => {
  it("addRegion(doc) appends a copy and leaves the input untouched", () => {
    const doc = embankment();
    const before = structuredClone(doc);
    const pts: Point[] = [
      [0, 20],
      [10, 20],
      [10, 25],
    ];
    const next = addRegion(doc, "fill", pts);
    expect(next.regions).toHaveLength(3);
    expect(next.regions[2]).toEqual({ material: "fill", points: pts });
    expect(next.regions[2].points[0]).not.toBe(pts[0]);
    expect(doc).toEqual(before);
    expect(() => addRegion(doc, "fill", pts.slice(0, 2))).toThrow(/at least 3/);
  });

  it("moveVertex(doc, ref, p) moves just that vertex", () => {
    const doc = embankment();
    const next = moveVertex(doc, { kind: "region", region: 0, index: 1 }, [24, 21]);
    expect(next.regions[0].points[1]).toEqual([24, 21]);
    expect(next.regions[1]).toBe(doc.regions[1]);
    const wet = moveVertex(doc, { kind: "phreatic", index: 0 }, [0, 13]);
    expect(wet.water?.phreatic?.[0]).toEqual([0, 13]);
    expect(doc.water?.phreatic?.[0]).toEqual([0, 12]);
  });

  it("moveSharedVertex(doc, ref, p) keeps a shared corner shared", () => {
    const next = moveSharedVertex(embankment(), { kind: "region", region: 0, index: 0 }, [19, 10]);
    expect(next.regions[0].points[0]).toEqual([19, 10]);
    expect(next.regions[1].points[4]).toEqual([19, 10]);
  });

  it("insertVertex then deleteVertex restores the region", () => {
    const doc = embankment();
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1 }), fc.nat(), pointArb, (region, afterRaw, p) => {
        const after = afterRaw % doc.regions[region].points.length;
        const inserted = insertVertex(doc, region, after, p);
        expect(inserted.regions[region].points).toHaveLength(doc.regions[region].points.length + 1);
        expect(inserted.regions[region].points[after + 1]).toEqual(p);
        const back = deleteVertex(inserted, region, after + 1);
        expect(back.ok && back.doc).toEqual(doc);
      }),
    );
  });

  it("deleteVertex(doc) refuses to leave a region with fewer than 3 vertices", () => {
    const doc = addRegion(embankment(), "fill", [
      [0, 20],
      [5, 20],
      [5, 25],
    ]);
    const r = deleteVertex(doc, 2, 0);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/at least 3 vertices/);
  });

  it("deletePoint(doc, phreatic) refuses to go below 2 points", () => {
    let doc: SectionDocument = embankment();
    for (let i = 0; i < 2; i++) {
      const r = deletePoint(doc, { kind: "phreatic" }, 0);
      expect(r.ok).toBe(true);
      if (r.ok) doc = r.doc;
    }
    expect(deletePoint(doc, { kind: "phreatic" }, 0).ok).toBe(false);
  });

  it("insertPoint(doc, owner, -1, p) puts the point first", () => {
    const next = insertPoint(embankment(), { kind: "phreatic" }, -1, [-5, 12]);
    expect(next.water?.phreatic?.[0]).toEqual([-5, 12]);
    expect(() => insertPoint(embankment(), { kind: "region", region: 9 }, 0, [0, 0])).toThrow(/does not exist/);
  });

  it("deleteRegion and setRegionMaterial change only their region", () => {
    const doc = embankment();
    expect(deleteRegion(doc, 0).regions).toEqual([doc.regions[1]]);
    const next = setRegionMaterial(doc, 1, "fill");
    expect(next.regions[1].material).toBe("fill");
    expect(doc.regions[1].material).toBe("clay");
  });

  it("setPhreatic(doc, points) replaces ru, and null removes the line", () => {
    const doc: SectionDocument = { ...embankment(), water: { gammaW: 10, ru: 0.2 } };
    const wet = setPhreatic(doc, [
      [0, 5],
      [60, 5],
    ]);
    expect(wet.water).toEqual({
      gammaW: 10,
      phreatic: [
        [0, 5],
        [60, 5],
      ],
    });
    expect(setPhreatic(wet, null).water).toEqual({ gammaW: 10 });
    expect(setPhreatic(embankment(), null).water).toBeUndefined();
    expect(setPhreatic(doc, null).water).toEqual({ gammaW: 10, ru: 0.2 });
  });
});
