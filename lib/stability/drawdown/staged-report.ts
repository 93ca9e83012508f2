/**
 * Report pieces of a staged rapid drawdown (docs/engine.md §7(b)): the factor of safety of each
 * stage, each slice's stage-1 stresses and governing strength, and the warnings. Plain JSON
 * (no NaN or Infinity). Used by the one-circle report and the grid search's critical circles.
 */
import type { EngineWarning } from "../issues";
import type { PreparedSection } from "../prepare";
import type { Scratch } from "../scratch";
import { DRAIN_FIXED, DRAIN_FREE, VARIANT_TWO_STAGE } from "./staged-model";
import { GOV_UNDRAINED, type StageFactors } from "./stage-scratch";
import { threeStageDetail } from "./staged-strength";

/** Factors of safety of the stages of one method (null where a stage was not reached or is invalid). */
export interface StageFs {
  /** Stage 1: effective stress at the pre-drawdown pool; null when nothing drives the mass then. */
  fs1: number | null;
  /** Stage 2: undrained strengths of low-permeability soil, pool lowered. */
  fs2: number | null;
  /** Stage 3 (three-stage only): drained strength where it is the lower; null when no slice switched. */
  fs3: number | null;
  /** The result: fs3 if any slice switched, else fs2. */
  final: number | null;
  /** Low-permeability slices whose drained strength governed in stage 3. */
  switchedSlices: number;
}

/** Stage data of one slice base. Stresses kPa. */
export interface SliceStage {
  drainage: "low-permeability" | "free-draining" | "fixed";
  /** Stage-1 effective normal and shear stress on the base (consolidation), σ'fc and τfc. */
  sigmaFc: number | null;
  tauFc: number | null;
  /** Consolidation ratio Kc as computed from σ'fc, τfc (null where undefined) and Kf at σ'fc (three-stage). */
  kc: number | null;
  kf: number | null;
  /** Strength for Kc = 1 from the R envelope (three-stage), or the R envelope itself at σ'fc (two-stage). */
  tauK1: number | null;
  tauR: number | null;
  /** Effective-envelope strength at σ'fc (the Kc = Kf strength). */
  tauKf: number | null;
  /** Second-stage undrained strength. */
  tau2: number | null;
  /** Drained strength after drawdown from the stage-2 normal force (three-stage). */
  tauDrained: number | null;
  governing: "undrained" | "drained";
}

function num(v: number): number | null {
  return Number.isFinite(v) ? v : null;
}

/** JSON form of a stage record. */
export function stageSummary(f: StageFactors): StageFs {
  return { fs1: num(f.fs1), fs2: num(f.fs2), fs3: num(f.fs3), final: num(f.final), switchedSlices: f.switched };
}

/**
 * Stage data of slice i of the mass now in S, after a chain run (replayStagedMass); `bishop`
 * says which method's stage-1 stresses the chain used.
 */
export function sliceStage(P: PreparedSection, S: Scratch, i: number, bishop: boolean): SliceStage {
  const SM = P.staged!;
  const St = S.stage;
  const mi = S.mat[i];
  const kind = SM.drainage[mi];
  const drainage = kind === DRAIN_FIXED ? "fixed" : kind === DRAIN_FREE ? "free-draining" : "low-permeability";
  const governing = St.gov[i] === GOV_UNDRAINED || kind === DRAIN_FIXED ? "undrained" : "drained";
  const empty: SliceStage = {
    drainage,
    sigmaFc: null,
    tauFc: null,
    kc: null,
    kf: null,
    tauK1: null,
    tauR: null,
    tauKf: null,
    tau2: null,
    tauDrained: null,
    governing,
  };
  if (kind === DRAIN_FIXED) return empty;
  const sig = bishop ? St.sigB[i] : St.sigO[i];
  const tau = bishop ? St.tauB[i] : St.tauO[i];
  const c = P.mat.c[mi];
  const tanPhi = P.mat.tanPhi[mi];
  const out: SliceStage = { ...empty, sigmaFc: num(sig), tauFc: num(tau), tauKf: num(c + sig * tanPhi) };
  if (kind === DRAIN_FREE) return out;
  out.tau2 = num(St.tau2[i]);
  out.tauDrained = num(St.taud[i]);
  if (SM.variant === VARIANT_TWO_STAGE) {
    out.tauR = num(SM.cR[mi] + sig * SM.tanPhiR[mi]);
    return out;
  }
  const detail = threeStageDetail(sig, tau, c, Math.atan(tanPhi), SM.d[mi], SM.tanPsi[mi]);
  out.kc = detail.kc;
  out.kf = detail.kf;
  out.tauK1 = num(detail.tauK1);
  return out;
}

const LABEL = { bishop: "Bishop's simplified method", fellenius: "The ordinary method" } as const;

/** Warnings about the stages of one method's result (one circle or a search's critical circle). */
export function stageWarnings(
  method: "bishop" | "fellenius",
  f: StageFs | null | undefined,
  where: string,
  out: EngineWarning[],
): void {
  if (!f) return;
  if (f.fs1 !== null && f.fs1 < 1) {
    out.push({
      code: "stage1-unstable",
      message: `${LABEL[method]}, ${where}: before drawdown (stage 1) FS = ${f.fs1.toFixed(3)} is below 1, so the consolidation stresses it gives are not in equilibrium and the staged result is doubtful. Check the pre-drawdown case first.`,
    });
  }
  if (f.fs1 === null && f.final !== null) {
    out.push({
      code: "stage1-no-driving",
      message: `${LABEL[method]}, ${where}: at the full pool nothing drives this slip mass, so the consolidation shear stresses are taken as zero (Kc = 1) for its undrained strengths.`,
    });
  }
}
