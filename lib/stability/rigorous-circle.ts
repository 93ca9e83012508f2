/**
 * Spencer and Morgenstern–Price on a circle (docs/engine.md §11): the slices the circle evaluator
 * cut are handed to the general limit-equilibrium solver with the centre as the moment point and
 * the radius as the length scale, so that its moment equation at λ = 0 is Bishop's simplified
 * method term by term (the same driving terms S.dD, the same base strengths).
 */
import { arcY, isDriven, massDirection } from "./circle-direction";
import { groundAt } from "./ground";
import type { EngineWarning } from "./issues";
import type { Circle, CircleFs } from "./results";
import { rigorousReport } from "./rigorous-report";
import type { AnalysisFsRecord, LambdaRecord, RigorousRecord } from "./rigorous-types";
import { evaluateCircle, sliceMass } from "./evaluate-circle";
import { createGleSlices, lowestF, type GleSlices } from "./methods/gle";
import { ordinaryFactor } from "./methods/ordinary";
import type { PreparedSection } from "./prepare";
import { NO_DRIVING, NOT_CONVERGED, OK } from "./status";
import { morgensternPriceFactor } from "./methods/morgenstern-price";
import { spencerFactor } from "./methods/spencer";
import type { Scratch } from "./scratch";
import type { IntersliceFunction, RigorousMethod } from "./schema";

/**
 * Copies the slices now in S (one mass of circle (xc, yc, r) sliding in direction dir) into G in
 * the solver's frame: x' = dir·x, numbered from the upslope end.
 */
export function circleToGle(S: Scratch, G: GleSlices, xc: number, yc: number, r: number, dir: number): void {
  const n = S.n;
  G.n = n;
  for (let j = 0; j < n; j++) {
    const i = dir >= 0 ? j : n - 1 - j;
    G.xl[j] = dir >= 0 ? S.xL[i] : -S.xR[i];
    G.xr[j] = dir >= 0 ? S.xR[i] : -S.xL[i];
    G.ym[j] = S.ym[i];
    G.sinA[j] = S.sinA[i];
    G.cosA[j] = S.cosA[i];
    G.len[j] = S.len[i];
    G.V[j] = S.V[i];
    const H = S.Hn[i];
    G.H[j] = H;
    // S.dD = V·sin α + ΣH·(yc − y)/R: the horizontal forces' resultant height follows from it.
    G.yH[j] = H !== 0 ? yc - ((S.dD[i] - S.V[i] * S.sinA[i]) * r) / H : S.ym[i];
    G.u[j] = S.u[i];
    G.c[j] = S.c[i];
    G.tp[j] = S.tanPhi[i];
    G.drive[j] = S.dD[i];
    G.armS[j] = 1;
    G.armN[j] = 0;
  }
  void xc;
}

/**
 * The rigorous method's F on the slices in G, starting from F0 (Bishop's F is a good start).
 * NaN with G.status set when there is no acceptable solution.
 */
export function rigorousFactor(G: GleSlices, method: RigorousMethod, halfSine: boolean, F0: number): number {
  const start = F0 > lowestF(G) ? F0 : 1;
  return method === "spencer" ? spencerFactor(G, start) : morgensternPriceFactor(G, start, halfSine);
}

/** Where the last rigorousOnCircle found its lowest factor: mass index and direction (−1 mass when none). */
export interface RigorousPick {
  fs: number;
  lambda: number;
  mass: number;
  dir: number;
  /** Smallest mα of the governing mass at its solution. */
  minMa: number;
  /** Status of the failure when no mass gave a factor. */
  status: number;
}

export function createRigorousPick(): RigorousPick {
  return { fs: NaN, lambda: NaN, mass: -1, dir: 1, minMa: NaN, status: 0 };
}

/**
 * Runs a rigorous method on every driven mass of the circle last evaluated in S (evaluateCircle
 * returned OK), each in its own direction (both ways when level), and keeps the lowest factor in
 * `out`. A mass without an acceptable solution makes the circle's result a failure with that
 * status, as Bishop's does. Re-slices the masses, so S's slice arrays change.
 */
export function rigorousOnCircle(
  P: PreparedSection,
  S: Scratch,
  G: GleSlices,
  xc: number,
  yc: number,
  r: number,
  method: RigorousMethod,
  halfSine: boolean,
  out: RigorousPick,
): number {
  const F0 = S.fsB > 0 ? S.fsB : S.fsO > 0 ? S.fsO : 1;
  out.fs = NaN;
  out.lambda = NaN;
  out.mass = -1;
  out.status = OK;
  let best = Infinity;
  const eff = P.ordinaryForm === 1;
  const nMass = S.nMass;
  for (let m = 0; m < nMass; m++) {
    const d0 = massDirection(P, S, xc, yc, r, m);
    const tries = d0 === 0 ? 2 : 1;
    for (let t = 0; t < tries; t++) {
      const dir = d0 !== 0 ? d0 : t === 0 ? 1 : -1;
      if (sliceMass(P, S, xc, yc, r, m, dir) !== OK) continue;
      const negO = S.negO;
      const res = ordinaryFactor(S, 1, eff);
      S.negO = negO;
      if (!isDriven(S.D, S.gross, res)) continue;
      circleToGle(S, G, xc, yc, r, dir);
      const f = rigorousFactor(G, method, halfSine, F0);
      if (!(f >= 0)) {
        out.status = G.status;
        out.fs = NaN;
        out.mass = -1;
        return NaN;
      }
      if (f < best) {
        best = f;
        out.fs = f;
        out.lambda = G.lambda;
        out.minMa = G.minMa;
        out.mass = m;
        out.dir = dir;
      }
    }
  }
  if (out.mass < 0) out.status = NO_DRIVING;
  return out.fs;
}

/** Spencer / Morgenstern–Price on one circle, as reported by `--circle`. */
export interface CircleRigorous {
  fs: AnalysisFsRecord;
  lambda: LambdaRecord;
  rigorous: RigorousRecord;
  warnings: EngineWarning[];
}

/**
 * Every rigorous method asked for on circle c, which evaluateCircle has just accepted (S holds
 * its masses). Each method's governing mass is re-sliced and solved again so that the reported
 * forces are those of its factor. S's slice arrays change.
 */
export function circleRigorous(
  P: PreparedSection,
  S: Scratch,
  c: Circle,
  methods: readonly RigorousMethod[],
  interslice: IntersliceFunction,
): CircleRigorous {
  const out: CircleRigorous = { fs: {}, lambda: {}, rigorous: {}, warnings: [] };
  const G = createGleSlices();
  const pick = createRigorousPick();
  const halfSine = interslice === "half-sine";
  const geo = (dir: number) => ({
    dir,
    baseAt: (x: number) => arcY(c.xc, c.yc, c.r, x),
    topAt: (x: number) => groundAt(P.ground, x),
  });
  for (const m of methods) {
    const f = rigorousOnCircle(P, S, G, c.xc, c.yc, c.r, m, halfSine, pick);
    if (Number.isFinite(f)) {
      sliceMass(P, S, c.xc, c.yc, c.r, pick.mass, pick.dir);
      circleToGle(S, G, c.xc, c.yc, c.r, pick.dir);
      rigorousFactor(G, m, halfSine, f);
    } else G.status = pick.status === OK ? NOT_CONVERGED : pick.status;
    const rep = rigorousReport(G, m, interslice, geo(pick.dir));
    out.fs[m] = rep.fs;
    out.lambda[m] = rep.lambda;
    out.rigorous[m] = rep;
    out.warnings.push(...rep.warnings.map((w) => ({ code: w.code, message: w.message })));
  }
  return out;
}

/** A rigorous method's critical (or one of its lowest) circle as reported by a search, with λ. */
export function describeRigorousCircle(
  P: PreparedSection,
  S: Scratch,
  c: Circle,
  method: RigorousMethod,
): CircleFs | null {
  if (evaluateCircle(P, S, c.xc, c.yc, c.r, true) !== OK) return null;
  const G = createGleSlices();
  const pick = createRigorousPick();
  const f = rigorousOnCircle(P, S, G, c.xc, c.yc, c.r, method, P.analysis.interslice === "half-sine", pick);
  if (!Number.isFinite(f)) return null;
  const xa = S.massA[pick.mass];
  const xb = S.massB[pick.mass];
  const a: [number, number] = [xa, arcY(c.xc, c.yc, c.r, xa)];
  const b: [number, number] = [xb, arcY(c.xc, c.yc, c.r, xb)];
  const right = pick.dir >= 0;
  return {
    fs: f,
    circle: { ...c },
    entry: right ? a : b,
    exit: right ? b : a,
    direction: right ? "right" : "left",
    lambda: pick.lambda,
  };
}
