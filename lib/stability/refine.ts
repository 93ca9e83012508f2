/**
 * Refinement around the best centres (docs/engine.md §5): nested 7 × 7 grids of centres at a
 * third of the previous spacing, with radii ±2 steps at a third of the previous radius
 * step, re-centred on the best circle each level; at most 4 levels, stopping when a level
 * gains less than 0.0005 in FS.
 */

/** Evaluates one circle for the refinement: returns the FS of the method being refined (NaN if none). */
export type TryCircle = (xc: number, yc: number, r: number) => number;

const LEVELS = 4;
const MIN_GAIN = 0.0005;

/**
 * Refines from a start circle with FS f0, grid spacings dx, dy and radius step dr (m).
 * @returns false when cancelled
 */
export function refineFrom(
  start: { xc: number; yc: number; r: number },
  f0: number,
  dx: number,
  dy: number,
  dr: number,
  tryCircle: TryCircle,
  cancelled: () => boolean,
): boolean {
  let cx = start.xc;
  let cy = start.yc;
  let cr = start.r;
  let cf = f0;
  let hx = dx;
  let hy = dy;
  let hr = dr;
  for (let level = 0; level < LEVELS; level++) {
    hx /= 3;
    hy /= 3;
    hr /= 3;
    let bx = cx;
    let by = cy;
    let br = cr;
    let bf = cf;
    for (let j = -3; j <= 3; j++) {
      for (let i = -3; i <= 3; i++) {
        for (let k = -2; k <= 2; k++) {
          if (i === 0 && j === 0 && k === 0) continue;
          const x = cx + i * hx;
          const y = cy + j * hy;
          const r = cr + k * hr;
          const f = tryCircle(x, y, r);
          if (f < bf) {
            bf = f;
            bx = x;
            by = y;
            br = r;
          }
        }
      }
      if (cancelled()) return false;
    }
    const gain = cf - bf;
    cx = bx;
    cy = by;
    cr = br;
    cf = bf;
    if (gain < MIN_GAIN) break;
  }
  return true;
}
