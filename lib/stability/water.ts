/**
 * Water for a load case: the water surface used for pore pressure and ponded water
 * (docs/engine.md §3, §7(a)), and the x where it must break the strips.
 * - steady: the phreatic line as given; above the ground it is ponded water.
 * - drawdown (both methods, docs/engine.md §7): the pool side runs from the reservoir's edge
 *   of the section to the crest (the highest ground point). There the water level becomes
 *   min(pre-drawdown line, max(ground, lowered pool)): pore pressures keep their steady
 *   values but are held at the ground or the lowered pool, and the only free water left is
 *   the lowered pool itself, over ground below it. Beyond the crest the line as drawn, and
 *   any tailwater on that side, stand unchanged; a pool drawn over the crest itself covers
 *   both sides, and all of it is lowered.
 */
import type { GroundLine } from "./ground";
import { interpolatePolyline } from "./geometry";
import type { Drawdown, LoadCase, Water } from "./schema";

export const WATER_DRY = 0;
export const WATER_LINE = 1;
export const WATER_RU = 2;

/** The water model of one run; `surface` gives the water elevation (m) at x for ground yg. */
export interface WaterModel {
  kind: number;
  gammaW: number;
  ru: number;
  breaks: number[];
  surface: ((x: number, yg: number) => number) | null;
}

/** Which side the reservoir is on, and where its side of the section ends, for a drawdown. */
export interface PoolSide {
  side: "left" | "right";
  /** The pool side covers x < crest (left) or x > crest (right): the crest is the highest ground point. */
  crest: number;
}

/**
 * Finds the pool for a drawdown: the section side where the pre-drawdown line stands
 * above the ground (the nearer to `from` if both), and the crest, the first point of the
 * highest ground met walking in from that side. Null when neither side is ponded.
 */
export function findPoolSide(
  phreatic: ReadonlyArray<readonly [number, number]>,
  ground: GroundLine,
  from: number,
): PoolSide | null {
  const n = ground.x.length;
  const xl = ground.x[0];
  const xr = ground.x[n - 1];
  const dl = interpolatePolyline(phreatic, xl) - ground.y[0];
  const dr = interpolatePolyline(phreatic, xr) - ground.y[n - 1];
  const pondL = dl > 1e-6;
  const pondR = dr > 1e-6;
  if (!pondL && !pondR) return null;
  let side: "left" | "right";
  if (pondL && pondR) {
    side =
      Math.abs(interpolatePolyline(phreatic, xl) - from) <= Math.abs(interpolatePolyline(phreatic, xr) - from)
        ? "left"
        : "right";
  } else side = pondL ? "left" : "right";
  let top = -Infinity;
  let crest = side === "left" ? xr : xl;
  for (let j = 0; j < n; j++) {
    const i = side === "left" ? j : n - 1 - j;
    if (ground.y[i] > top) {
      top = ground.y[i];
      crest = ground.x[i];
    }
  }
  return { side, crest };
}

/** Builds the water model for a case; the section must already be valid. */
export function buildWaterModel(
  water: Water | undefined,
  ground: GroundLine,
  loadCase: LoadCase,
  drawdown: Drawdown | undefined,
  gammaW: number,
): WaterModel {
  if (water?.ru !== undefined && !water.phreatic) {
    return { kind: WATER_RU, gammaW, ru: water.ru, breaks: [], surface: null };
  }
  const line = water?.phreatic;
  if (!line) return { kind: WATER_DRY, gammaW, ru: 0, breaks: [], surface: null };
  const yp = (x: number) => interpolatePolyline(line, x);
  const breaks: number[] = line.map((p) => p[0]);
  pushCrossings(breaks, ground, yp);
  if (loadCase !== "drawdown" || !drawdown) {
    return { kind: WATER_LINE, gammaW, ru: 0, breaks, surface: (x) => yp(x) };
  }
  const pool = findPoolSide(line, ground, drawdown.from);
  const yL = drawdown.to;
  if (!pool) return { kind: WATER_LINE, gammaW, ru: 0, breaks, surface: (x) => yp(x) };
  breaks.push(pool.crest);
  pushCrossings(breaks, ground, () => yL);
  for (let i = 0; i + 1 < line.length; i++) {
    const [x1, y1] = line[i];
    const [x2, y2] = line[i + 1];
    if ((y1 - yL) * (y2 - yL) < 0) breaks.push(x1 + ((x2 - x1) * (yL - y1)) / (y2 - y1));
  }
  const crest = pool.crest;
  // A pool standing over the crest itself is the same water on both sides: all of it is lowered.
  const overtopped = yp(crest) > groundTop(ground) + 1e-6;
  const poolSide = overtopped ? () => true : pool.side === "left" ? (x: number) => x < crest : (x: number) => x > crest;
  return {
    kind: WATER_LINE,
    gammaW,
    ru: 0,
    breaks,
    // Ground below the lowered pool stands under it; elsewhere on the pool side no water is above the ground.
    surface: (x, yg) => (poolSide(x) ? (yg < yL ? yL : Math.min(yp(x), yg)) : yp(x)),
  };
}

/** Highest ground elevation (m). */
function groundTop(ground: GroundLine): number {
  let top = -Infinity;
  for (let i = 0; i < ground.y.length; i++) if (ground.y[i] > top) top = ground.y[i];
  return top;
}

/** Adds the x where a level function crosses the ground (non-vertical ground segments). */
function pushCrossings(out: number[], ground: GroundLine, level: (x: number) => number): void {
  for (let i = 0; i + 1 < ground.x.length; i++) {
    const x1 = ground.x[i];
    const x2 = ground.x[i + 1];
    if (x2 - x1 <= 1e-9) continue;
    // The level may bend inside a ground segment (at its own vertices), hence the check below.
    const d1 = level(x1) - ground.y[i];
    const d2 = level(x2) - ground.y[i + 1];
    if (d1 * d2 < 0) {
      const x = x1 + ((x2 - x1) * d1) / (d1 - d2);
      // Refine once: the level may bend inside the segment.
      const dm = level(x) - (ground.y[i] + ((ground.y[i + 1] - ground.y[i]) * (x - x1)) / (x2 - x1));
      if (Math.abs(dm) < 1e-9) out.push(x);
      else out.push(...bisectCrossing(ground, i, level, x1, x2));
    }
  }
}

/** Crossings on one ground segment when the level bends inside it (found by bisection). */
function bisectCrossing(ground: GroundLine, i: number, level: (x: number) => number, x1: number, x2: number): number[] {
  const g = (x: number) => level(x) - (ground.y[i] + ((ground.y[i + 1] - ground.y[i]) * (x - x1)) / (x2 - x1));
  const out: number[] = [];
  const steps = 64;
  let xa = x1;
  let ga = g(xa);
  for (let s = 1; s <= steps; s++) {
    const xb = x1 + ((x2 - x1) * s) / steps;
    const gb = g(xb);
    if (ga * gb < 0) {
      let lo = xa;
      let hi = xb;
      for (let it = 0; it < 60; it++) {
        const mid = (lo + hi) / 2;
        if (g(lo) * g(mid) <= 0) hi = mid;
        else lo = mid;
      }
      out.push((lo + hi) / 2);
    }
    xa = xb;
    ga = gb;
  }
  return out;
}
