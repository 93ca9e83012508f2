// @vitest-environment jsdom
import { act } from "react";
import { describe, expect, it } from "vitest";
import type { SectionDocument } from "@/lib/stability";
import { byTestId, changes, latestDoc, mount, mouse } from "./editor-harness";
import { embankment } from "./fixtures";

/**
 * Dragging a whole region or a surcharge with the select tool: the moved section is shown while
 * the pointer moves (the same preview live check follows) and is committed as one edit on release,
 * as a vertex drag is. Geometry checked: a translation moves every corner by the same amount
 * (definition of a rigid shift), and a shared corner stays shared (the editor's own rule for
 * regions that meet, as a vertex drag keeps it in lib/editor/document-edits.ts).
 */
function withSurcharge(): SectionDocument {
  return { ...embankment(), loads: { surcharges: [{ x1: 27, x2: 33, q: 20 }] } };
}

async function selectTool() {
  await act(async () => byTestId("tool-select").click());
}

describe("dragging a whole region", () => {
  it("moves the fill 2 m to the right, its shared corners with it, as one edit on release", async () => {
    await mount();
    await selectTool();
    await mouse("mousedown", 30, 15);
    await mouse("mousemove", 31, 15);
    await mouse("mousemove", 32, 15);
    expect(changes).not.toHaveBeenCalled();
    await mouse("mouseup", 32, 15);
    expect(changes).toHaveBeenCalledTimes(1);
    const doc = latestDoc();
    expect(doc.regions[0].points).toEqual([
      [22, 10],
      [27, 20],
      [37, 20],
      [52, 10],
    ]);
    // The clay's corners under the fill's toes followed; its own outer corners stayed.
    expect(doc.regions[1].points).toContainEqual([22, 10]);
    expect(doc.regions[1].points).toContainEqual([52, 10]);
    expect(doc.regions[1].points).toContainEqual([0, 10]);
    expect(doc.regions[1].points).toContainEqual([60, 10]);
  });

  it("a press without a drag only selects the region", async () => {
    await mount();
    await selectTool();
    await mouse("mousedown", 30, 15);
    await mouse("mouseup", 30, 15);
    expect(changes).not.toHaveBeenCalled();
  });
});

describe("dragging a surcharge", () => {
  it("moves the strip along the ground, width and pressure kept, as one edit on release", async () => {
    await mount({ start: withSurcharge });
    await selectTool();
    // The band stands just above the crest (y = 20) over x = 27…33.
    await mouse("mousedown", 30, 20.3);
    await mouse("mousemove", 31, 20.3);
    await mouse("mousemove", 28, 20.3);
    expect(changes).not.toHaveBeenCalled();
    await mouse("mouseup", 28, 20.3);
    expect(changes).toHaveBeenCalledTimes(1);
    const s = latestDoc().loads?.surcharges?.[0];
    expect(s).toEqual({ x1: 25, x2: 31, q: 20 });
    // The regions did not move.
    expect(latestDoc().regions).toEqual(withSurcharge().regions);
  });
});
