// Shared by the section editor's jsdom tests: the editor mounted in a harness that keeps the document,
// pointer and key events at world coordinates, and mount/unmount around each test.
import "vitest-canvas-mock";
import { act, useEffect, useState } from "react";
import { createRoot, type Root } from "react-dom/client";
import { afterEach, beforeEach, vi } from "vitest";
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

/** The document as the editor last reported it. */
export const latestDoc = (): SectionDocument => latest;
export const changes = vi.fn();

interface HarnessProps {
  issues?: EditorIssue[];
  readOnly?: boolean;
  /** The document to start from (the two-region embankment when absent). */
  start?: () => SectionDocument;
}

function Harness({ issues, readOnly, start = embankment }: HarnessProps) {
  const [doc, setDoc] = useState<SectionDocument>(start);
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

export async function mount(props: HarnessProps = {}) {
  await act(async () => root.render(<Harness {...props} />));
  // next/dynamic loads the konva module asynchronously; the first load takes a while.
  for (let i = 0; i < 100 && !container.querySelector("canvas"); i++) {
    await act(async () => new Promise((r) => setTimeout(r, 30)));
  }
}

export const byTestId = (id: string) => {
  const el = container.querySelector(`[data-testid="${id}"]`);
  if (!el) throw new Error(`no element with data-testid ${id}`);
  return el as HTMLElement;
};

export function view(): ViewTransform {
  return JSON.parse(byTestId("editor-canvas").dataset.view ?? "null") as ViewTransform;
}

export async function mouse(type: "mousedown" | "mousemove" | "mouseup" | "dblclick", x: number, y: number) {
  const [sx, sy] = worldToScreen(view(), x, y);
  await act(async () => {
    byTestId("editor-canvas").dispatchEvent(
      new MouseEvent(type, { bubbles: true, clientX: sx, clientY: sy, button: 0, detail: type === "dblclick" ? 2 : 1 }),
    );
  });
}

export async function click(x: number, y: number) {
  await mouse("mousedown", x, y);
  await mouse("mouseup", x, y);
}

export async function key(k: string, init: KeyboardEventInit = {}) {
  await act(async () => {
    byTestId("editor-canvas").dispatchEvent(new KeyboardEvent("keydown", { key: k, bubbles: true, ...init }));
  });
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
