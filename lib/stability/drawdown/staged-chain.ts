/**
 * The stages of a staged rapid drawdown on one slip mass (docs/engine.md §7(b); Duncan, Wright &
 * Wong 1990; Duncan, Wright & Brandon 2014, ch. 9; USACE EM 1110-2-1902 (2003) App. G):
 * 1. effective-stress analysis at the pre-drawdown pool: σ'fc = N'/l, τfc = (c' + σ'fc·tan φ')/F1;
 * 2. low-permeability bases get the undrained strength τ2 (φ = 0, pore pressure not used),
 *    free-draining bases c', φ' with the post-drawdown pore pressure; analysed at the lowered pool;
 * 3. (three-stage) where the drained strength c' + (N/l − u)·tan φ', with N the stage-2 total
 *    normal force, is below τ2, the base takes c', φ' with the post-drawdown u; analysed again.
 * Each method (Bishop's simplified, the ordinary method) runs its own chain: its stage-1 forces
 * give its τ2. Allocation-free; writes into the scratch.
 */
import * as cases from "../load-cases";
import { bishopFactor, gatherBishop } from "../methods/bishop";
import { ordinaryFactor, ordinaryNormal } from "../methods/ordinary";
import type { PreparedSection } from "../prepare";
import type { Scratch } from "../scratch";
import * as status from "../status";
import { buildSlices } from "../slices";
import * as model from "./staged-model";
import * as gov from "./stage-scratch";
import type { StageFactors } from "./stage-scratch";
import { threeStageStrength, twoStageStrength } from "./staged-strength";

const OK = status.OK;
const TOO_MANY_BREAKS = status.TOO_MANY_BREAKS;
const DRAIN_LOW = model.DRAIN_LOW;
const DRAIN_FIXED = model.DRAIN_FIXED;
const VARIANT_TWO_STAGE = model.VARIANT_TWO_STAGE;
const GOV_UNDRAINED = gov.GOV_UNDRAINED;
const GOV_DRAINED = gov.GOV_DRAINED;
const GOV_FIXED = gov.GOV_FIXED;
const KIND_UNDRAINED = cases.KIND_UNDRAINED;

/**
 * Stages mass [xA, xB] of circle (xc, yc, r) sliding in direction dir, by the ordinary method
 * and, if wantB, Bishop's simplified method (run last, so S is left in Bishop's final stage).
 * Results go to S.stage.curO / curB; `final` is NaN where the method has no valid result.
 * @returns OK, or the geometric reason the mass cannot be sliced; S.D is the post-drawdown driving term (kN).
 */
export function stageMass(
  P: PreparedSection,
  S: Scratch,
  xc: number,
  yc: number,
  r: number,
  xA: number,
  xB: number,
  dir: number,
  wantB: boolean,
): number {
  const St = S.stage;
  const pre = P.staged!.pre;
  gov.clearFactors(St.curO);
  gov.clearFactors(St.curB);
  let st = buildSlices(pre, S, xc, yc, r, xA, xB, dir, true);
  if (st !== OK) return st;
  const n1 = S.n;
  let D1 = 0;
  for (let i = 0; i < n1; i++) D1 += S.dD[i];
  const eff = P.ordinaryForm === 1;
  // With no driving moment before drawdown no shear is mobilised: τfc = 0, Kc = 1.
  const f1o = D1 > 1e-12 ? ordinaryFactor(S, D1, eff) : Infinity;
  St.curO.fs1 = f1o;
  consolidationStresses(P, S, f1o, false);
  let f1b = NaN;
  if (wantB) {
    f1b = D1 > 1e-12 ? bishopFactor(S, D1, f1o) : Infinity;
    St.curB.fs1 = f1b;
    if (!Number.isNaN(f1b)) consolidationStresses(P, S, f1b, true);
  }
  st = buildSlices(P, S, xc, yc, r, xA, xB, dir, true);
  if (st !== OK) return st;
  // Both stages share the strip table and the break set, so the slices are the same.
  if (S.n !== n1) return TOO_MANY_BREAKS;
  let D = 0;
  let gross = 0;
  for (let i = 0; i < n1; i++) {
    const d = S.dD[i];
    D += d;
    gross += d < 0 ? -d : d;
  }
  S.D = D;
  S.gross = gross;
  if (!(D > 1e-12)) return OK;
  runChain(P, S, D, false, St.curO);
  if (wantB && !Number.isNaN(f1b)) runChain(P, S, D, true, St.curB);
  return OK;
}

/** Stage-1 σ'fc and τfc of every base from the slices in S (pre-drawdown) at factor F. */
function consolidationStresses(P: PreparedSection, S: Scratch, F: number, bishop: boolean): void {
  const St = S.stage;
  const sig = bishop ? St.sigB : St.sigO;
  const tau = bishop ? St.tauB : St.tauO;
  const inv = F > 0 && Number.isFinite(F) ? 1 / F : 0;
  const eff = P.ordinaryForm === 1;
  for (let i = 0; i < S.n; i++) {
    const tp = S.tanPhi[i];
    const c = S.c[i];
    const l = S.len[i];
    let Np: number;
    if (bishop) {
      const cos = S.cosA[i];
      const ma = cos + S.sinA[i] * tp * inv;
      Np = (S.V[i] - S.u[i] * S.bb[i] - (c * S.bb[i] * S.sinA[i] * inv) / cos) / ma;
      if (!(Np > 0)) Np = 0;
    } else Np = ordinaryNormal(S, i, eff);
    const s = Np / l;
    sig[i] = s;
    tau[i] = (c + s * tp) * inv;
  }
}

/**
 * Stages 2 and 3 of one method on the post-drawdown slices in S (driving term D > 0).
 * Leaves S's strengths as used in the method's final stage.
 */
function runChain(P: PreparedSection, S: Scratch, D: number, bishop: boolean, out: StageFactors): void {
  const St = S.stage;
  const SM = P.staged!;
  const M = P.mat;
  const sig = bishop ? St.sigB : St.sigO;
  const tau = bishop ? St.tauB : St.tauO;
  const two = SM.variant === VARIANT_TWO_STAGE;
  const n = S.n;
  for (let i = 0; i < n; i++) {
    const mi = S.mat[i];
    const kind = SM.drainage[mi];
    if (kind === DRAIN_LOW) {
      const t2 = two
        ? twoStageStrength(sig[i], M.c[mi], M.tanPhi[mi], SM.cR[mi], SM.tanPhiR[mi])
        : threeStageStrength(
            sig[i],
            tau[i],
            M.c[mi],
            SM.sinPhi[mi],
            SM.cosPhi[mi],
            M.tanPhi[mi],
            SM.d[mi],
            SM.tanPsi[mi],
          );
      St.tau2[i] = t2;
      S.c[i] = t2;
      S.tanPhi[i] = 0;
      S.u[i] = 0;
      St.gov[i] = GOV_UNDRAINED;
    } else {
      St.tau2[i] = NaN;
      St.gov[i] = kind === DRAIN_FIXED || M.kind[mi] === KIND_UNDRAINED ? GOV_FIXED : GOV_DRAINED;
    }
    St.taud[i] = NaN;
  }
  const eff = P.ordinaryForm === 1;
  const start = out.fs1 > 0 && Number.isFinite(out.fs1) ? out.fs1 : 1;
  if (bishop) gatherBishop(S);
  const f2 = bishop ? bishopFactor(S, D, start) : ordinaryFactor(S, D, eff);
  out.fs2 = f2;
  out.final = f2;
  if (two || Number.isNaN(f2)) return;
  let switched = 0;
  for (let i = 0; i < n; i++) {
    if (St.gov[i] !== GOV_UNDRAINED) continue;
    const mi = S.mat[i];
    const u = S.uRaw[i];
    const l = S.len[i];
    const cos = S.cosA[i];
    const sin = S.sinA[i];
    let sp: number;
    // Effective normal stress after drawdown from the stage-2 total normal force of the method.
    if (bishop) sp = (S.V[i] - (St.tau2[i] * S.bb[i] * sin) / (cos * f2)) / (cos * l) - u;
    else if (eff) sp = ((S.V[i] - u * S.bb[i]) * cos - S.Hs[i] * sin) / l;
    else sp = (S.V[i] * cos - S.Hn[i] * sin) / l - u;
    const td = M.c[mi] + (sp > 0 ? sp : 0) * M.tanPhi[mi];
    St.taud[i] = td;
    if (td < St.tau2[i]) {
      S.c[i] = M.c[mi];
      S.tanPhi[i] = M.tanPhi[mi];
      S.u[i] = u;
      St.gov[i] = GOV_DRAINED;
      switched++;
    }
  }
  out.switched = switched;
  if (switched === 0) return;
  if (bishop) gatherBishop(S);
  const f3 = bishop ? bishopFactor(S, D, f2) : ordinaryFactor(S, D, eff);
  out.fs3 = f3;
  out.final = f3;
}
