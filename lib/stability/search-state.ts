/**
 * Running state of a grid search per method: the best circle, the minimum-FS map over
 * centres (with the radius that gave it) and the N lowest circles.
 */
import { createLowest, offerLowest, type LowestList } from "./lowest";
import type { AnalysisMethod } from "./schema";

export interface MethodState {
  method: AnalysisMethod;
  bestFs: number;
  bestXc: number;
  bestYc: number;
  bestR: number;
  /** Grid indices of the best coarse circle (−1 when it came from refinement or none). */
  bestIx: number;
  bestIy: number;
  bestIr: number;
  /** Coarse-grid best before refinement, for the edge warnings. */
  coarseIx: number;
  coarseIy: number;
  coarseIr: number;
  map: Float64Array;
  mapR: Float64Array;
  lowest: LowestList;
}

export function createMethodState(method: AnalysisMethod, cells: number, lowestCount: number): MethodState {
  return {
    method,
    bestFs: Infinity,
    bestXc: NaN,
    bestYc: NaN,
    bestR: NaN,
    bestIx: -1,
    bestIy: -1,
    bestIr: -1,
    coarseIx: -1,
    coarseIy: -1,
    coarseIr: -1,
    map: new Float64Array(cells).fill(NaN),
    mapR: new Float64Array(cells).fill(NaN),
    lowest: createLowest(lowestCount),
  };
}

/** Records one valid FS; cell < 0 for refinement circles, which stay off the map. */
export function recordFs(
  M: MethodState,
  fs: number,
  xc: number,
  yc: number,
  r: number,
  cell: number,
  ix: number,
  iy: number,
  ir: number,
): void {
  if (cell >= 0) {
    const cur = M.map[cell];
    if (!(cur <= fs)) {
      M.map[cell] = fs;
      M.mapR[cell] = r;
    }
  }
  if (fs < M.bestFs) {
    M.bestFs = fs;
    M.bestXc = xc;
    M.bestYc = yc;
    M.bestR = r;
    M.bestIx = ix;
    M.bestIy = iy;
    M.bestIr = ir;
  }
  offerLowest(M.lowest, fs, xc, yc, r);
}

/** Up to `count` distinct local minima of the map (cells no higher than their 8 neighbours), lowest first. */
export function localMinima(M: MethodState, nx: number, ny: number, count: number): number[] {
  const cells: number[] = [];
  for (let iy = 0; iy < ny; iy++) {
    for (let ix = 0; ix < nx; ix++) {
      const v = M.map[iy * nx + ix];
      if (!Number.isFinite(v)) continue;
      let isMin = true;
      for (let dy = -1; dy <= 1 && isMin; dy++) {
        for (let dx = -1; dx <= 1; dx++) {
          const jx = ix + dx;
          const jy = iy + dy;
          if ((dx === 0 && dy === 0) || jx < 0 || jy < 0 || jx >= nx || jy >= ny) continue;
          if (M.map[jy * nx + jx] < v) {
            isMin = false;
            break;
          }
        }
      }
      if (isMin) cells.push(iy * nx + ix);
    }
  }
  cells.sort((a, b) => M.map[a] - M.map[b]);
  return cells.slice(0, count);
}
