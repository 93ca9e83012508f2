/**
 * Keeps the N lowest circles seen by a method, sorted ascending by FS. Insertion into a
 * short sorted array: cheap for the usual N ≤ 20.
 */
export interface LowestList {
  cap: number;
  n: number;
  fs: Float64Array;
  xc: Float64Array;
  yc: Float64Array;
  r: Float64Array;
}

export function createLowest(cap: number): LowestList {
  return {
    cap,
    n: 0,
    fs: new Float64Array(cap),
    xc: new Float64Array(cap),
    yc: new Float64Array(cap),
    r: new Float64Array(cap),
  };
}

/** Offers a circle; kept if among the cap lowest. Ties keep the earlier circle first. */
export function offerLowest(L: LowestList, fs: number, xc: number, yc: number, r: number): void {
  if (L.cap === 0) return;
  if (L.n === L.cap && fs >= L.fs[L.n - 1]) return;
  let i = L.n < L.cap ? L.n++ : L.n - 1;
  while (i > 0 && L.fs[i - 1] > fs) {
    L.fs[i] = L.fs[i - 1];
    L.xc[i] = L.xc[i - 1];
    L.yc[i] = L.yc[i - 1];
    L.r[i] = L.r[i - 1];
    i--;
  }
  L.fs[i] = fs;
  L.xc[i] = xc;
  L.yc[i] = yc;
  L.r[i] = r;
}
