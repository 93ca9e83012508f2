/**
 * Boundary conditions of a seepage run on its mesh (docs/seepage.md §2):
 * - pools: every boundary node of the ground or the section's side that the pool reaches from
 *   its side and that lies at or below its level has total head = level;
 * - drains: nodes on a drain polyline are at atmospheric pressure, head = elevation;
 * - the rest of the ground surface and the sides are potential seepage faces;
 * - the bottom of the regions and faces against impenetrable material pass no water.
 */
import { issue } from "./issues";
import { polylineDistance } from "./geometry";
import type { Pool, Point, SeepageIssue, TriMesh } from "./types";

export const INTERIOR = 0;
export const POOL = 1;
export const DRAIN = 2;
export const FACE = 3;
export const INACTIVE = 4;

/** A boundary edge of the flow domain, a→b with the domain on its left (counter-clockwise). */
export interface BoundaryEdge {
  a: number;
  b: number;
  element: number;
  /** true on the ground or a side; false on the bottom or against impenetrable material. */
  open: boolean;
  /** Index of the impenetrable element across the edge, or −1. */
  against: number;
}

export interface Boundary {
  kind: Uint8Array;
  /** Prescribed head of pool and drain nodes (m); NaN elsewhere. */
  head: Float64Array;
  edges: BoundaryEdge[];
  tol: number;
}

export type BoundaryOutcome = { ok: true; boundary: Boundary } | { ok: false; errors: SeepageIssue[] };

export function classifyBoundary(
  mesh: TriMesh,
  pervious: (element: number) => boolean,
  pools: Pool[],
  drains: Point[][],
): BoundaryOutcome {
  const n = mesh.x.length;
  const ne = mesh.region.length;
  let x0 = Infinity;
  let x1 = -Infinity;
  let y0 = Infinity;
  let y1 = -Infinity;
  for (let i = 0; i < n; i++) {
    x0 = Math.min(x0, mesh.x[i]);
    x1 = Math.max(x1, mesh.x[i]);
    y0 = Math.min(y0, mesh.y[i]);
    y1 = Math.max(y1, mesh.y[i]);
  }
  const tol = 1e-6 * Math.max(x1 - x0, y1 - y0);

  const owner = new Map<number, number>();
  const shared = new Map<number, number>();
  for (let e = 0; e < ne; e++)
    for (let s = 0; s < 3; s++) {
      const a = mesh.tri[3 * e + s];
      const b = mesh.tri[3 * e + ((s + 1) % 3)];
      const key = Math.min(a, b) * n + Math.max(a, b);
      if (owner.has(key)) shared.set(key, e);
      else owner.set(key, e);
    }

  const kind = new Uint8Array(n).fill(INACTIVE);
  for (let e = 0; e < ne; e++) if (pervious(e)) for (let s = 0; s < 3; s++) kind[mesh.tri[3 * e + s]] = INTERIOR;

  const edges: BoundaryEdge[] = [];
  // Outer edges of the whole section (any material) that are ground or side: where pools stop.
  const groundEdges: [number, number][] = [];
  for (let e = 0; e < ne; e++)
    for (let s = 0; s < 3; s++) {
      const a = mesh.tri[3 * e + s];
      const b = mesh.tri[3 * e + ((s + 1) % 3)];
      const key = Math.min(a, b) * n + Math.max(a, b);
      const first = owner.get(key) as number;
      const other = shared.has(key) ? (first === e ? (shared.get(key) as number) : first) : -1;
      const ny = -(mesh.x[b] - mesh.x[a]);
      const onTop = other < 0 && ny > -tol;
      if (onTop) groundEdges.push([a, b]);
      if (!pervious(e)) continue;
      if (other >= 0 && pervious(other)) continue;
      edges.push({ a, b, element: e, open: onTop, against: other >= 0 ? other : -1 });
    }

  const errors: SeepageIssue[] = [];
  const head = new Float64Array(n).fill(NaN);
  for (const ed of edges) {
    if (!ed.open) continue;
    for (const v of [ed.a, ed.b]) if (kind[v] === INTERIOR) kind[v] = FACE;
  }
  pools.forEach((pool, p) => {
    const left = pool.side === "left";
    const edgeX = left ? x0 : x1;
    const reach = poolReach(mesh, groundEdges, pool.level, left, edgeX, tol);
    let reached = 0;
    for (let v = 0; v < n; v++) {
      if (kind[v] !== FACE && kind[v] !== POOL) continue;
      const within = left ? mesh.x[v] <= reach + tol : mesh.x[v] >= reach - tol;
      if (within && mesh.y[v] <= pool.level + tol) {
        kind[v] = POOL;
        head[v] = Number.isNaN(head[v]) ? pool.level : Math.max(head[v], pool.level);
        reached++;
      }
    }
    const path = `seepage.pools[${p}].level`;
    if (reached === 0)
      errors.push(
        issue(
          "pool-below-ground",
          path,
          `The ${pool.side} pool at ${pool.level} m lies below all ground and below the pervious part of the ` +
            `section's ${pool.side} side (x = ${edgeX}), so it touches nothing.`,
        ),
      );
  });
  drains.forEach((line) => {
    for (let v = 0; v < n; v++) {
      if (kind[v] === INACTIVE || kind[v] === POOL) continue;
      if (polylineDistance(mesh.x[v], mesh.y[v], line) <= 10 * tol) {
        kind[v] = DRAIN;
        head[v] = mesh.y[v];
      }
    }
  });
  if (errors.length) return { ok: false, errors };
  return { ok: true, boundary: { kind, head, edges, tol } };
}

/**
 * How far a pool reaches from its side: the x where the ground first rises above its level (the
 * section's edge itself when the ground there stands above it).
 */
function poolReach(
  mesh: TriMesh,
  ground: [number, number][],
  level: number,
  left: boolean,
  edgeX: number,
  tol: number,
): number {
  let reach = left ? Infinity : -Infinity;
  for (const [a, b] of ground) {
    const xa = mesh.x[a];
    const xb = mesh.x[b];
    const ya = mesh.y[a];
    const yb = mesh.y[b];
    // The section's own vertical side holds the pool; it does not stop it.
    if (Math.abs(xa - xb) <= tol && Math.abs(xa - edgeX) <= tol) continue;
    if (ya <= level + tol && yb <= level + tol) continue;
    let xs: number[];
    if (ya > level + tol && yb > level + tol) xs = [xa, xb];
    else {
      const t = (level - ya) / (yb - ya);
      xs = [xa + t * (xb - xa), ya > yb ? xa : xb];
    }
    for (const x of xs) reach = left ? Math.min(reach, x) : Math.max(reach, x);
  }
  // Ground at the edge above the level: the pool stands against the side only.
  return Number.isFinite(reach) ? reach : left ? Infinity : -Infinity;
}
