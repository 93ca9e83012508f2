/**
 * Sparse symmetric matrix of a triangle mesh (compressed rows, full pattern) and a conjugate
 * gradient solver with an incomplete Cholesky IC(0) preconditioner (Saad, Iterative Methods for
 * Sparse Linear Systems, 2nd ed., §10.3). Nodes held at a prescribed value drop out: each solve
 * works on the free nodes' block with the prescribed values moved to the right-hand side.
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

/** y = A·x (all rows). */
export function multiply(p: CsrPattern, val: Float64Array, x: Float64Array, y: Float64Array): void {
  const { n, rowPtr, col } = p;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) s += val[k] * x[col[k]];
    y[i] = s;
  }
}

/** A matrix in compressed rows with the diagonal's position per row (columns sorted). */
interface Csr {
  n: number;
  rowPtr: Int32Array;
  col: Int32Array;
  val: Float64Array;
  diag: Int32Array;
}

/**
 * The free nodes' block A_ff and the load b = −A_fd·x_d that the prescribed values put on them.
 * Built afresh for each solve (O(nnz)), so the iterations below run without masks.
 */
function reduce(p: CsrPattern, val: Float64Array, x: Float64Array, fixed: Uint8Array) {
  const index = new Int32Array(p.n);
  let m = 0;
  for (let i = 0; i < p.n; i++) index[i] = fixed[i] ? -1 : m++;
  const rowPtr = new Int32Array(m + 1);
  for (let i = 0; i < p.n; i++) {
    if (fixed[i]) continue;
    let c = 0;
    for (let k = p.rowPtr[i]; k < p.rowPtr[i + 1]; k++) if (!fixed[p.col[k]]) c++;
    rowPtr[index[i] + 1] = rowPtr[index[i]] + c;
  }
  const col = new Int32Array(rowPtr[m]);
  const rval = new Float64Array(rowPtr[m]);
  const diag = new Int32Array(m);
  const b = new Float64Array(m);
  const x0 = new Float64Array(m);
  for (let i = 0; i < p.n; i++) {
    const r = index[i];
    if (r < 0) continue;
    x0[r] = x[i];
    let at = rowPtr[r];
    let load = 0;
    for (let k = p.rowPtr[i]; k < p.rowPtr[i + 1]; k++) {
      const j = p.col[k];
      if (fixed[j]) load -= val[k] * x[j];
      else {
        if (j === i) diag[r] = at;
        col[at] = index[j];
        rval[at++] = val[k];
      }
    }
    b[r] = load;
  }
  return { a: { n: m, rowPtr, col, val: rval, diag } as Csr, b, x0, index };
}

/** IC(0) factor L (lower part of the pattern, row-wise) of a symmetric positive definite matrix. */
export function incompleteCholesky(a: Csr): Float64Array {
  const { n, rowPtr, col, val, diag } = a;
  const L = new Float64Array(val.length);
  for (let i = 0; i < n; i++) {
    for (let k = rowPtr[i]; k < diag[i]; k++) {
      const j = col[k];
      // L_ij = (a_ij − Σ_{m<j} L_im·L_jm) / L_jj, a merge of the sorted rows i and j.
      let s = val[k];
      let u = rowPtr[i];
      let w = rowPtr[j];
      while (u < k && w < diag[j]) {
        const cu = col[u];
        const cw = col[w];
        if (cu === cw) {
          s -= L[u] * L[w];
          u++;
          w++;
        } else if (cu < cw) u++;
        else w++;
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
function applyPreconditioner(a: Csr, L: Float64Array, r: Float64Array, z: Float64Array): void {
  const { n, rowPtr, col, diag } = a;
  for (let i = 0; i < n; i++) {
    let s = r[i];
    for (let k = rowPtr[i]; k < diag[i]; k++) s -= L[k] * z[col[k]];
    z[i] = s / L[diag[i]];
  }
  for (let i = n - 1; i >= 0; i--) {
    z[i] /= L[diag[i]];
    const zi = z[i];
    for (let k = rowPtr[i]; k < diag[i]; k++) z[col[k]] -= L[k] * zi;
  }
}

export interface CgResult {
  iterations: number;
  converged: boolean;
}

/**
 * Solves A·x = 0 at the free nodes with x given at the fixed ones (x is the start and the answer).
 * Stops when the residual's norm falls below `tol` times that of the load the fixed values put on
 * the free nodes (so a warm start that is already close stops early), or at `maxIter`.
 */
export function solveMasked(
  p: CsrPattern,
  val: Float64Array,
  x: Float64Array,
  fixed: Uint8Array,
  tol = 1e-10,
  maxIter = 5000,
): CgResult {
  const { a, b, x0, index } = reduce(p, val, x, fixed);
  const result = conjugateGradient(a, b, x0, tol, maxIter);
  for (let i = 0; i < p.n; i++) if (index[i] >= 0) x[i] = x0[index[i]];
  return result;
}

function conjugateGradient(a: Csr, b: Float64Array, x: Float64Array, tol: number, maxIter: number): CgResult {
  const n = a.n;
  if (n === 0) return { iterations: 0, converged: true };
  const r = new Float64Array(n);
  const z = new Float64Array(n);
  const d = new Float64Array(n);
  const q = new Float64Array(n);
  const stop = tol * Math.max(Math.sqrt(dot(b, b)), 1e-300);
  spmv(a, x, q);
  for (let i = 0; i < n; i++) r[i] = b[i] - q[i];
  if (Math.sqrt(dot(r, r)) <= stop) return { iterations: 0, converged: true };
  const L = incompleteCholesky(a);
  applyPreconditioner(a, L, r, z);
  d.set(z);
  let rz = dot(r, z);
  for (let it = 1; it <= maxIter; it++) {
    spmv(a, d, q);
    const alpha = rz / dot(d, q);
    let rr = 0;
    for (let i = 0; i < n; i++) {
      x[i] += alpha * d[i];
      r[i] -= alpha * q[i];
      rr += r[i] * r[i];
    }
    if (Math.sqrt(rr) <= stop) return { iterations: it, converged: true };
    applyPreconditioner(a, L, r, z);
    const rzNew = dot(r, z);
    const beta = rzNew / rz;
    rz = rzNew;
    for (let i = 0; i < n; i++) d[i] = z[i] + beta * d[i];
  }
  return { iterations: maxIter, converged: false };
}

function spmv(a: Csr, x: Float64Array, y: Float64Array): void {
  const { n, rowPtr, col, val } = a;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) s += val[k] * x[col[k]];
    y[i] = s;
  }
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}
