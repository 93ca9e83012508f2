/**
 * Region checks (docs/engine.md §1 "Regions"): closed rings (a repeated closing point is dropped
 * with a warning), at least 3 vertices, area over 0.01 m², no self-crossing, vertices within
 * 1 mm snapped together, and, through the strip table, no overlap, void or side gap.
 */
import { cleanRing, segmentCrossing, signedArea } from "./geometry";
import { fmtPoint, issue, type Issue } from "./issues";
import type { Region } from "./schema";
import { buildStripTable, type RingInput, type StripTable } from "./strip-table";

const SNAP_TOL = 1e-3; // m
const MIN_AREA = 0.01; // m²

/** Cleans rings, snaps vertices and checks each polygon on its own; returns the cleaned regions. */
export function cleanRegions(regions: ReadonlyArray<Region>, errors: Issue[], warnings: Issue[]): Region[] {
  const snap = createSnapper(SNAP_TOL);
  return regions.map((r, ri) => {
    const p = `regions[${ri}]`;
    const raw = r.points;
    const first = raw[0];
    const last = raw[raw.length - 1];
    if (raw.length > 3 && Math.abs(first[0] - last[0]) <= SNAP_TOL && Math.abs(first[1] - last[1]) <= SNAP_TOL) {
      warnings.push(
        issue(
          "region-closing-point",
          `${p}.points[${raw.length - 1}]`,
          `${p}: the last point repeats the first; it was dropped (regions close themselves).`,
          [last[0], last[1]],
        ),
      );
    }
    const points = cleanRing(raw.map(snap), 1e-9);
    if (points.length < 3 && cleanRing(raw, 1e-9).length >= 3) {
      errors.push(
        issue(
          "region-too-thin",
          `${p}.points`,
          `${p} is thinner than 1 mm: points closer than 1 mm are snapped together, and its points ` +
            "then leave fewer than 3 distinct corners. Remove it, or draw it at least 1 mm thick.",
          raw[0] as [number, number],
        ),
      );
      return { ...r, points };
    }
    if (points.length < 3) {
      errors.push(
        issue(
          "region-too-few-points",
          `${p}.points`,
          `${p} has fewer than 3 distinct points; a region needs at least 3.`,
        ),
      );
      return { ...r, points };
    }
    // A crossing ring's signed area means nothing, so the area is checked only on simple rings.
    if (checkSelfCrossing(points, p, errors)) return { ...r, points };
    const area = Math.abs(signedArea(points));
    if (area <= MIN_AREA) {
      errors.push(
        issue(
          "region-too-small",
          `${p}.points`,
          `${p} has an area of ${area.toFixed(4)} m² (at most 0.01 m²). Remove it or draw it larger.`,
          points[0],
        ),
      );
    }
    return { ...r, points };
  });
}

/**
 * A snapper: each point goes to the first earlier point within tol in x and y, found through
 * a grid of tol-sized cells (near-linear, where comparing with every earlier point was quadratic).
 */
function createSnapper(tol: number): (p: readonly [number, number]) => [number, number] {
  const cells = new Map<string, number[]>();
  const pts: [number, number][] = [];
  const key = (i: number, j: number) => `${i},${j}`;
  return (p) => {
    const ci = Math.floor(p[0] / tol);
    const cj = Math.floor(p[1] / tol);
    let best = -1;
    for (let di = -1; di <= 1; di++)
      for (let dj = -1; dj <= 1; dj++) {
        const list = cells.get(key(ci + di, cj + dj));
        if (!list) continue;
        for (const idx of list) {
          const s = pts[idx];
          if (Math.abs(s[0] - p[0]) <= tol && Math.abs(s[1] - p[1]) <= tol && (best < 0 || idx < best)) best = idx;
        }
      }
    if (best >= 0) return [pts[best][0], pts[best][1]];
    pts.push([p[0], p[1]]);
    const k = key(ci, cj);
    const list = cells.get(k);
    if (list) list.push(pts.length - 1);
    else cells.set(k, [pts.length - 1]);
    return [p[0], p[1]];
  };
}

/**
 * Reports a crossing of two edges of one ring (or an edge folding back on its neighbour);
 * true when one was found. A sweep over x: each edge is tested only against the edges whose
 * x range overlaps its own, so a long ground line costs near-linear time.
 */
function checkSelfCrossing(points: [number, number][], p: string, errors: Issue[]): boolean {
  const n = points.length;
  const order = Array.from({ length: n }, (_, i) => i);
  const minX = (i: number) => Math.min(points[i][0], points[(i + 1) % n][0]);
  const maxX = (i: number) => Math.max(points[i][0], points[(i + 1) % n][0]);
  order.sort((a, b) => minX(a) - minX(b) || a - b);
  let active: number[] = [];
  for (const e of order) {
    const x = minX(e);
    active = active.filter((f) => maxX(f) >= x - 1e-9);
    for (const f of active) {
      const i = Math.min(e, f);
      const j = Math.max(e, f);
      const adjacent = j === i + 1 || (i === 0 && j === n - 1);
      const a1 = points[i];
      const a2 = points[(i + 1) % n];
      const b1 = points[j];
      const b2 = points[(j + 1) % n];
      const hit = adjacent ? foldBack(a1, a2, b1, b2, j === i + 1) : segmentCrossing(a1, a2, b1, b2, 1e-9);
      if (hit) {
        errors.push(
          issue(
            "polygon-self-crossing",
            `${p}.points[${j}]`,
            `${p}: edges ${i}–${(i + 1) % n} and ${j}–${(j + 1) % n} cross at ${fmtPoint(hit[0], hit[1])}. Redraw the region without crossings.`,
            hit,
          ),
        );
        return true;
      }
    }
    active.push(e);
  }
  return false;
}

/** Adjacent edges only meet at their shared vertex unless one folds back along the other. */
function foldBack(
  a1: [number, number],
  a2: [number, number],
  b1: [number, number],
  b2: [number, number],
  aThenB: boolean,
): [number, number] | null {
  // The shared vertex, and the other ends u (of edge a) and w (of edge b).
  const shared = aThenB ? a2 : a1;
  const u = aThenB ? a1 : a2;
  const w = aThenB ? b2 : b1;
  const ux = u[0] - shared[0];
  const uy = u[1] - shared[1];
  const wx = w[0] - shared[0];
  const wy = w[1] - shared[1];
  const cross = ux * wy - uy * wx;
  const dot = ux * wx + uy * wy;
  const lu = Math.hypot(ux, uy);
  const lw = Math.hypot(wx, wy);
  if (Math.abs(cross) <= 1e-12 * lu * lw && dot > 0) {
    const s = Math.min(lu, lw) / 2;
    return [shared[0] + (ux / lu) * s, shared[1] + (uy / lu) * s];
  }
  return null;
}

/** Checks that every region names a known material. */
export function checkRegionMaterials(regions: ReadonlyArray<Region>, ids: ReadonlySet<string>, errors: Issue[]): void {
  regions.forEach((r, i) => {
    if (!ids.has(r.material)) {
      errors.push(
        issue(
          "unknown-material",
          `regions[${i}].material`,
          `regions[${i}] uses material '${r.material}', which is not in materials. Add it or pick an existing id.`,
          r.points[0] as [number, number],
        ),
      );
    }
  });
}

/** Builds the strip table to find overlaps, voids and side gaps. */
export function checkRegionLayout(rings: ReadonlyArray<RingInput>, errors: Issue[]): StripTable | null {
  const { table, issues } = buildStripTable(rings);
  errors.push(...issues);
  return issues.length === 0 ? table : null;
}
