/**
 * Unconfined steady flow on a fixed mesh (docs/seepage.md §3): each element's conductivity is
 * scaled by the share of its area that is saturated (pressure head ≥ 0), with a small residual
 * share above the phreatic surface, and the potential seepage faces switch between "held at
 * atmospheric pressure" and "no flow" until water only leaves where the pressure would otherwise
 * be positive. Both are repeated (Picard iterations) until neither heads nor faces change.
 * The idea is the residual-flow / fixed-mesh family (Desai 1976; Bathe & Khoshgoftaar 1979).
 */
import { DRAIN, FACE, INACTIVE, POOL, type Boundary } from "./boundary";
import { wetFraction } from "./elements";
import { buildPattern, multiply, solveMasked, type CsrPattern } from "./sparse";
import type { TriMesh } from "./types";

/** Conductivity kept above the phreatic surface, as a share of the saturated value. */
export const RESIDUAL_SHARE = 1e-3;
const MAX_ROUNDS = 200;
/**
 * Under-relaxation of the saturated shares: without it they swing from round to round. It starts
 * at 0.8 and shrinks each time the change grows.
 */
const RELAX_START = 0.8;
const RELAX_MIN = 0.05;
/** Solver tolerances: loose inside the rounds, tight for the final solve that the flows come from. */
const INNER_TOL = 1e-6;
const FINAL_TOL = 1e-9;
/** Rounds stop when no face switches, heads move less than this share of the head lost, and shares settle. */
const HEAD_TOL = 1e-5;
const SHARE_TOL = 1e-4;
const SETTLED_TOL = 3e-4;
const LIFT = 0.02;
/** Rounds over which an unsettled run reports how much q still varied. */
export const FLOW_WINDOW = 20;

export interface FlowState {
  pattern: CsrPattern;
  /** Assembled matrix of the last round. */
  values: Float64Array;
  /** Total head at every node (m); NaN at nodes outside the pervious regions. */
  head: Float64Array;
  /** 1 where the head is prescribed in the final state. */
  fixed: Uint8Array;
  /** Saturated share of each element's conductivity used last. */
  relative: Float64Array;
  rounds: number;
  /** Largest head change in the last round (m): how far from settled an unconverged run stopped. */
  lastChange: number;
  /** Where that change was largest (m), or null when nothing moved. */
  lastChangeAt: [number, number] | null;
  /** (max − min)/max of the flow over the last FLOW_WINDOW rounds: how settled q is. */
  flowSpread: number;
  solverIterations: number;
  converged: boolean;
}

/** Told after each round; returning false stops the run (a cancel button in the browser). */
export type RoundListener = (round: number, maxRounds: number) => boolean | void;

/** Solves for the heads and the phreatic surface, or returns null when the listener stopped it. */
export function solveUnconfined(
  mesh: TriMesh,
  bc: Boundary,
  ke: Float64Array,
  pervious: Uint8Array,
  onRound?: RoundListener,
): FlowState | null {
  const n = mesh.x.length;
  const ne = mesh.region.length;
  const pattern = buildPattern(n, mesh.tri);
  const values = new Float64Array(pattern.col.length);
  const fixed = new Uint8Array(n);
  const head = new Float64Array(n);
  let hMin = Infinity;
  let hMax = -Infinity;
  for (let v = 0; v < n; v++) {
    if (bc.kind[v] === POOL || bc.kind[v] === DRAIN) {
      fixed[v] = 1;
      head[v] = bc.head[v];
      hMin = Math.min(hMin, head[v]);
      hMax = Math.max(hMax, head[v]);
    }
  }
  // Nodes outside the pervious regions are held at 0 and carry no element: they drop out.
  for (let v = 0; v < n; v++) if (bc.kind[v] === INACTIVE) fixed[v] = 1;
  for (let v = 0; v < n; v++) if (!fixed[v]) head[v] = (hMin + hMax) / 2;
  const relative = new Float64Array(ne).fill(1);
  for (let e = 0; e < ne; e++) if (!pervious[e]) relative[e] = 0;

  // Heads can fall to the lowest seepage face, so that sets the scale when one pool drives the flow.
  let faceLow = hMin;
  for (let v = 0; v < n; v++) if (bc.kind[v] === FACE) faceLow = Math.min(faceLow, mesh.y[v]);
  const dh = Math.max(hMax - Math.min(hMin, faceLow), 1e-9);
  const reaction = new Float64Array(n);
  const previous = new Float64Array(n);
  let solverIterations = 0;
  let rounds = 0;
  let converged = false;
  let headMoved = 0;
  const switches = new Uint16Array(n);
  let relax = RELAX_START;
  let lastFlow = 0;
  let settled = 0;
  let lastChange = Infinity;
  let movedAt = -1;
  const flows = new Float64Array(FLOW_WINDOW);
  for (rounds = 1; rounds <= MAX_ROUNDS; rounds++) {
    assemble(pattern, ke, relative, values);
    previous.set(head);
    const cg = solveMasked(pattern, values, head, fixed, INNER_TOL);
    solverIterations += cg.iterations;

    let changed = 0;
    reactions(pattern, values, head, fixed, reaction);
    const scale = totalFlow(reaction, fixed) || 1e-300;
    for (let v = 0; v < n; v++) {
      // A drain, like a seepage face, takes water but never gives it: a drain node that would feed
      // water into dry soil is released until the soil around it saturates.
      if ((bc.kind[v] !== FACE && bc.kind[v] !== DRAIN) || switches[v] > 8) continue;
      if (fixed[v] && reaction[v] > 1e-9 * scale) {
        fixed[v] = 0;
        switches[v]++;
        changed++;
      } else if (!fixed[v] && head[v] > mesh.y[v] + 1e-9 * dh) {
        fixed[v] = 1;
        head[v] = mesh.y[v];
        switches[v]++;
        changed++;
      }
    }
    let dRel = 0;
    for (let e = 0; e < ne; e++) {
      if (!pervious[e]) continue;
      const a = mesh.tri[3 * e];
      const b = mesh.tri[3 * e + 1];
      const c = mesh.tri[3 * e + 2];
      const pa = head[a] - mesh.y[a];
      const pb = head[b] - mesh.y[b];
      const pc = head[c] - mesh.y[c];
      // Drain and seepage-face nodes sit at exactly p = 0; an element with two of them would flip
      // between dry and wet as its third node crosses zero. A small lift of the zero level, a
      // fiftieth of the element's height, keeps the share continuous.
      const lift =
        LIFT *
        Math.max(Math.abs(mesh.y[a] - mesh.y[b]), Math.abs(mesh.y[b] - mesh.y[c]), Math.abs(mesh.y[c] - mesh.y[a]));
      const share = wetFraction(pa + lift, pb + lift, pc + lift);
      const r = relax * (RESIDUAL_SHARE + (1 - RESIDUAL_SHARE) * share) + (1 - relax) * relative[e];
      dRel = Math.max(dRel, Math.abs(r - relative[e]));
      relative[e] = r;
    }
    if (dRel > lastChange) relax = Math.max(RELAX_MIN, relax * 0.7);
    lastChange = dRel;
    let dHead = 0;
    let moved = -1;
    for (let v = 0; v < n; v++)
      if (!fixed[v] && Math.abs(head[v] - previous[v]) > dHead) {
        dHead = Math.abs(head[v] - previous[v]);
        moved = v;
      }
    movedAt = moved;
    flows[(rounds - 1) % FLOW_WINDOW] = scale;
    // A few elements astride the phreatic surface can keep trading small shares long after the
    // heads and the flow have settled; three quiet rounds in a row end the iteration too.
    headMoved = dHead;
    const dFlow = Math.abs(scale - lastFlow) / scale;
    lastFlow = scale;
    settled = changed === 0 && dHead < SETTLED_TOL * dh && dFlow < SETTLED_TOL ? settled + 1 : 0;
    if (onRound && onRound(rounds, MAX_ROUNDS) === false) return null;
    if ((changed === 0 && dHead < HEAD_TOL * dh && dRel < SHARE_TOL && rounds > 1) || settled >= 3) {
      converged = true;
      break;
    }
  }
  if (!converged) rounds = MAX_ROUNDS;
  // The heads, prescribed set and matrix must agree: one last solve with the final shares.
  assemble(pattern, ke, relative, values);
  solverIterations += solveMasked(pattern, values, head, fixed, FINAL_TOL).iterations;
  for (let v = 0; v < n; v++) if (bc.kind[v] === INACTIVE) head[v] = NaN;
  const window = flows.subarray(0, Math.min(rounds, FLOW_WINDOW));
  const fMax = Math.max(...window);
  const flowSpread = fMax > 0 ? (fMax - Math.min(...window)) / fMax : 0;
  const lastChangeAt: [number, number] | null = movedAt >= 0 ? [mesh.x[movedAt], mesh.y[movedAt]] : null;
  return {
    pattern,
    values,
    head,
    fixed,
    relative,
    rounds,
    lastChange: headMoved,
    lastChangeAt,
    flowSpread,
    solverIterations,
    converged,
  };
}

function assemble(p: CsrPattern, ke: Float64Array, relative: Float64Array, values: Float64Array): void {
  values.fill(0);
  const slots = p.elementSlots;
  for (let e = 0; e < relative.length; e++) {
    const r = relative[e];
    if (r === 0) continue;
    for (let k = 0; k < 9; k++) values[slots[9 * e + k]] += r * ke[9 * e + k];
  }
}

/** Net inflow at each prescribed node (m³/s per metre): row i of K·h; positive where water enters. */
export function reactions(
  p: CsrPattern,
  values: Float64Array,
  head: Float64Array,
  fixed: Uint8Array,
  out: Float64Array,
): void {
  const h = Float64Array.from(head, (v) => (Number.isNaN(v) ? 0 : v));
  multiply(p, values, h, out);
  for (let i = 0; i < p.n; i++) if (!fixed[i]) out[i] = 0;
}

function totalFlow(reaction: Float64Array, fixed: Uint8Array): number {
  let s = 0;
  for (let i = 0; i < reaction.length; i++) if (fixed[i]) s += Math.abs(reaction[i]);
  return s / 2;
}
