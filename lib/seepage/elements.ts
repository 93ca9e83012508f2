/**
 * Linear (three-node) triangles for steady flow: the conductivity matrix
 * K_ij = (kx·b_i·b_j + ky·c_i·c_j) / (4A), with b_i = y_j − y_k and c_i = x_k − x_j
 * (Zienkiewicz & Taylor, The Finite Element Method, vol. 1, the plane Laplace problem), and the
 * share of a triangle where the pressure head is not negative.
 */
import type { TriMesh } from "./types";

/** Saturated element matrices, 9 values per element (row-major), for conductivities kx, ky per element. */
export function elementMatrices(mesh: TriMesh, kx: Float64Array, ky: Float64Array): Float64Array {
  const ne = mesh.region.length;
  const out = new Float64Array(ne * 9);
  const b = [0, 0, 0];
  const c = [0, 0, 0];
  for (let e = 0; e < ne; e++) {
    const n0 = mesh.tri[3 * e];
    const n1 = mesh.tri[3 * e + 1];
    const n2 = mesh.tri[3 * e + 2];
    const x = [mesh.x[n0], mesh.x[n1], mesh.x[n2]];
    const y = [mesh.y[n0], mesh.y[n1], mesh.y[n2]];
    for (let i = 0; i < 3; i++) {
      const j = (i + 1) % 3;
      const k = (i + 2) % 3;
      b[i] = y[j] - y[k];
      c[i] = x[k] - x[j];
    }
    const area = (b[0] * c[1] - b[1] * c[0]) / 2;
    for (let i = 0; i < 3; i++)
      for (let j = 0; j < 3; j++) out[9 * e + 3 * i + j] = (kx[e] * b[i] * b[j] + ky[e] * c[i] * c[j]) / (4 * area);
  }
  return out;
}

/** Head gradient (∂h/∂x, ∂h/∂y) of element e, constant over a linear triangle. */
export function elementGradient(mesh: TriMesh, h: Float64Array, e: number): [number, number] {
  const a = mesh.tri[3 * e];
  const b = mesh.tri[3 * e + 1];
  const c = mesh.tri[3 * e + 2];
  const x1 = mesh.x[b] - mesh.x[a];
  const y1 = mesh.y[b] - mesh.y[a];
  const x2 = mesh.x[c] - mesh.x[a];
  const y2 = mesh.y[c] - mesh.y[a];
  const h1 = h[b] - h[a];
  const h2 = h[c] - h[a];
  const det = x1 * y2 - x2 * y1;
  return [(h1 * y2 - h2 * y1) / det, (x1 * h2 - x2 * h1) / det];
}

/**
 * Share of a linear triangle's area where p ≥ 0, given p at its corners. With one corner on the
 * other side of p = 0 from the rest, that corner's sub-triangle is p_i² / ((p_i − p_j)(p_i − p_k)).
 */
export function wetFraction(p0: number, p1: number, p2: number): number {
  const pos = (p0 >= 0 ? 1 : 0) + (p1 >= 0 ? 1 : 0) + (p2 >= 0 ? 1 : 0);
  if (pos === 3) return 1;
  if (pos === 0) return 0;
  const lone = (pi: number, pj: number, pk: number) => (pi * pi) / ((pi - pj) * (pi - pk));
  if (pos === 1) {
    if (p0 >= 0) return lone(p0, p1, p2);
    if (p1 >= 0) return lone(p1, p0, p2);
    return lone(p2, p0, p1);
  }
  if (p0 < 0) return 1 - lone(p0, p1, p2);
  if (p1 < 0) return 1 - lone(p1, p0, p2);
  return 1 - lone(p2, p0, p1);
}
