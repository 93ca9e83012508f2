/**
 * Reusable buffers for the slice loop (docs/engine.md §5): allocated once per worker so that
 * evaluating a circle creates no objects. Slice arrays hold one slip mass at a time.
 */
import { SLICE_CAPACITY } from "./defaults";
import { createStageScratch, type StageScratch } from "./drawdown/stage-scratch";

const SLICE_CAP = SLICE_CAPACITY;
/** Arc crossings inside one strip, and kept breaks of one mass (bounded by SLICE_CAPACITY). */
const BREAK_CAP = SLICE_CAPACITY + 8;

/**
 * Bishop's per-slice terms that do not depend on F, for the frictional slices of one mass
 * (lib/stability/methods/bishop.ts): filled once per mass, read on every pass of the iteration.
 */
export interface BishopTable {
  n: number;
  /** Σc'·l over the bases without friction. */
  cohesive: number;
  /** False while no base has any strength (c' = 0 and tan φ' = 0 everywhere). */
  strength: boolean;
  /** The first base without friction of lowest cos α (its mα): cos α, sin α, midpoint x, slice index (−1 none). */
  flatCos: number;
  flatSin: number;
  flatX: number;
  flatAt: number;
  /** Index of the slice each row comes from. */
  idx: Int32Array;
  num: Float64Array;
  t: Float64Array;
  cos: Float64Array;
  sin: Float64Array;
  /** Base midpoint x (m). */
  x: Float64Array;
  pCos: Float64Array;
  cbSin: Float64Array;
  cl: Float64Array;
}

/** Scratch state of one evaluator; results of the last circle are left in its fields. */
export interface Scratch {
  roots: Float64Array;
  massA: Float64Array;
  massB: Float64Array;
  nMass: number;
  brk: Float64Array;
  kept: Float64Array;
  /** How many equal slices each kept interval is cut into. */
  parts: Int32Array;
  /**
   * True when something reads the slices back (a one-circle report, a method other than Bishop's
   * and the ordinary one): then buildSlices writes every per-slice array. Otherwise a search
   * leaves them unwritten and reads only the sums and the Bishop table the slice loop gathers.
   */
  detail: boolean;
  // Per slice (current mass)
  n: number;
  xL: Float64Array;
  xR: Float64Array;
  /** Base midpoint x (m). */
  xm: Float64Array;
  ym: Float64Array;
  b: Float64Array;
  /** Horizontal projection of the base, l·cos α (m): what b is in the methods' base terms. */
  bb: Float64Array;
  sinA: Float64Array;
  cosA: Float64Array;
  len: Float64Array;
  W: Float64Array;
  Ww: Float64Array;
  Q: Float64Array;
  V: Float64Array;
  /** Horizontal water thrust on the slice, positive in the sliding direction (kN/m). */
  Fw: Float64Array;
  Hs: Float64Array;
  u: Float64Array;
  uRaw: Float64Array;
  c: Float64Array;
  tanPhi: Float64Array;
  mat: Int32Array;
  dD: Float64Array;
  /** Horizontal force resolved into the classical ordinary-method normal force. */
  Hn: Float64Array;
  // Results of the last circle
  dir: number;
  /** Direction (+1 toward +x, −1 toward −x) of each method's governing mass. */
  dirO: number;
  dirB: number;
  depth: number;
  D: number;
  /** Σ|driving terms| of the current mass (kN): the scale for round-off in D. */
  gross: number;
  /** The ordinary method's resisting term Σ(c'·l + N'·tan φ') of the current mass (kN). */
  resO: number;
  fsO: number;
  fsB: number;
  negO: number;
  negB: number;
  minMa: number;
  minMaX: number;
  minMaAlpha: number;
  iterations: number;
  reasonB: number;
  reasonO: number;
  /** Material of the impenetrable block without γ that rejected the last circle. */
  rigidMat: number;
  /** Index of the mass that governs each method (−1 when none). */
  govO: number;
  govB: number;
  bishop: BishopTable;
  /** Staged-drawdown buffers and stage factors (docs/engine.md §7(b)); unused otherwise. */
  stage: StageScratch;
}

/** Allocates a scratch set (about 0.8 MB); `detail` as in Scratch.detail. */
export function createScratch(detail = false): Scratch {
  const f = () => new Float64Array(SLICE_CAP);
  return {
    roots: new Float64Array(1024),
    massA: new Float64Array(512),
    massB: new Float64Array(512),
    nMass: 0,
    detail,
    brk: new Float64Array(BREAK_CAP),
    kept: new Float64Array(BREAK_CAP),
    parts: new Int32Array(BREAK_CAP),
    n: 0,
    xL: f(),
    xR: f(),
    xm: f(),
    ym: f(),
    b: f(),
    bb: f(),
    sinA: f(),
    cosA: f(),
    len: f(),
    W: f(),
    Ww: f(),
    Q: f(),
    V: f(),
    Fw: f(),
    Hs: f(),
    u: f(),
    uRaw: f(),
    c: f(),
    tanPhi: f(),
    mat: new Int32Array(SLICE_CAP),
    dD: f(),
    Hn: f(),
    dir: 1,
    dirO: 1,
    dirB: 1,
    depth: 0,
    D: 0,
    gross: 0,
    resO: 0,
    fsO: NaN,
    fsB: NaN,
    negO: 0,
    negB: 0,
    minMa: NaN,
    minMaX: NaN,
    minMaAlpha: NaN,
    iterations: 0,
    reasonB: 0,
    reasonO: 0,
    rigidMat: -1,
    govO: -1,
    govB: -1,
    bishop: {
      n: 0,
      cohesive: 0,
      strength: false,
      flatCos: Infinity,
      flatSin: NaN,
      flatX: NaN,
      flatAt: -1,
      idx: new Int32Array(SLICE_CAP),
      num: f(),
      t: f(),
      cos: f(),
      sin: f(),
      x: f(),
      pCos: f(),
      cbSin: f(),
      cl: f(),
    },
    stage: createStageScratch(SLICE_CAP),
  };
}
