/**
 * How circles are told apart on the canvas. Line style and marker shape carry the meaning,
 * so nothing depends on colour alone: Bishop's critical circle is solid with a round centre
 * mark, the ordinary method's is dashed with a square one. Runs laid over each other take
 * colours from the Okabe–Ito palette (Okabe & Ito 2008, "Color Universal Design"), which
 * stays distinct under the common colour vision deficiencies, plus a dash pattern each.
 */
import type { Circle } from "@/lib/stability";
import { METHOD_SHORT } from "./warning-text";

export type CentreMark = "dot" | "square" | "diamond" | "triangle";

export interface CircleStyle {
  colour: string;
  dash: number[];
  width: number;
  mark: CentreMark;
}

/** One circle the canvas draws, as recorded in `data-critical`. */
export interface DrawnCircle {
  key: string;
  label: string;
  method?: "bishop" | "fellenius";
  fs?: number;
  circle: Circle;
  entry: [number, number];
  exit: [number, number];
  style: CircleStyle;
}

export const METHOD_STYLE: Record<"bishop" | "fellenius", CircleStyle> = {
  bishop: { colour: "#1f1d1a", dash: [], width: 2.5, mark: "dot" },
  fellenius: { colour: "#7d391b", dash: [9, 5], width: 2, mark: "square" },
};

/** Okabe–Ito colours; blue is not first, so the first run is not mistaken for the phreatic line. */
export const OVERLAY_COLOURS = ["#D55E00", "#0072B2", "#009E73", "#CC79A7", "#E69F00", "#56B4E9"] as const;

const OVERLAY_DASHES: number[][] = [[], [10, 5], [2, 4], [12, 4, 2, 4]];
const OVERLAY_MARKS: CentreMark[] = ["dot", "square", "diamond", "triangle"];

/** Style of the i-th overlaid run, given its colour. */
export function overlayStyle(i: number, colour?: string): CircleStyle {
  return {
    colour: colour ?? OVERLAY_COLOURS[i % OVERLAY_COLOURS.length],
    dash: OVERLAY_DASHES[i % OVERLAY_DASHES.length],
    width: 2.25,
    mark: OVERLAY_MARKS[i % OVERLAY_MARKS.length],
  };
}

/** A critical circle result as the canvas needs it (engine shape, or an overlay). */
interface CriticalLike {
  fs?: number;
  circle: Circle;
  entry: [number, number];
  exit: [number, number];
}

/** The critical circles per method of a result, Bishop first. */
export function methodCircles(
  results: Partial<Record<"bishop" | "fellenius", CriticalLike | null>> | undefined,
): DrawnCircle[] {
  if (!results) return [];
  const out: DrawnCircle[] = [];
  for (const m of ["bishop", "fellenius"] as const) {
    const r = results[m];
    if (!r) continue;
    out.push({
      key: m,
      method: m,
      fs: r.fs,
      label: r.fs !== undefined ? `${METHOD_SHORT[m]} ${r.fs.toFixed(3)}` : METHOD_SHORT[m],
      circle: r.circle,
      entry: r.entry,
      exit: r.exit,
      style: METHOD_STYLE[m],
    });
  }
  return out;
}

/** Circles of runs laid over each other. */
export function overlayCircles(
  overlays: ReadonlyArray<{
    label: string;
    color?: string;
    circle: Circle;
    entry: [number, number];
    exit: [number, number];
  }>,
): DrawnCircle[] {
  return overlays.map((o, i) => ({
    key: `overlay-${i}`,
    label: o.label,
    circle: o.circle,
    entry: o.entry,
    exit: o.exit,
    style: overlayStyle(i, o.color),
  }));
}

/** The JSON recorded in `data-critical`: what is drawn, rounded to the millimetre. */
export function criticalAttribute(circles: readonly DrawnCircle[]): string {
  const r3 = (v: number) => Math.round(v * 1000) / 1000;
  return JSON.stringify(
    circles.map((c) => ({
      label: c.label,
      ...(c.method ? { method: c.method } : {}),
      ...(c.fs !== undefined ? { fs: c.fs } : {}),
      xc: r3(c.circle.xc),
      yc: r3(c.circle.yc),
      r: r3(c.circle.r),
      entry: [r3(c.entry[0]), r3(c.entry[1])],
      exit: [r3(c.exit[0]), r3(c.exit[1])],
      dashed: c.style.dash.length > 0,
    })),
  );
}
