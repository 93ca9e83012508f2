// @vitest-environment jsdom
import "vitest-canvas-mock";
import Konva from "konva";
import { act } from "react";
import { createRoot, type Root } from "react-dom/client";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { RunCanvas, type RunCanvasProps } from "@/components/runs/result/run-canvas";
import { toScreen, type RunView } from "@/lib/runs/view/view-fit";
import { embankment, smallRun } from "./engine-run";

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

let container: HTMLDivElement;
let root: Root;

beforeEach(() => {
  container = document.createElement("div");
  document.body.appendChild(container);
  root = createRoot(container);
});
afterEach(() => {
  act(() => root.unmount());
  container.remove();
});

async function mount(props: RunCanvasProps) {
  await act(async () => root.render(<RunCanvas {...props} />));
  // next/dynamic loads the konva stage asynchronously.
  for (let i = 0; i < 100 && !container.querySelector("canvas"); i++)
    await act(async () => new Promise((r) => setTimeout(r, 30)));
}

const canvasEl = () => container.querySelector('[data-testid="run-canvas"]') as HTMLElement;
const stage = () => Konva.stages[Konva.stages.length - 1];
const named = (name: string) => stage().find(`.${name}`);

describe("RunCanvas", () => {
  it("draws the result: the map cells, both critical arcs, the slices, and records the view and the circles", async () => {
    const { doc, result, bishop } = smallRun();
    await mount({ document: doc, result, slices: bishop.slices, requiredFs: 1.5, height: 400 });
    const view = JSON.parse(canvasEl().dataset.view!) as RunView;
    expect(view.scale).toBeGreaterThan(0);
    const critical = JSON.parse(canvasEl().dataset.critical!) as { method: string; xc: number; yc: number }[];
    expect(critical.map((c) => c.method)).toEqual(["bishop", "fellenius"]);
    expect(named("fs-cell").length + named("fs-cell-empty").length).toBe(48);
    expect(named("critical-arc-bishop")).toHaveLength(1);
    expect(named("critical-arc-fellenius")[0].getAttr("dash")).toEqual([9, 5]);
    expect(named("slice-side")).toHaveLength(bishop.slices.length + 1);
    // The Bishop centre mark sits where data-view says the centre is.
    const [sx, sy] = toScreen(view, critical[0].xc, critical[0].yc);
    const mark = named("centre-mark")[0];
    expect(mark.x()).toBeCloseTo(sx, 6);
    expect(mark.y()).toBeCloseTo(sy, 6);
    expect(container.querySelector('[data-testid="fs-map-legend-required"]')).not.toBeNull();
    expect(container.querySelector('[data-testid="caution"]')).not.toBeNull();
  });

  it("in set-up mode reports a corner drag as a grid snapped to 0.5 m", async () => {
    const onGridChange = vi.fn();
    const grid = { x1: 60, y1: 30, x2: 70, y2: 40, nx: 5, ny: 5 };
    const radii = { tangentY1: 2, tangentY2: 9, n: 4 };
    await mount({ document: embankment(), grid, radii, onGridChange, height: 400 });
    expect(canvasEl().dataset.mode).toBe("set-up");
    const view = JSON.parse(canvasEl().dataset.view!) as RunView;
    const handle = named("grid-corner-upper-right")[0];
    const [sx, sy] = toScreen(view, 73.2, 44.1);
    await act(async () => {
      handle.position({ x: sx - 5, y: sy - 5 });
      handle.fire("dragmove", { evt: new MouseEvent("mousemove") }, true);
    });
    expect(onGridChange).toHaveBeenCalled();
    const [g, r] = onGridChange.mock.calls.at(-1)!;
    expect(g).toEqual({ x1: 60, y1: 30, x2: 73, y2: 44, nx: 5, ny: 5 });
    expect(r).toEqual(radii);
  });
});
