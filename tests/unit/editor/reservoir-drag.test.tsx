// @vitest-environment jsdom
import "vitest-canvas-mock";
import { act, useEffect, useState } from "react";
import { createRoot, type Root } from "react-dom/client";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { SectionDocument } from "@/lib/stability";
import { SectionEditor, type EditorIssue } from "@/components/section-editor/section-editor";
import { worldToScreen, type ViewTransform } from "@/lib/editor/view-transform";
import { embankment } from "./fixtures";

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

const MATERIALS = [
  { key: "fill", name: "Compacted fill", color: "#e69f00" },
  { key: "clay", name: "Soft clay", color: "#009e73" },
];

let container: HTMLDivElement;
let root: Root;
let latest: SectionDocument;
const changes = vi.fn();

function Harness({ issues, readOnly }: { issues?: EditorIssue[]; readOnly?: boolean }) {
  const [doc, setDoc] = useState<SectionDocument>(embankment);
  useEffect(() => {
    latest = doc;
  });
  return (
    <>
      <button type="button" data-testid="parent-revert" onClick={() => setDoc(embankment())} />
      <SectionEditor
        document={doc}
        onChange={(d) => {
          changes(d);
          setDoc(d);
        }}
        materials={MATERIALS}
        issues={issues}
        readOnly={readOnly}
        height={400}
      />
    </>
  );
}

async function mount(props: { issues?: EditorIssue[]; readOnly?: boolean } = {}) {
  await act(async () => root.render(<Harness {...props} />));
  // next/dynamic loads the konva module asynchronously; the first load takes a while.
  for (let i = 0; i < 100 && !container.querySelector("canvas"); i++) {
    await act(async () => new Promise((r) => setTimeout(r, 30)));
  }
}

const byTestId = (id: string) => {
  const el = container.querySelector(`[data-testid="${id}"]`);
  if (!el) throw new Error(`no element with data-testid ${id}`);
  return el as HTMLElement;
};

function view(): ViewTransform {
  return JSON.parse(byTestId("editor-canvas").dataset.view ?? "null") as ViewTransform;
}

async function mouse(type: "mousedown" | "mousemove" | "mouseup" | "dblclick", x: number, y: number) {
  const [sx, sy] = worldToScreen(view(), x, y);
  await act(async () => {
    byTestId("editor-canvas").dispatchEvent(
      new MouseEvent(type, { bubbles: true, clientX: sx, clientY: sy, button: 0, detail: type === "dblclick" ? 2 : 1 }),
    );
  });
}

async function click(x: number, y: number) {
  await mouse("mousedown", x, y);
  await mouse("mouseup", x, y);
}

beforeEach(() => {
  container = document.createElement("div");
  document.body.appendChild(container);
  root = createRoot(container);
  changes.mockReset();
});

afterEach(async () => {
  await act(async () => root.unmount());
  container.remove();
});

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
    expect(latest.water?.phreatic?.[0]).toEqual([0, 17]);
  });

  it("sets the level where a click was pressed", async () => {
    await mount();
    await act(async () => byTestId("tool-reservoir").click());
    await click(5, 14);
    expect(changes).toHaveBeenCalledTimes(1);
    expect(latest.water?.phreatic?.[0]).toEqual([0, 14]);
  });
});
