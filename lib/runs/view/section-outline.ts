/**
 * The section as the run canvas draws it: its extent, the ground surface, and the ponded
 * water (docs/engine-io.md: where the phreatic line lies above the ground, the water between is
 * ponded reservoir water), plus where a lowered pool level lies over the water side.
 */
import type { SectionDocument } from "@/lib/stability";
import { sectionGround } from "@/lib/stability/prepare";
import { elevationAt } from "@/lib/plane-geometry";
import { boxOfPoints, type Box } from "./view-fit";

type Pt = readonly [number, number];

/** Box around all region vertices; null for a section without points. */
export function sectionBox(doc: SectionDocument): Box | null {
  return boxOfPoints(doc.regions.flatMap((r) => r.points));
}

/** The ground surface from the engine (top of the regions' union); empty if the regions are not valid. */
export function groundLine(doc: SectionDocument): [number, number][] {
  try {
    return sectionGround(doc);
  } catch {
    return [];
  }
}

/** Ground elevations just left and right of x (they differ on a vertical face). */
export function groundLimits(ground: readonly Pt[], x: number): { left: number; right: number } {
  const n = ground.length;
  if (n === 0) return { left: NaN, right: NaN };
  if (x <= ground[0][0]) return { left: ground[0][1], right: ground[0][1] };
  if (x >= ground[n - 1][0]) return { left: ground[n - 1][1], right: ground[n - 1][1] };
  let first = -1;
  let last = -1;
  for (let i = 0; i < n; i++)
    if (ground[i][0] === x) {
      if (first < 0) first = i;
      last = i;
    }
  if (first >= 0) return { left: ground[first][1], right: ground[last][1] };
  for (let i = 0; i + 1 < n; i++) {
    const [xa, ya] = ground[i];
    const [xb, yb] = ground[i + 1];
    if (xa < x && x < xb) {
      const y = ya + ((yb - ya) * (x - xa)) / (xb - xa);
      return { left: y, right: y };
    }
  }
  return { left: NaN, right: NaN };
}

/** Ground elevation at x; the upper point on a vertical face. */
export function groundAt(ground: readonly Pt[], x: number): number {
  const { left, right } = groundLimits(ground, x);
  return Math.max(left, right);
}

interface Column {
  x: number;
  top: number;
  bot: number;
}

function columnsToPolygon(cols: Column[]): number[] {
  const out: number[] = [];
  for (const c of cols) out.push(c.x, c.top);
  for (let i = cols.length - 1; i >= 0; i--) out.push(cols[i].x, cols[i].bot);
  return out;
}

/**
 * Areas where the water line stands above the ground, each a closed polygon: the water
 * line on top and the ground below, across the ground's x range.
 * @returns flat [x, y, …] rings in metres
 */
export function pondedWater(water: readonly Pt[], ground: readonly Pt[]): number[][] {
  if (water.length < 2 || ground.length < 2) return [];
  const x0 = ground[0][0];
  const xN = ground[ground.length - 1][0];
  const xs = [...new Set([...ground.map((p) => p[0]), ...water.map((p) => p[0]).filter((x) => x > x0 && x < xN)])].sort(
    (a, b) => a - b,
  );
  const out: number[][] = [];
  let cur: Column[] | null = null;
  const close = () => {
    if (cur && cur.length >= 2) out.push(columnsToPolygon(cur));
    cur = null;
  };
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    const g = groundLimits(ground, x);
    const p = elevationAt(water, x);
    if (i > 0) {
      const xa = xs[i - 1];
      const pa = elevationAt(water, xa);
      const dA = pa - groundLimits(ground, xa).right;
      const dB = p - g.left;
      // Inside an interval both lines are straight, so the depth changes sign at most once.
      if (dA > 0 !== dB > 0 && dA !== dB) {
        const t = dA / (dA - dB);
        const cross: Column = { x: xa + t * (x - xa), top: pa + t * (p - pa), bot: pa + t * (p - pa) };
        if (dA > 0) {
          cur?.push(cross);
          close();
        } else cur = [cross];
      }
      if (cur && dB > 0) cur.push({ x, top: p, bot: g.left });
    }
    if (p - g.right > 0) {
      if (!cur) cur = [];
      const last = cur[cur.length - 1];
      if (!last || last.x !== x || last.bot !== g.right) cur.push({ x, top: p, bot: g.right });
    } else close();
  }
  close();
  return out;
}

/** x extent [min, max] of a flat ring. */
function ringSpan(ring: number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < ring.length; i += 2) {
    lo = Math.min(lo, ring[i]);
    hi = Math.max(hi, ring[i]);
  }
  return [lo, hi];
}

/**
 * Where a pool level (m) lies above the ground, limited to stretches that also hold ponded
 * water before the drawdown, so a level on the reservoir side is not drawn over a low spot
 * downstream. Without ponded water every stretch below the level is kept.
 * @returns [x1, x2] spans in metres
 */
export function poolLevelSpans(level: number, ground: readonly Pt[], ponds: readonly number[][]): [number, number][] {
  if (ground.length < 2 || !Number.isFinite(level)) return [];
  const flat: Pt[] = [
    [ground[0][0], level],
    [ground[ground.length - 1][0], level],
  ];
  const spans = pondedWater(flat, ground).map(ringSpan);
  if (ponds.length === 0) return spans;
  const pondSpans = ponds.map(ringSpan);
  return spans.filter(([a, b]) => pondSpans.some(([c, d]) => a < d && c < b));
}
