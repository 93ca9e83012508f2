import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Point, SectionDocument } from "@/lib/stability";
import { deleteVertex, insertVertex, moveVertex, setRegionMaterial } from "@/lib/editor/document-edits";
import { canRedo, canUndo, createHistory, historyReducer, type History } from "@/lib/editor/history";
import { embankment } from "./fixtures";

type Edit = (doc: SectionDocument) => SectionDocument;

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const pointArb: fc.Arbitrary<Point> = fc.tuple(finite(-100, 100), finite(-100, 100));

const editArb: fc.Arbitrary<Edit> = fc.oneof(
  fc.tuple(fc.nat(), pointArb).map(
    ([i, p]): Edit =>
      (d) =>
        moveVertex(d, { kind: "region", region: 1, index: i % d.regions[1].points.length }, p),
  ),
  fc.tuple(fc.nat(), pointArb).map(
    ([i, p]): Edit =>
      (d) =>
        insertVertex(d, 0, i % d.regions[0].points.length, p),
  ),
  fc.nat().map((i): Edit => (d) => {
    const r = deleteVertex(d, 0, i % d.regions[0].points.length);
    return r.ok ? r.doc : d;
  }),
  fc.constantFrom("fill", "clay").map(
    (m): Edit =>
      (d) =>
        setRegionMaterial(d, 0, m),
  ),
);

describe("history", () => {
  it("historyReducer: undo after any edit sequence restores the original", () => {
    fc.assert(
      fc.property(fc.array(editArb, { maxLength: 30 }), (edits) => {
        const original = embankment();
        const snapshot = structuredClone(original);
        let h: History<SectionDocument> = createHistory(original);
        for (const edit of edits) h = historyReducer(h, { type: "commit", next: edit(h.present) });
        while (canUndo(h)) h = historyReducer(h, { type: "undo" });
        expect(h.present).toEqual(snapshot);
        expect(original).toEqual(snapshot);
      }),
    );
  });

  it("historyReducer: redo after undo returns to the same document", () => {
    fc.assert(
      fc.property(fc.array(editArb, { minLength: 1, maxLength: 15 }), fc.nat(), (edits, k) => {
        let h: History<SectionDocument> = createHistory(embankment());
        for (const edit of edits) h = historyReducer(h, { type: "commit", next: edit(h.present) });
        const end = h.present;
        const steps = k % (h.past.length + 1);
        for (let i = 0; i < steps; i++) h = historyReducer(h, { type: "undo" });
        for (let i = 0; i < steps; i++) h = historyReducer(h, { type: "redo" });
        expect(h.present).toBe(end);
      }),
    );
  });

  it("historyReducer(commit) clears redo, and a no-op commit adds no step", () => {
    let h = createHistory("a");
    h = historyReducer(h, { type: "commit", next: "b" });
    h = historyReducer(h, { type: "undo" });
    expect(canRedo(h)).toBe(true);
    h = historyReducer(h, { type: "commit", next: "c" });
    expect(canRedo(h)).toBe(false);
    expect(historyReducer(h, { type: "commit", next: "c" })).toBe(h);
  });

  it("historyReducer keeps at most `limit` steps", () => {
    let h = createHistory(0);
    for (let i = 1; i <= 10; i++) h = historyReducer(h, { type: "commit", next: i }, 4);
    expect(h.past).toEqual([6, 7, 8, 9]);
  });

  it("historyReducer(sync) adopts an outside document without an undo step; reset forgets", () => {
    let h = historyReducer(createHistory("a"), { type: "commit", next: "b" });
    h = historyReducer(h, { type: "sync", present: "B" });
    expect(h).toEqual({ past: ["a"], present: "B", future: [] });
    expect(historyReducer(h, { type: "reset", present: "z" })).toEqual(createHistory("z"));
    expect(historyReducer(createHistory("a"), { type: "undo" })).toEqual(createHistory("a"));
  });
});
