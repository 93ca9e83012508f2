/**
 * Buffers and results of a staged drawdown evaluation (docs/engine.md §7(b)), part of each
 * evaluator's scratch so that staging a circle allocates nothing.
 */

/**
 * Slice strength in the final stage: the undrained τ2 (φ = 0), drained c', φ' with post-drawdown u, or the document's
 * su.
 */
export const GOV_UNDRAINED = 0;
export const GOV_DRAINED = 1;
export const GOV_FIXED = 2;

/** Factors of safety of the stages of one method on one slip mass. NaN = not reached or invalid. */
export interface StageFactors {
  fs1: number;
  fs2: number;
  fs3: number;
  final: number;
  /** Low-permeability slices whose drained strength governed in stage 3. */
  switched: number;
}

/** Per-slice arrays (current mass) and stage factors (current mass and governing mass, per method). */
export interface StageScratch {
  /** Stage-1 effective normal and shear stress on each base (kPa), from Bishop and from the ordinary method. */
  sigB: Float64Array;
  tauB: Float64Array;
  sigO: Float64Array;
  tauO: Float64Array;
  /** Stage-2 strength, drained strength after drawdown (kPa) and governing strength of the last chain run. */
  tau2: Float64Array;
  taud: Float64Array;
  gov: Uint8Array;
  curB: StageFactors;
  curO: StageFactors;
  govB: StageFactors;
  govO: StageFactors;
}

function factors(): StageFactors {
  return { fs1: NaN, fs2: NaN, fs3: NaN, final: NaN, switched: 0 };
}

/** Resets a stage record. */
export function clearFactors(f: StageFactors): void {
  f.fs1 = NaN;
  f.fs2 = NaN;
  f.fs3 = NaN;
  f.final = NaN;
  f.switched = 0;
}

/** Copies stage record a into b. */
export function copyFactors(a: StageFactors, b: StageFactors): void {
  b.fs1 = a.fs1;
  b.fs2 = a.fs2;
  b.fs3 = a.fs3;
  b.final = a.final;
  b.switched = a.switched;
}

/** Allocates the staged buffers for `cap` slices. */
export function createStageScratch(cap: number): StageScratch {
  const f = () => new Float64Array(cap);
  return {
    sigB: f(),
    tauB: f(),
    sigO: f(),
    tauO: f(),
    tau2: f(),
    taud: f(),
    gov: new Uint8Array(cap),
    curB: factors(),
    curO: factors(),
    govB: factors(),
    govO: factors(),
  };
}
