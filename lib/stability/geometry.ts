/**
 * Small plane-geometry helpers for validation and section preparation.
 * Coordinates in metres.
 */

/** Signed area of a closed polygon (shoelace formula), m²; positive when counter-clockwise. */
export function signedArea(points: ReadonlyArray<readonly [number, number]>): number {
  let s = 0;
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const [x1, y1] = points[i];
    const [x2, y2] = points[(i + 1) % n];
    s += x1 * y2 - x2 * y1;
  }
  return s / 2;
}

/**
 * Where two segments P1P2 and P3P4 cross, or null. Touching at an end point within `tol`
 * (m) does not count, so adjacent edges and shared vertices are not reported.
 */
export function segmentCrossing(
  p1: readonly [number, number],
  p2: readonly [number, number],
  p3: readonly [number, number],
  p4: readonly [number, number],
  tol = 1e-9,
): [number, number] | null {
  const d1x = p2[0] - p1[0];
  const d1y = p2[1] - p1[1];
  const d2x = p4[0] - p3[0];
  const d2y = p4[1] - p3[1];
  const den = d1x * d2y - d1y * d2x;
  const len1 = Math.hypot(d1x, d1y);
  const len2 = Math.hypot(d2x, d2y);
  if (len1 === 0 || len2 === 0) return null;
  if (Math.abs(den) <= 1e-12 * len1 * len2) {
    return collinearOverlap(p1, p2, p3, p4, len1, tol);
  }
  const ex = p3[0] - p1[0];
  const ey = p3[1] - p1[1];
  const t = (ex * d2y - ey * d2x) / den;
  const u = (ex * d1y - ey * d1x) / den;
  const et = tol / len1;
  const eu = tol / len2;
  if (t <= et || t >= 1 - et || u <= eu || u >= 1 - eu) return null;
  return [p1[0] + t * d1x, p1[1] + t * d1y];
}

/** Collinear segments that overlap along a length (a polygon folding back on itself). */
function collinearOverlap(
  p1: readonly [number, number],
  p2: readonly [number, number],
  p3: readonly [number, number],
  p4: readonly [number, number],
  len1: number,
  tol: number,
): [number, number] | null {
  const dx = (p2[0] - p1[0]) / len1;
  const dy = (p2[1] - p1[1]) / len1;
  // Distance of P3 from the line through P1P2: parallel but apart means no contact.
  const off = Math.abs((p3[0] - p1[0]) * dy - (p3[1] - p1[1]) * dx);
  if (off > tol) return null;
  const s3 = (p3[0] - p1[0]) * dx + (p3[1] - p1[1]) * dy;
  const s4 = (p4[0] - p1[0]) * dx + (p4[1] - p1[1]) * dy;
  const lo = Math.max(0, Math.min(s3, s4));
  const hi = Math.min(len1, Math.max(s3, s4));
  if (hi - lo <= tol) return null;
  const s = (lo + hi) / 2;
  return [p1[0] + s * dx, p1[1] + s * dy];
}

/** Removes a repeated closing point and consecutive duplicates (within tol, m). */
export function cleanRing(points: ReadonlyArray<readonly [number, number]>, tol: number): [number, number][] {
  const out: [number, number][] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (last && Math.abs(last[0] - p[0]) <= tol && Math.abs(last[1] - p[1]) <= tol) continue;
    out.push([p[0], p[1]]);
  }
  while (out.length > 1) {
    const a = out[0];
    const b = out[out.length - 1];
    if (Math.abs(a[0] - b[0]) <= tol && Math.abs(a[1] - b[1]) <= tol) out.pop();
    else break;
  }
  return out;
}

/** Linear interpolation of a polyline with increasing x; held flat beyond its ends. */
export function interpolatePolyline(line: ReadonlyArray<readonly [number, number]>, x: number): number {
  const n = line.length;
  if (x <= line[0][0]) return line[0][1];
  if (x >= line[n - 1][0]) return line[n - 1][1];
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (line[mid][0] <= x) lo = mid;
    else hi = mid;
  }
  const [x1, y1] = line[lo];
  const [x2, y2] = line[hi];
  return x2 === x1 ? y2 : y1 + ((y2 - y1) * (x - x1)) / (x2 - x1);
}

/** Sorts numbers and drops values within tol of the previous kept one. */
export function uniqueSorted(values: number[], tol: number): number[] {
  const s = [...values].sort((a, b) => a - b);
  const out: number[] = [];
  for (const v of s) if (out.length === 0 || v - out[out.length - 1] > tol) out.push(v);
  return out;
}
