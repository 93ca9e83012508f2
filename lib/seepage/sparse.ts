/**
 * Sparse symmetric matrix of a triangle mesh (compressed rows, full pattern) and a conjugate
 * gradient solver with an incomplete Cholesky IC(0) preconditioner (Saad, Iterative Methods for
 * Sparse Linear Systems, 2nd ed., §10.3). Nodes held at a prescribed value are handled by masking:
 * their rows and columns drop out of the preconditioner and the search directions.
 */

export interface CsrPattern {
  n: number;
  rowPtr: Int32Array;
  col: Int32Array;
  /** Position of the diagonal entry of each row. */
  diag: Int32Array;
  /** For triangle e, the 9 value positions of (a,a) (a,b) (a,c) (b,a) ... in row-major order. */
  elementSlots: Int32Array;
}

/** The pattern of a mesh's stiffness matrix; rows sorted by column. */
export function buildPattern(n: number, tri: Int32Array): CsrPattern {
  const neighbours: Set<number>[] = Array.from({ length: n }, (_, i) => new Set([i]));
  for (let t = 0; t < tri.length; t += 3)
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) neighbours[tri[t + i]].add(tri[t + j]);
  const rowPtr = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) rowPtr[i + 1] = rowPtr[i] + neighbours[i].size;
  const col = new Int32Array(rowPtr[n]);
  const diag = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const cols = Array.from(neighbours[i]).sort((a, b) => a - b);
    col.set(cols, rowPtr[i]);
    diag[i] = rowPtr[i] + cols.indexOf(i);
  }
  const elementSlots = new Int32Array((tri.length / 3) * 9);
  for (let t = 0, e = 0; t < tri.length; t += 3, e++)
    for (let i = 0; i < 3; i++)
      for (let j = 0; j < 3; j++) elementSlots[9 * e + 3 * i + j] = find(col, rowPtr[tri[t + i]], tri[t + j]);
  return { n, rowPtr, col, diag, elementSlots };

  function find(cols: Int32Array, start: number, c: number): number {
    let k = start;
    while (cols[k] !== c) k++;
    return k;
  }
}

/** y = A·x over the free nodes (rows of fixed nodes give 0). */
export function multiply(p: CsrPattern, val: Float64Array, x: Float64Array, y: Float64Array, fixed: Uint8Array): void {
  const { n, rowPtr, col } = p;
  for (let i = 0; i < n; i++) {
    if (fixed[i]) {
      y[i] = 0;
      continue;
    }
    let s = 0;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) s += val[k] * x[col[k]];
    y[i] = s;
  }
}

/** IC(0) factor L (lower part of the pattern, row-wise) of A restricted to the free nodes. */
export function incompleteCholesky(p: CsrPattern, val: Float64Array, fixed: Uint8Array): Float64Array {
  const { n, rowPtr, col, diag } = p;
  const L = new Float64Array(val.length);
  for (let i = 0; i < n; i++) {
    if (fixed[i]) {
      L[diag[i]] = 1;
      continue;
    }
    for (let k = rowPtr[i]; k < diag[i]; k++) {
      const j = col[k];
      if (fixed[j]) continue;
      // L_ij = (a_ij − Σ_{m<j} L_im·L_jm) / L_jj, a merge of the sorted rows i and j.
      let s = val[k];
      let a = rowPtr[i];
      let b = rowPtr[j];
      while (a < k && b < diag[j]) {
        const ca = col[a];
        const cb = col[b];
        if (ca === cb) {
          s -= L[a] * L[b];
          a++;
          b++;
        } else if (ca < cb) a++;
        else b++;
      }
      L[k] = s / L[diag[j]];
    }
    let d = val[diag[i]];
    for (let k = rowPtr[i]; k < diag[i]; k++) d -= L[k] * L[k];
    // A pivot lost to anisotropy or obtuse triangles falls back to the diagonal (a Jacobi step there).
    L[diag[i]] = Math.sqrt(d > 1e-10 * val[diag[i]] ? d : val[diag[i]]);
  }
  return L;
}

/** z = (L·Lᵀ)⁻¹ r. */
function applyPreconditioner(p: CsrPattern, L: Float64Array, r: Float64Array, z: Float64Array, fixed: Uint8Array) {
  const { n, rowPtr, col, diag } = p;
  for (let i = 0; i < n; i++) {
    if (fixed[i]) {
      z[i] = 0;
      continue;
    }
    let s = r[i];
    for (let k = rowPtr[i]; k < diag[i]; k++) if (!fixed[col[k]]) s -= L[k] * z[col[k]];
    z[i] = s / L[diag[i]];
  }
  for (let i = n - 1; i >= 0; i--) {
    if (fixed[i]) continue;
    z[i] /= L[diag[i]];
    const zi = z[i];
    for (let k = rowPtr[i]; k < diag[i]; k++) if (!fixed[col[k]]) z[col[k]] -= L[k] * zi;
  }
}

export interface CgResult {
  iterations: number;
  converged: boolean;
}

/**
 * Solves A·x = 0 at the free nodes with x given at the fixed ones (x is the start and the answer).
 * Stops when the residual's norm falls below `tol` times that of the first residual, or at
 * `maxIter`.
 */
export function solveMasked(
  p: CsrPattern,
  val: Float64Array,
  x: Float64Array,
  fixed: Uint8Array,
  tol = 1e-10,
  maxIter = 5000,
): CgResult {
  const n = p.n;
  const r = new Float64Array(n);
  const z = new Float64Array(n);
  const d = new Float64Array(n);
  const q = new Float64Array(n);
  // The test is relative to the load the fixed values put on the free nodes, so a warm start
  // that is already close stops early and a cold one iterates to the same accuracy.
  for (let i = 0; i < n; i++) d[i] = fixed[i] ? x[i] : 0;
  multiply(p, val, d, q, fixed);
  const stop = tol * Math.max(Math.sqrt(dot(q, q)), 1e-300);
  multiply(p, val, x, r, fixed);
  let r0 = 0;
  for (let i = 0; i < n; i++) {
    r[i] = -r[i];
    r0 += r[i] * r[i];
  }
  if (Math.sqrt(r0) <= stop) return { iterations: 0, converged: true };
  const L = incompleteCholesky(p, val, fixed);
  applyPreconditioner(p, L, r, z, fixed);
  d.set(z);
  let rz = dot(r, z);
  for (let it = 1; it <= maxIter; it++) {
    multiply(p, val, d, q, fixed);
    const alpha = rz / dot(d, q);
    let rr = 0;
    for (let i = 0; i < n; i++) {
      x[i] += alpha * d[i];
      r[i] -= alpha * q[i];
      rr += r[i] * r[i];
    }
    if (Math.sqrt(rr) <= stop) return { iterations: it, converged: true };
    applyPreconditioner(p, L, r, z, fixed);
    const rzNew = dot(r, z);
    const beta = rzNew / rz;
    rz = rzNew;
    for (let i = 0; i < n; i++) d[i] = z[i] + beta * d[i];
  }
  return { iterations: maxIter, converged: false };
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}
