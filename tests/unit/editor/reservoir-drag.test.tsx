// @vitest-environment jsdom
import { act } from "react";
import { describe, expect, it } from "vitest";
import { mount, byTestId, mouse, click, changes, latestDoc } from "./editor-harness";

/**
 * The reservoir tool moves the pool while the press is dragged (so live check follows the pool
 * level) and commits once on release; a plain click still sets the level where it was pressed.
 * The pool is level water against the section's edge: the phreatic line starts at the edge at the
 * pool's elevation (the reservoir's still surface; common practice).
 */
describe("dragging the reservoir level", () => {
  it("follows the pointer and commits one edit on release", async () => {
    await mount();
    await act(async () => byTestId("tool-reservoir").click());
    await mouse("mousedown", 5, 14);
    await mouse("mousemove", 5, 16);
    await mouse("mousemove", 5, 17);
    expect(changes).not.toHaveBeenCalled();
    await mouse("mouseup", 5, 17);
    expect(changes).toHaveBeenCalledTimes(1);
    expect(latestDoc().water?.phreatic?.[0]).toEqual([0, 17]);
  });

  it("sets the level where a click was pressed", async () => {
    await mount();
    await act(async () => byTestId("tool-reservoir").click());
    await click(5, 14);
    expect(changes).toHaveBeenCalledTimes(1);
    expect(latestDoc().water?.phreatic?.[0]).toEqual([0, 14]);
  });
});
