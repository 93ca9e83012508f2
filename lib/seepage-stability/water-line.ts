/**
 * The water line a stability run on seepage water hands the engine (docs/seepage.md §6): the
 * solution's phreatic surface inside the section, each pool's level over the ground it reaches
 * from its side, and nowhere above the ground otherwise. The line sets the saturated weights,
 * the ponded water and, in a drawdown, the pre-drawdown line; the pore pressure at a slice base
 * comes from the field itself.
 */
import { elevationAt } from "@/lib/plane-geometry";
import type { Point, Pool } from "@/lib/seepage";

/** Where a pool stands over the ground: x ≤ reach (left pool) or x ≥ reach (right pool). */
function poolReach(ground: readonly Point[], pool: Pool): number | null {
  const pts = pool.side === "left" ? ground : [...ground].reverse();
  if (pts[0][1] >= pool.level) return null;
  for (let i = 1; i < pts.length; i++) {
    const [xa, ya] = pts[i - 1];
    const [xb, yb] = pts[i];
    if (yb > pool.level) return xa + ((xb - xa) * (pool.level - ya)) / (yb - ya);
  }
  return pts[pts.length - 1][0];
}

/** Ground elevation at x; on a vertical face the lower of its two ends (water stands against it). */
function groundAt(ground: readonly Point[], x: number): number {
  let y = elevationAt(ground, x);
  for (const [gx, gy] of ground) if (Math.abs(gx - x) < 1e-9 && gy < y) y = gy;
  return y;
}

/**
 * Builds the engine's water line from the ground (x increasing, vertical faces as two points),
 * the solution's phreatic surface and the pools. Spans the ground's whole extent.
 */
export function seepageWaterLine(
  ground: readonly Point[],
  phreatic: readonly Point[],
  pools: readonly Pool[],
): Point[] {
  const reaches = pools.map((p) => ({ pool: p, reach: poolReach(ground, p) }));
  const x0 = ground[0][0];
  const x1 = ground[ground.length - 1][0];
  const xs = new Set<number>();
  for (const [x] of ground) xs.add(x);
  for (const [x] of phreatic) if (x > x0 && x < x1) xs.add(x);
  for (const r of reaches) if (r.reach !== null) xs.add(r.reach);
  const sorted = [...xs].sort((a, b) => a - b);
  const out: Point[] = [];
  for (const x of sorted) {
    if (out.length > 0 && x - out[out.length - 1][0] < 1e-6) continue;
    const yg = groundAt(ground, x);
    let y = phreatic.length > 0 ? Math.min(elevationAt(phreatic, x), yg) : -Infinity;
    for (const { pool, reach } of reaches) {
      if (reach === null) continue;
      const covered = pool.side === "left" ? x <= reach + 1e-9 : x >= reach - 1e-9;
      if (covered && pool.level > y) y = pool.level;
    }
    // A dry section: the line runs below everything, so no weight is saturated.
    out.push([x, Number.isFinite(y) ? y : yg - 1e3]);
  }
  return out;
}
