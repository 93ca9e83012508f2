/**
 * Factor of safety of one trial circle in a staged rapid drawdown (docs/engine.md §7(b)): every
 * slip mass is staged (staged-chain.ts) and each method keeps the lowest final-stage FS, which
 * is what the grid search minimises. Sets the same scratch fields as evaluateCircle, so the
 * search, the one-circle report and the warnings work unchanged; the stage factors of the
 * governing masses are left in S.stage.govO / govB. Allocation-free.
 */
import { isDriven, massDirection } from "../circle-direction";
import { findMasses } from "../intersect";
import type { PreparedSection } from "../prepare";
import type { Scratch } from "../scratch";
import * as status from "../status";
import { copyFactors } from "./stage-scratch";
import { clearFactors } from "./stage-scratch";
import { stageMass } from "./staged-chain";

const BAD_RADIUS = status.BAD_RADIUS;
const NO_DRIVING = status.NO_DRIVING;
const NOT_CONVERGED = status.NOT_CONVERGED;
const OK = status.OK;

/**
 * Evaluates circle (xc, yc, r) (m) of a staged-drawdown section.
 * @returns OK when at least one slip mass has a driving moment after drawdown, else the reason
 */
export function evaluateStagedCircle(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  wantBishop: boolean,
): number {
  S.fsO = NaN;
  S.fsB = NaN;
  S.govO = -1;
  S.govB = -1;
  S.minMa = NaN;
  clearFactors(S.stage.govO);
  clearFactors(S.stage.govB);
  if (!(r > 0)) return reject(S, BAD_RADIUS);
  const st = findMasses(P, S, xc, yc, r);
  if (st !== OK) return reject(S, st);
  return runMasses(P, S, xc, yc, r, wantBishop);
}

/**
 * Re-stages mass m of a circle already evaluated, leaving its slices and Bishop's final-stage
 * strengths (or the ordinary method's when Bishop is not wanted) in S, for the slice table.
 */
export function replayStagedMass(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  m: number,
  dir: number,
  wantBishop: boolean,
): number {
  return stageMass(P, S, xc, yc, r, S.massA[m], S.massB[m], dir, wantBishop);
}

function reject(S: Scratch, st: number): number {
  S.reasonO = st;
  S.reasonB = st;
  return st;
}

/** Stages every mass in its own direction (both ways when level) and keeps each method's lowest final-stage factor. */
function runMasses(P: PreparedSection, S: Scratch, xc: number, yc: number, r: number, wantBishop: boolean): number {
  const St = S.stage;
  let fo = Infinity;
  let fb = Infinity;
  let mo = -1;
  let mb = -1;
  let dirO = 1;
  let dirB = 1;
  let failB = OK;
  let minMa = NaN;
  let minMaX = NaN;
  let minMaAlpha = NaN;
  let negB = 0;
  let negO = 0;
  let iterations = 0;
  let driving = false;
  for (let m = 0; m < S.nMass; m++) {
    const d0 = massDirection(P, S, xc, yc, r, m);
    const tries = d0 === 0 ? 2 : 1;
    for (let t = 0; t < tries; t++) {
      const dir = d0 !== 0 ? d0 : t === 0 ? 1 : -1;
      const st = stageMass(P, S, xc, yc, r, S.massA[m], S.massB[m], dir, wantBishop);
      if (st !== OK) return reject(S, st);
      // Round-off only: the staged strengths have no single resisting term to compare with.
      if (!isDriven(S.D, S.gross, 0)) continue;
      driving = true;
      const f0 = St.curO.final;
      if (f0 < fo) {
        fo = f0;
        mo = m;
        dirO = dir;
        negO = S.negO;
        copyFactors(St.curO, St.govO);
      }
      if (wantBishop) {
        const f1 = St.curB.final;
        if (Number.isNaN(f1)) failB = S.reasonB !== OK ? S.reasonB : NOT_CONVERGED;
        else if (f1 < fb) {
          fb = f1;
          mb = m;
          dirB = dir;
          minMa = S.minMa;
          minMaX = S.minMaX;
          minMaAlpha = S.minMaAlpha;
          negB = S.negB;
          iterations = S.iterations;
          copyFactors(St.curB, St.govB);
        }
      }
    }
  }
  if (!driving) return reject(S, NO_DRIVING);
  S.fsO = fo;
  S.govO = mo;
  S.dirO = dirO;
  S.dir = dirO;
  S.negO = negO;
  S.reasonO = OK;
  if (wantBishop) {
    if (failB !== OK) {
      S.fsB = NaN;
      S.reasonB = failB;
      S.govB = -1;
    } else {
      S.fsB = fb;
      S.govB = mb;
      S.dirB = dirB;
      S.dir = dirB;
      S.reasonB = OK;
      S.minMa = minMa;
      S.minMaX = minMaX;
      S.minMaAlpha = minMaAlpha;
      S.negB = negB;
      S.iterations = iterations;
    }
  }
  return OK;
}
