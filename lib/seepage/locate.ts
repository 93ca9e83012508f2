/** Finding the triangle that holds a point, through a bucket grid over the triangles' boxes. */
import type { TriMesh } from "./types";

export interface Locator {
  /** Element holding (x, y) and its barycentric weights, or null outside the given elements. */
  find(x: number, y: number): { element: number; w: [number, number, number] } | null;
}

export function buildLocator(mesh: TriMesh, include: (e: number) => boolean): Locator {
  const ne = mesh.region.length;
  let x0 = Infinity;
  let x1 = -Infinity;
  let y0 = Infinity;
  let y1 = -Infinity;
  for (let v = 0; v < mesh.x.length; v++) {
    x0 = Math.min(x0, mesh.x[v]);
    x1 = Math.max(x1, mesh.x[v]);
    y0 = Math.min(y0, mesh.y[v]);
    y1 = Math.max(y1, mesh.y[v]);
  }
  const cells = Math.max(1, Math.ceil(Math.sqrt(ne / 2)));
  const cw = (x1 - x0) / cells || 1;
  const ch = (y1 - y0) / cells || 1;
  const buckets: number[][] = Array.from({ length: cells * cells }, () => []);
  const clampI = (v: number) => Math.min(cells - 1, Math.max(0, v));
  for (let e = 0; e < ne; e++) {
    if (!include(e)) continue;
    const t = mesh.tri.subarray(3 * e, 3 * e + 3);
    const ex0 = Math.min(mesh.x[t[0]], mesh.x[t[1]], mesh.x[t[2]]);
    const ex1 = Math.max(mesh.x[t[0]], mesh.x[t[1]], mesh.x[t[2]]);
    const ey0 = Math.min(mesh.y[t[0]], mesh.y[t[1]], mesh.y[t[2]]);
    const ey1 = Math.max(mesh.y[t[0]], mesh.y[t[1]], mesh.y[t[2]]);
    for (let i = clampI(Math.floor((ex0 - x0) / cw)); i <= clampI(Math.floor((ex1 - x0) / cw)); i++)
      for (let j = clampI(Math.floor((ey0 - y0) / ch)); j <= clampI(Math.floor((ey1 - y0) / ch)); j++)
        buckets[j * cells + i].push(e);
  }
  const eps = 1e-9;
  return {
    find(x, y) {
      if (x < x0 - eps * cw || x > x1 + eps * cw || y < y0 - eps * ch || y > y1 + eps * ch) return null;
      const list = buckets[clampI(Math.floor((y - y0) / ch)) * cells + clampI(Math.floor((x - x0) / cw))];
      let best: { element: number; w: [number, number, number] } | null = null;
      let bestMin = -Infinity;
      for (const e of list) {
        const w = barycentric(mesh, e, x, y);
        const m = Math.min(w[0], w[1], w[2]);
        if (m > bestMin) {
          bestMin = m;
          best = { element: e, w };
        }
      }
      return best && bestMin >= -1e-7 ? best : null;
    },
  };
}

function barycentric(mesh: TriMesh, e: number, x: number, y: number): [number, number, number] {
  const a = mesh.tri[3 * e];
  const b = mesh.tri[3 * e + 1];
  const c = mesh.tri[3 * e + 2];
  const det = (mesh.x[b] - mesh.x[a]) * (mesh.y[c] - mesh.y[a]) - (mesh.x[c] - mesh.x[a]) * (mesh.y[b] - mesh.y[a]);
  const wb = ((x - mesh.x[a]) * (mesh.y[c] - mesh.y[a]) - (mesh.x[c] - mesh.x[a]) * (y - mesh.y[a])) / det;
  const wc = ((mesh.x[b] - mesh.x[a]) * (y - mesh.y[a]) - (x - mesh.x[a]) * (mesh.y[b] - mesh.y[a])) / det;
  return [1 - wb - wc, wb, wc];
}
