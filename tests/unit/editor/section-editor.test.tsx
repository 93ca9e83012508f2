// @vitest-environment jsdom
import { act } from "react";
import { describe, expect, it } from "vitest";
import { embankment } from "./fixtures";
import type { EditorIssue } from "@/components/section-editor/section-editor";
import { worldToScreen } from "@/lib/editor/view-transform";
import { mount, byTestId, view, mouse, click, key, changes, latestDoc } from "./editor-harness";

describe("SectionEditor", () => {
  it("renders its parts with stable test ids and a view contract", async () => {
    await mount();
    for (const id of ["section-editor", "editor-canvas", "vertex-table", "issue-list", "undo", "redo", "zoom-fit"])
      byTestId(id);
    for (const t of ["select", "region", "phreatic", "reservoir", "pan"])
      expect(byTestId(`tool-${t}`).getAttribute("aria-label")).toMatch(/\(.\)$/);
    const v = view();
    expect(v.exaggeration).toBe(1);
    expect(v.scale).toBeGreaterThan(0);
    expect(byTestId("editor-canvas").querySelector("canvas")).not.toBeNull();
  });

  it("selects a region by clicking inside it and lists its vertices", async () => {
    await mount();
    await click(30, 15);
    expect(byTestId("selection-panel").textContent).toContain("Region 1");
    expect(byTestId("vertex-table").querySelectorAll("tbody tr")).toHaveLength(4);
    expect((byTestId("vertex-x-1") as HTMLInputElement).value).toBe("25.00");
  });

  it("drags a vertex with snapping as one undo step, moving the shared corner too", async () => {
    await mount();
    await mouse("mousedown", 20, 10);
    await mouse("mousemove", 19.1, 10.2);
    await mouse("mousemove", 18.9, 10.1);
    await mouse("mouseup", 18.9, 10.1);
    expect(changes).toHaveBeenCalledTimes(1);
    expect(latestDoc().regions[0].points[0]).toEqual([19, 10]);
    expect(latestDoc().regions[1].points[4]).toEqual([19, 10]);
    await act(async () => byTestId("undo").click());
    expect(latestDoc()).toEqual(embankment());
    await key("z", { ctrlKey: true, shiftKey: true });
    expect(latestDoc().regions[0].points[0]).toEqual([19, 10]);
  });

  it("types an exact coordinate in the table and the document follows", async () => {
    await mount();
    await click(30, 15);
    const input = byTestId("vertex-y-2") as HTMLInputElement;
    await act(async () => {
      input.focus();
      const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!;
      setter.call(input, "21.125");
      input.dispatchEvent(new Event("input", { bubbles: true }));
    });
    await act(async () => input.blur());
    expect(latestDoc().regions[0].points[2]).toEqual([35, 21.125]);
  });

  it("draws a region with clicks and Enter, and Escape drops a drawing", async () => {
    await mount();
    await key("r");
    expect(byTestId("tool-region").getAttribute("aria-pressed")).toBe("true");
    await click(0, 20);
    await click(10, 20);
    await click(10, 25);
    await key("Enter");
    expect(latestDoc().regions).toHaveLength(3);
    expect(latestDoc().regions[2]).toEqual({
      material: "fill",
      points: [
        [0, 20],
        [10, 20],
        [10, 25],
      ],
    });
    await click(40, 30);
    await key("Escape");
    await key("Enter");
    expect(latestDoc().regions).toHaveLength(3);
  });

  it("refuses to delete below 3 vertices with a message", async () => {
    await mount();
    await click(30, 15);
    await key("]");
    await key("Delete");
    expect(latestDoc().regions[0].points).toHaveLength(3);
    await key("Delete");
    expect(latestDoc().regions[0].points).toHaveLength(3);
    expect(byTestId("editor-message").textContent).toMatch(/at least 3 vertices/);
  });

  it("inserts a vertex by double-clicking an edge", async () => {
    await mount();
    await click(30, 15);
    await mouse("dblclick", 30, 20);
    expect(latestDoc().regions[0].points).toHaveLength(5);
    expect(latestDoc().regions[0].points[2][0]).toBeCloseTo(30, 6);
  });

  it("nudges the selected vertex with the arrows by the snap step", async () => {
    await mount();
    await click(25, 20);
    await key("ArrowUp");
    expect(latestDoc().regions[0].points[1]).toEqual([25, 20.5]);
  });

  it("picking an issue selects the vertex its path names", async () => {
    const issues: EditorIssue[] = [
      { code: "x", path: "regions[1].points[2]", message: "Edges cross here.", at: [60, 10] },
    ];
    await mount({ issues });
    await act(async () => byTestId("issue-0").click());
    expect(byTestId("vertex-row-2").getAttribute("aria-selected")).toBe("true");
    const [sx] = worldToScreen(view(), 60, 10);
    expect(sx).toBeCloseTo(400, 6);
  });

  it("sets a reservoir level from the side panel", async () => {
    await mount();
    const input = byTestId("reservoir-elevation") as HTMLInputElement;
    await act(async () => {
      const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!;
      setter.call(input, "15");
      input.dispatchEvent(new Event("input", { bubbles: true }));
    });
    await act(async () => byTestId("reservoir-apply").click());
    expect(latestDoc().water?.phreatic?.slice(0, 2)).toEqual([
      [0, 15],
      [22.5, 15],
    ]);
  });

  it("changes nothing when read-only", async () => {
    await mount({ readOnly: true });
    await mouse("mousedown", 20, 10);
    await mouse("mousemove", 18, 12);
    await mouse("mouseup", 18, 12);
    await key("Delete");
    expect(changes).not.toHaveBeenCalled();
  });

  it("adopts a document the parent replaces from outside", async () => {
    await mount();
    await click(25, 20);
    await key("ArrowUp");
    expect(latestDoc().regions[0].points[1]).toEqual([25, 20.5]);
    await act(async () => byTestId("parent-revert").click());
    await click(30, 15);
    expect((byTestId("vertex-y-1") as HTMLInputElement).value).toBe("20.00");
  });
});
