/**
 * Factor of safety of one trial circle by the requested methods: the hot path of the grid
 * search (docs/engine.md §3–§5). Allocation-free: results are left in the scratch fields, and
 * one-circle reports re-run the governing mass with the very same code, so a stored
 * critical circle re-checks to the same bits.
 */
import * as direction from "./circle-direction";
import { evaluateStagedCircle } from "./drawdown/staged-circle";
import * as bishop from "./methods/bishop";
import * as intersect from "./intersect";
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";
import * as slices from "./slices";
import * as status from "./status";

// Module-local copies: imported bindings are property reads on every use in the hot loop (a getter
// call for a function where modules are compiled to CommonJS, as under tsx). None of these modules
// imports this one, so the copies are set when this module runs.
const BAD_RADIUS = status.BAD_RADIUS;
const NO_DRIVING = status.NO_DRIVING;
const OK = status.OK;
const arcY = direction.arcY;
const isDriven = direction.isDriven;
const massDirection = direction.massDirection;
const bishopFactor = bishop.bishopFactor;
const findMasses = intersect.findMasses;
const buildSlices = slices.buildSlices;

export { arcY };

/**
 * Slices mass m of the circle and computes its driving term; returns a status code.
 * On OK, S holds the slices, S.D the driving term (kN, may be ≤ 0), S.gross Σ|terms|, S.resO the
 * ordinary method's resisting term and the Bishop table.
 */
export function sliceMass(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  m: number,
  dir: number,
): number {
  return buildSlices(P, S, xc, yc, r, S.massA[m], S.massB[m], dir, S.detail);
}

/**
 * Evaluates circle (xc, yc, r) (m). Sets S.fsO / S.fsB (NaN when invalid, with S.reasonO /
 * S.reasonB), S.govO / S.govB (the governing masses) with their directions S.dirO / S.dirB,
 * S.dir (Bishop's governing direction, else the ordinary method's) and Bishop's mα record.
 * Every mass slides its own way (docs/engine.md §3); a level-ended mass is tried both ways.
 * A staged drawdown (docs/engine.md §7(b)) goes to the staged evaluator: its FS is the final stage's.
 * @returns OK when the circle has at least one slip mass with a driving moment, else the reason.
 */
export function evaluateCircle(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  wantBishop: boolean,
): number {
  if (P.staged !== null) return evaluateStagedCircle(P, S, xc, yc, r, wantBishop);
  S.fsO = NaN;
  S.fsB = NaN;
  S.govO = -1;
  S.govB = -1;
  S.minMa = NaN;
  if (!(r > 0)) return reject(S, BAD_RADIUS);
  const st = findMasses(P, S, xc, yc, r);
  if (st !== OK) return reject(S, st);
  return runMasses(P, S, xc, yc, r, wantBishop);
}

function reject(S: Scratch, st: number): number {
  S.reasonO = st;
  S.reasonB = st;
  return st;
}

/** Runs every mass in its own direction (both ways when level) and keeps each method's lowest factor. */
function runMasses(P: PreparedSection, S: Scratch, xc: number, yc: number, r: number, wantBishop: boolean): number {
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
      const st = sliceMass(P, S, xc, yc, r, m, dir);
      if (st !== OK) return reject(S, st);
      const D = S.D;
      const res = S.resO;
      if (!isDriven(D, S.gross, res)) continue;
      driving = true;
      const f0 = res / D;
      if (f0 < fo) {
        fo = f0;
        mo = m;
        dirO = dir;
        negO = S.negO;
      }
      if (wantBishop) {
        const f1 = bishopFactor(S, D, f0);
        if (Number.isNaN(f1)) failB = S.reasonB;
        else if (f1 < fb) {
          fb = f1;
          mb = m;
          dirB = dir;
          minMa = S.minMa;
          minMaX = S.minMaX;
          minMaAlpha = S.minMaAlpha;
          negB = S.negB;
          iterations = S.iterations;
        }
      }
    }
  }
  if (!driving) return reject(S, NO_DRIVING);
  S.fsO = fo;
  S.govO = mo;
  S.dirO = dirO;
  S.negO = negO;
  S.reasonO = OK;
  S.dir = dirO;
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
