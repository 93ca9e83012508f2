import { describe, expect, it } from "vitest";
import { extremeVertex, pickVertexToward, selectableItems, stepItem } from "@/lib/editor/keyboard-selection";
import { embankment } from "./fixtures";

// Keyboard walking of the drawing follows the WAI-ARIA Authoring Practices' rule for composite
// widgets (w3.org/WAI/ARIA/apg, "Developing a Keyboard Interface"): the keyboard must be able to
// leave the widget with Tab, so a walk off either end hands the focus on instead of wrapping.
describe("choosing items with the keyboard", () => {
  it("lists the regions in panel order, then the phreatic line", () => {
    expect(selectableItems(embankment())).toEqual([
      { kind: "region", region: 0 },
      { kind: "region", region: 1 },
      { kind: "phreatic" },
    ]);
    const dry = { ...embankment(), water: undefined };
    expect(selectableItems(dry)).toHaveLength(2);
  });

  it("Tab walks forward and leaves after the last item", () => {
    const doc = embankment();
    const first = stepItem(doc, null, 1);
    expect(first).toEqual({ kind: "region", region: 0, vertex: null });
    // From a chosen vertex, Tab goes to the next whole item.
    expect(stepItem(doc, { kind: "region", region: 0, vertex: 2 }, 1)).toEqual({
      kind: "region",
      region: 1,
      vertex: null,
    });
    expect(stepItem(doc, { kind: "region", region: 1, vertex: null }, 1)).toEqual({ kind: "phreatic", vertex: null });
    expect(stepItem(doc, { kind: "phreatic", vertex: null }, 1)).toBe("leave");
  });

  it("Shift+Tab walks back, clears before the first item, then leaves", () => {
    const doc = embankment();
    expect(stepItem(doc, { kind: "phreatic", vertex: 1 }, -1)).toEqual({ kind: "region", region: 1, vertex: null });
    expect(stepItem(doc, { kind: "region", region: 0, vertex: null }, -1)).toBe("clear");
    expect(stepItem(doc, null, -1)).toBe("leave");
  });

  it("an arrow picks the vertex furthest that way", () => {
    // The fill of the fixture: toe (20, 10), crest (25, 20) and (35, 20), toe (50, 10).
    const fill = embankment().regions[0].points;
    expect(extremeVertex(fill, -1, 0)).toBe(0);
    expect(extremeVertex(fill, 1, 0)).toBe(3);
    // Both crest corners are highest: the first in outline order wins.
    expect(extremeVertex(fill, 0, 1)).toBe(1);
    expect(extremeVertex([], 1, 0)).toBe(-1);
    expect(pickVertexToward(embankment(), { kind: "region", region: 0, vertex: null }, 0, -1)).toEqual({
      kind: "region",
      region: 0,
      vertex: 0,
    });
  });
});
