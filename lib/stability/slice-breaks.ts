/**
 * The slice boundaries of one slip mass (docs/engine.md §3 "Slice boundaries"): the hard breaks
 * where the arc crosses a material boundary or a water line, the ground's corners, and the other
 * vertices where the merge rule keeps them. Allocation-free: writes into the scratch buffers.
 */
import * as defaults from "./defaults";
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";
import * as strips from "./strip-table";

// Module-local copies: imported bindings are property reads on every use in the hot loop (a getter
// call for a function where modules are compiled to CommonJS, as under tsx).
const MERGE_FRACTION = defaults.MERGE_FRACTION;
const findStrip = strips.findStrip;

/**
 * Streaming state of the break merge: [the last break seen, a vertex waiting on its right
 * neighbour (NaN when none), 1 if that vertex is clear of its left neighbour].
 */
const merge = new Float64Array(3);

/**
 * Collects the slice boundaries of mass [xA, xB] into S.kept (docs/engine.md §3). Hard
 * breaks (the ends, arc crossings of material boundaries and water lines, ground corners)
 * are all kept, merged only when closer than max(0.1 mm, 1e-7·R). Any other vertex of the ground
 * or of a layer is kept only when both its neighbours lie at least MERGE_FRACTION of a
 * nominal slice width away; otherwise the slices run across it. The rule looks at both
 * neighbours, so it is the same read left to right or right to left (mirror invariance),
 * and a survey of thousands of vertices cuts about as many slices as its outline.
 * @returns how many breaks are kept (−1 if a buffer would overflow)
 */
export function collectBreaks(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  xA: number,
  xB: number,
): number {
  const T = P.table;
  const brk = S.brk;
  const kept = S.kept;
  const cap = kept.length - 2;
  const r2 = r * r;
  const margin = 1e-9 * (r2 + xc * xc + yc * yc);
  const line = P.waterKind === 1;
  const extraA = P.extraWaterA;
  const extraB = P.extraWaterB;
  const sharp = P.sharp;
  const tolHard = 1e-7 * r > 1e-4 ? 1e-7 * r : 1e-4;
  const tolSoft = (MERGE_FRACTION * (xB - xA)) / P.slices;
  let nk = 0;
  kept[nk++] = xA;
  merge[0] = xA;
  merge[1] = NaN;
  let k = findStrip(T, xA);
  for (;;) {
    const x0 = T.xs[k] > xA ? T.xs[k] : xA;
    const x1 = T.xs[k + 1] < xB ? T.xs[k + 1] : xB;
    let nb = 0;
    const o = T.lineOff[k];
    const e = T.lineOff[k + 1];
    const last = extraA === null ? e : e + 1;
    // Arc crossings with material boundaries, the base, the water line and the other stage's line.
    for (let i = o; i <= last; i++) {
      let a: number;
      let b: number;
      if (i < e) {
        if (T.lineBreak[i] === 0) continue;
        a = T.lineA[i];
        b = T.lineB[i];
      } else if (i === e) {
        if (!line) continue;
        a = P.waterA[k];
        b = P.waterB[k];
      } else {
        a = extraA![k];
        b = extraB![k];
      }
      const qa = 1 + b * b;
      const qb = b * (a - yc) - xc;
      const qc = xc * xc + (a - yc) * (a - yc) - r2;
      // f(x) = qa·x² + 2·qb·x + qc is the line's power with respect to the circle. Without a root
      // square: a line inside the circle at both strip ends, or outside at both and moving away
      // from the circle across the strip, meets the arc nowhere strictly inside the strip (the
      // margin keeps a root within round-off of an end to the exact test below).
      const f0 = (qa * x0 + 2 * qb) * x0 + qc;
      const f1 = (qa * x1 + 2 * qb) * x1 + qc;
      if (f0 < -margin && f1 < -margin) continue;
      if (f0 > margin && f1 > margin && (qa * x0 + qb >= 0 || qa * x1 + qb <= 0)) continue;
      const disc = qb * qb - qa * qc;
      if (disc <= 0) continue;
      const sq = Math.sqrt(disc);
      for (let s = -1; s <= 1; s += 2) {
        const x = (-qb + s * sq) / qa;
        if (x > x0 && x < x1 && a + b * x < yc) {
          if (nb >= brk.length) return -1;
          brk[nb++] = x;
        }
      }
    }
    for (let i = 1; i < nb; i++) {
      const v = brk[i];
      let j = i - 1;
      while (j >= 0 && brk[j] > v) {
        brk[j + 1] = brk[j];
        j--;
      }
      brk[j + 1] = v;
    }
    for (let i = 0; i < nb; i++) {
      nk = offerBreak(kept, nk, cap, brk[i], true, tolHard, tolSoft);
      if (nk < 0) return -1;
    }
    if (x1 >= xB || k + 1 >= T.n) break;
    // The strip's right end: a vertex, hard where the ground steps or turns sharply (a toe, a crest, a face).
    nk = offerBreak(kept, nk, cap, x1, sharp[k + 1] !== 0, tolHard, tolSoft);
    if (nk < 0) return -1;
    k++;
  }
  nk = offerBreak(kept, nk, cap, xB, true, tolHard, tolSoft);
  // The mass's far end closes the last slice; a hard break too close to it gives way.
  if (nk > 0 && kept[nk - 1] !== xB) {
    if (nk > 1) kept[nk - 1] = xB;
    else kept[nk++] = xB;
  }
  return nk;
}

/** Offers the next break (x increasing) to the merge; returns the new kept count (−1 on overflow). */
function offerBreak(
  kept: Float64Array,
  nk: number,
  cap: number,
  x: number,
  hard: boolean,
  tolHard: number,
  tolSoft: number,
): number {
  const pending = merge[1];
  if (pending === pending) {
    // A vertex stays only when clear of both neighbours.
    if (merge[2] === 1 && x - pending >= tolSoft) {
      if (nk >= cap) return -1;
      kept[nk++] = pending;
    }
    merge[1] = NaN;
  }
  if (hard) {
    if (x - kept[nk - 1] >= tolHard) {
      if (nk >= cap) return -1;
      kept[nk++] = x;
    }
  } else {
    merge[1] = x;
    merge[2] = x - merge[0] >= tolSoft ? 1 : 0;
  }
  merge[0] = x;
  return nk;
}
