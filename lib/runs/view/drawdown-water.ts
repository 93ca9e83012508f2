/**
 * The water a drawdown analyses, for drawing (docs/engine-io.md, the rule for rapid drawdown
 * water): on the pool side, from the section's edge on the reservoir side to the crest (the
 * highest ground point), the pore-water level after drawdown is
 * min(pre-drawdown line, max(ground, lowered pool)), so the only free water left above the
 * ground there is the lowered pool; beyond the crest the pre-drawdown line stands unchanged.
 */
import { groundAt } from "./section-outline";
import { elevationAt } from "@/lib/plane-geometry";

type Pt = readonly [number, number];

/** The reservoir side: the edge where the line stands above the ground (the higher water if both). */
export function poolSide(pre: readonly Pt[], ground: readonly Pt[]): "left" | "right" | null {
  if (pre.length < 2 || ground.length < 2) return null;
  const [xl, gl] = ground[0];
  const [xr, gr] = ground[ground.length - 1];
  const dl = elevationAt(pre, xl) - gl;
  const dr = elevationAt(pre, xr) - gr;
  if (dl <= 1e-6 && dr <= 1e-6) return null;
  if (dl > 1e-6 && dr > 1e-6) return elevationAt(pre, xl) >= elevationAt(pre, xr) ? "left" : "right";
  return dl > 1e-6 ? "left" : "right";
}

/** x of the crest: the highest ground point (the one nearest the pool on a flat crest). */
function crestX(ground: readonly Pt[], side: "left" | "right"): number {
  let best = side === "left" ? 0 : ground.length - 1;
  for (let i = 0; i < ground.length; i++) {
    const better = side === "left" ? ground[i][1] > ground[best][1] : ground[i][1] >= ground[best][1];
    if (better) best = i;
  }
  return ground[best][0];
}

/**
 * The pore-water level after drawing the pool down to `to` (m), as a polyline over the
 * section's width; the pre-drawdown line itself when no side is ponded.
 */
export function waterAfterDrawdown(pre: readonly Pt[], ground: readonly Pt[], to: number): [number, number][] {
  const side = poolSide(pre, ground);
  if (!side || !Number.isFinite(to)) return pre.map((p) => [p[0], p[1]]);
  const crest = crestX(ground, side);
  const onPoolSide = (x: number) => (side === "left" ? x <= crest : x >= crest);
  const level = (x: number) => {
    const yp = elevationAt(pre, x);
    return onPoolSide(x) ? Math.min(yp, Math.max(groundAt(ground, x), to)) : yp;
  };
  const x0 = Math.min(ground[0][0], pre[0][0]);
  const x1 = Math.max(ground[ground.length - 1][0], pre[pre.length - 1][0]);
  const xs = [...new Set([...ground.map((p) => p[0]), ...pre.map((p) => p[0]), crest])]
    .filter((x) => x >= x0 && x <= x1)
    .sort((a, b) => a - b);
  // Inside each interval the three lines are straight; the level bends only where two of them cross.
  const diffs = [
    (x: number) => elevationAt(pre, x) - groundAt(ground, x),
    (x: number) => elevationAt(pre, x) - to,
    (x: number) => groundAt(ground, x) - to,
  ];
  const all: number[] = [];
  for (let i = 0; i < xs.length; i++) {
    all.push(xs[i]);
    if (i + 1 === xs.length) break;
    const a = xs[i];
    const b = xs[i + 1];
    const cuts: number[] = [];
    for (const d of diffs) {
      // Sample just inside the interval: at a vertical ground face groundAt takes the upper point.
      const ea = (b - a) * 1e-9;
      const da = d(a + ea);
      const db = d(b - ea);
      if (da * db < 0) cuts.push(a + ea + ((b - a - 2 * ea) * da) / (da - db));
    }
    all.push(...cuts.sort((p, q) => p - q));
  }
  const out: [number, number][] = [];
  for (const x of all) {
    const y = level(x);
    const last = out[out.length - 1];
    if (last && Math.abs(last[0] - x) < 1e-9 && Math.abs(last[1] - y) < 1e-9) continue;
    out.push([x, y]);
  }
  return out;
}
