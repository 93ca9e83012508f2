/**
 * The section drawn as vector paths on a report page, to equal scale: regions filled by
 * material, the phreatic line, the pool after drawdown, the grid of trial centres and each
 * method's critical circle (the slip arc bold, its centre marked).
 */
import { rgb, type RGB } from "pdf-lib";
import type { CircleFs, Grid, SectionDocument } from "@/lib/stability";
import { arcPoints } from "@/lib/runs/view/circle-arc";
import { buildRunScene } from "@/lib/runs/view/run-scene";
import { niceTicks } from "@/lib/scales";
import { materialPalette } from "@/lib/sections/material-palette";
import { INK, SOFT, type ReportWriter } from "./report-writer";

export interface DrawingInput {
  document: SectionDocument;
  critical: Partial<Record<"bishop" | "fellenius", CircleFs | null>>;
  grid?: Grid;
  drawdownTo?: number;
  /** Further polylines over the circles: a drawn slip surface, a line of thrust. */
  lines?: readonly { points: readonly (readonly [number, number])[]; color: RGB; width: number; dash?: number[] }[];
}

const WATER = rgb(0.1, 0.35, 0.75);
const POND = rgb(0.66, 0.8, 0.89);
const CIRCLE_STYLE = {
  bishop: { color: rgb(0.62, 0.14, 0.1), dash: undefined as number[] | undefined, label: "Bishop" },
  fellenius: { color: rgb(0.2, 0.2, 0.2), dash: [5, 3], label: "Ordinary" },
};

function hexToRgb(hex: string): RGB {
  const m = /^#?([0-9a-f]{6})$/i.exec(hex.trim());
  if (!m) return rgb(0.8, 0.8, 0.8);
  const n = parseInt(m[1], 16);
  return rgb(((n >> 16) & 255) / 255, ((n >> 8) & 255) / 255, (n & 255) / 255);
}

interface Bounds {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

function boundsOf(input: DrawingInput): Bounds {
  const xs: number[] = [];
  const ys: number[] = [];
  for (const r of input.document.regions)
    for (const [x, y] of r.points) {
      xs.push(x);
      ys.push(y);
    }
  if (input.grid) {
    xs.push(input.grid.x1, input.grid.x2);
    ys.push(input.grid.y1, input.grid.y2);
  }
  for (const c of Object.values(input.critical))
    if (c) {
      xs.push(c.circle.xc);
      ys.push(c.circle.yc);
    }
  return { x0: Math.min(...xs), x1: Math.max(...xs), y0: Math.min(...ys), y1: Math.max(...ys) };
}

/** Draws the section into the next `height` points of the page, full width. */
export function drawSection(w: ReportWriter, input: DrawingInput, height = 300): void {
  w.ensure(height + 40);
  const page = w.page;
  const b = boundsOf(input);
  const pad = 28;
  const boxW = w.width - pad;
  const boxH = height - pad;
  const scale = Math.min(boxW / Math.max(1e-6, b.x1 - b.x0), boxH / Math.max(1e-6, b.y1 - b.y0));
  const originX = w.left + pad + (boxW - (b.x1 - b.x0) * scale) / 2;
  const top = w.y - 14;
  const originY = top; // SVG origin: top-left of the box, y down
  const sx = (x: number) => (x - b.x0) * scale;
  const sy = (y: number) => (b.y1 - y) * scale + (boxH - (b.y1 - b.y0) * scale) / 2;
  const path = (pts: readonly (readonly [number, number])[], close: boolean) =>
    pts.map(([x, y], i) => `${i ? "L" : "M"}${sx(x).toFixed(2)},${sy(y).toFixed(2)}`).join(" ") + (close ? " Z" : "");
  const at = { x: originX, y: originY };

  const colors = Object.fromEntries(materialPalette(input.document.materials).map((m) => [m.key, m.color]));
  for (const r of input.document.regions) {
    page.drawSvgPath(path(r.points, true), {
      ...at,
      color: hexToRgb(colors[r.material] ?? "#cccccc"),
      opacity: 0.6,
      borderColor: INK,
      borderWidth: 0.5,
    });
  }
  drawWater(w, input, { path, at, sx, sy });
  if (input.grid) {
    const g = input.grid;
    page.drawSvgPath(
      path(
        [
          [g.x1, g.y1],
          [g.x2, g.y1],
          [g.x2, g.y2],
          [g.x1, g.y2],
        ],
        true,
      ),
      { ...at, borderColor: SOFT, borderWidth: 0.5, borderDashArray: [3, 2] },
    );
  }
  for (const m of ["fellenius", "bishop"] as const) {
    const c = input.critical[m];
    if (!c) continue;
    const style = CIRCLE_STYLE[m];
    const flat = arcPoints(c.circle, c.entry, c.exit, 1);
    const pts: [number, number][] = [];
    for (let i = 0; i + 1 < flat.length; i += 2) pts.push([flat[i], flat[i + 1]]);
    page.drawSvgPath(path(pts, false), {
      ...at,
      borderColor: style.color,
      borderWidth: 1.8,
      borderDashArray: style.dash,
    });
    const cx = sx(c.circle.xc),
      cy = sy(c.circle.yc);
    page.drawSvgPath(`M${cx - 3},${cy} L${cx + 3},${cy} M${cx},${cy - 3} L${cx},${cy + 3}`, {
      ...at,
      borderColor: style.color,
      borderWidth: 0.8,
    });
    w.text(`${style.label} FS ${c.fs.toFixed(3)}`, originX + cx + 5, originY - cy + (m === "bishop" ? 2 : -9), 7, {
      color: style.color,
    });
  }
  for (const l of input.lines ?? [])
    if (l.points.length > 1)
      page.drawSvgPath(path(l.points, false), {
        ...at,
        borderColor: l.color,
        borderWidth: l.width,
        borderDashArray: l.dash,
      });
  drawAxes(w, b, { originX, originY, scale, sx, sy, boxH });
  w.y = top - height - 4;
}

function drawAxes(
  w: ReportWriter,
  b: Bounds,
  t: {
    originX: number;
    originY: number;
    scale: number;
    sx: (x: number) => number;
    sy: (y: number) => number;
    boxH: number;
  },
): void {
  const page = w.page;
  const baseY = t.originY - t.boxH - 4;
  for (const x of niceTicks(b.x0, b.x1, 8)) {
    const px = t.originX + t.sx(x);
    page.drawLine({ start: { x: px, y: baseY }, end: { x: px, y: baseY + 3 }, thickness: 0.4, color: SOFT });
    w.text(`${x}`, px - 6, baseY - 8, 6.5, { color: SOFT });
  }
  const leftX = w.left + 14;
  for (const y of niceTicks(b.y0, b.y1, 5)) {
    const py = t.originY - t.sy(y);
    page.drawLine({ start: { x: leftX, y: py }, end: { x: leftX + 3, y: py }, thickness: 0.4, color: SOFT });
    w.text(`${y}`, w.left - 6, py - 2, 6.5, { color: SOFT });
  }
  w.text("x (m)", t.originX + t.sx(b.x1) - 14, baseY - 16, 6.5, { color: SOFT });
  w.text("elevation (m)", w.left - 6, t.originY + 4, 6.5, { color: SOFT });
}

type Path = (pts: readonly (readonly [number, number])[], close: boolean) => string;

const pairs = (flat: readonly number[]): [number, number][] => {
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < flat.length; i += 2) out.push([flat[i], flat[i + 1]]);
  return out;
};

/**
 * The water analysed, as on the run canvas (one scene for both): ponded water, the pore-water
 * level (after a drawdown, the lowered one), the lowered pool over the reservoir only, and the
 * line before drawdown faint and labelled.
 */
function drawWater(
  w: ReportWriter,
  input: DrawingInput,
  t: { path: Path; at: { x: number; y: number }; sx: (x: number) => number; sy: (y: number) => number },
): void {
  const scene = buildRunScene({ document: input.document, drawdownTo: input.drawdownTo });
  const page = w.page;
  for (const pond of scene.ponds) page.drawSvgPath(t.path(pairs(pond), true), { ...t.at, color: POND, opacity: 0.7 });
  const before = scene.beforeDrawdown;
  if (before) {
    page.drawSvgPath(t.path(pairs(before.points), false), {
      ...t.at,
      borderColor: WATER,
      borderWidth: 0.5,
      borderDashArray: [2, 2],
      borderOpacity: 0.45,
    });
    if (before.level !== null)
      w.text(
        `before drawdown ${before.level.toFixed(1)} m (not analysed)`,
        t.at.x + t.sx(before.labelAt[0]) + 3,
        t.at.y - t.sy(before.labelAt[1]) + 3,
        6.5,
        { color: WATER },
      );
  }
  if (scene.phreatic && scene.phreatic.length >= 4)
    page.drawSvgPath(t.path(pairs(scene.phreatic), false), { ...t.at, borderColor: WATER, borderWidth: 1.2 });
  const pool = scene.pool;
  if (pool) {
    for (const [a, b] of pool.spans) {
      page.drawSvgPath(
        t.path(
          [
            [a, pool.level],
            [b, pool.level],
          ],
          false,
        ),
        { ...t.at, borderColor: WATER, borderWidth: 1, borderDashArray: [1.5, 1.5] },
      );
    }
    const first = pool.spans[0];
    if (first)
      w.text(
        `pool after drawdown ${pool.level.toFixed(1)} m`,
        t.at.x + t.sx(first[0]) + 3,
        t.at.y - t.sy(pool.level) - 8,
        6.5,
        { color: WATER },
      );
  }
}
