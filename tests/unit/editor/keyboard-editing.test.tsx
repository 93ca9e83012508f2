// @vitest-environment jsdom
import { act } from "react";
import { describe, expect, it } from "vitest";
import { embankment } from "./fixtures";
import { byTestId, key, latestDoc, mount } from "./editor-harness";

// Every pointer action of the editor has a keyboard path (WCAG 2.2, success criterion 2.1.1 Keyboard).
describe("editing the section with the keyboard alone", () => {
  it("Tab chooses a region, an arrow picks a vertex, arrows move it, undo puts it back", async () => {
    await mount();
    await key("Tab");
    expect(byTestId("editor-chosen").textContent).toMatch(/^Region 1 \(Compacted fill\), 4 vertices/);
    await key("ArrowUp");
    // The highest vertex of the fill is its first crest corner, (25, 20).
    expect(byTestId("editor-chosen").textContent).toContain("vertex 2 of 4: x 25.00 m, elevation 20.00 m");
    await key("ArrowRight");
    expect(latestDoc().regions[0].points[1]).toEqual([25.5, 20]);
    await key("ArrowRight", { shiftKey: true });
    expect(latestDoc().regions[0].points[1]).toEqual([30.5, 20]);
    await key("z", { ctrlKey: true });
    await key("z", { ctrlKey: true });
    expect(latestDoc()).toEqual(embankment());
  });

  it("Enter opens the chosen vertex's coordinates and Escape gives the keyboard back", async () => {
    await mount();
    await key("Tab");
    await key("Tab");
    await key("ArrowDown");
    await key("Enter");
    await act(async () => new Promise((r) => setTimeout(r, 50)));
    const field = document.activeElement as HTMLInputElement;
    expect(field.dataset.testid).toBe("vertex-x-0");
    await act(async () => {
      field.dispatchEvent(new KeyboardEvent("keydown", { key: "Escape", bubbles: true }));
    });
    expect(document.activeElement).toBe(byTestId("editor-canvas"));
  });

  it("Delete removes the chosen region; Escape steps back; ? shows the shortcuts", async () => {
    await mount();
    await key("Tab");
    await key("Delete");
    expect(latestDoc().regions).toHaveLength(1);
    await key("Tab");
    await key("ArrowLeft");
    await key("Escape");
    expect(byTestId("editor-chosen").textContent).toMatch(/^Region 1 \(Soft clay\), 6 vertices$/);
    await key("Escape");
    expect(byTestId("editor-chosen").textContent).toBe("");
    await key("?");
    expect(byTestId("shortcut-help").textContent).toContain("Tab / Shift+Tab");
    expect(byTestId("shortcut-help-toggle").getAttribute("aria-expanded")).toBe("true");
    await key("Escape");
    expect(() => byTestId("shortcut-help")).toThrow();
  });

  it("draws a region with the keyboard cursor: arrows move it, A puts a corner, Enter closes the outline", async () => {
    await mount();
    await key("r");
    // The cursor starts at the middle of the section, on the grid: (30, 10) for this 60 × 20 m bank.
    await key("ArrowUp");
    await key("a");
    await key("ArrowRight", { shiftKey: true });
    await key("a");
    await key("ArrowUp", { shiftKey: true });
    await key("a");
    expect(byTestId("editor-message").textContent).toBe("Corner 3 at x 35.00 m, elevation 15.00 m.");
    await key("Enter");
    expect(latestDoc().regions).toHaveLength(3);
    expect(latestDoc().regions[2].points).toEqual([
      [30, 10],
      [35, 10],
      [35, 15],
    ]);
  });
});
