/**
 * A seepage run from a section document (docs/seepage.md): check the input, mesh the regions,
 * set the boundary conditions, find the phreatic surface and report. Pure: no I/O.
 */
import { classifyBoundary, type Boundary } from "./boundary";
import { elementMatrices } from "./elements";
import { buildFlowNet } from "./flow-net";
import { FLOW_WINDOW, solveUnconfined, type FlowState, type RoundListener } from "./free-surface";
import { buildLocator } from "./locate";
import { buildMesh, checkCoverage } from "./mesh";
import { exitGradients, flows, headAt, phreaticLine, sig, upliftUnder, type Field } from "./results";
import type { SeepageFailure, SeepageIssue, SeepageProblem, SeepageSolution, TriMesh } from "./types";
import { buildProblem, MAX_NODES } from "./validate";

/** Required factor against piping: about 3 for earth embankments is common practice, with no single source. */
export const PIPING_FACTOR_RULE = 3;

export const SEEPAGE_CAUTIONS = [
  "Steady-state seepage by finite elements from the conductivities given; results are only as good as k, " +
    "its anisotropy and the boundary conditions, which field and laboratory data must support.",
  "Exit gradients depend on the mesh near corners and at the toe; judge them with the flow net and local experience.",
  "The required factor against piping (about 3 here) is common practice, not a code value: local codes and a " +
    "licensed engineer's judgement govern.",
];

/** The solved field, kept for drawing and for pore pressures in a stability run. */
export interface SeepageModel {
  problem: SeepageProblem;
  field: Field;
  boundary: Boundary;
  state: FlowState;
}

export type SeepageRun = { ok: true; solution: SeepageSolution; model: SeepageModel } | SeepageFailure;

export interface RunOptions {
  /** Node limit (default MAX_NODES). */
  maxNodes?: number;
  /** Called after each free-surface round with (round, most rounds); return false to cancel the run. */
  onRound?: RoundListener;
}

export function runSeepage(doc: unknown, options: RunOptions = {}): SeepageRun {
  const built = buildProblem(doc, options.maxNodes ?? MAX_NODES);
  if (!built.ok) return built;
  const problem = built.problem;
  const polygons = problem.regions.map((r) => r.points);
  const meshed = buildMesh({
    polygons,
    filled: problem.regions.map((r) => problem.materials[r.material].pervious),
    drains: problem.drains,
    levels: problem.pools.map((p) => p.level),
    h: problem.meshSize,
  });
  if (!meshed.ok) return meshed;
  const mesh = meshed.mesh;
  const overlap = checkCoverage(mesh, polygons);
  if (overlap.length) return { ok: false, errors: overlap };

  const ne = mesh.region.length;
  const material = Int32Array.from(mesh.region, (r) => {
    const m = problem.regions[r].material;
    return problem.materials[m].pervious ? m : -1;
  });
  const pervious = Uint8Array.from(material, (m) => (m >= 0 ? 1 : 0));
  const bc = classifyBoundary(mesh, (e) => pervious[e] === 1, problem.pools, problem.drains);
  if (!bc.ok) return bc;
  const kx = new Float64Array(ne);
  const ky = new Float64Array(ne);
  for (let e = 0; e < ne; e++)
    if (material[e] >= 0) {
      kx[e] = problem.materials[material[e]].kx;
      ky[e] = problem.materials[material[e]].ky;
    }
  const state = solveUnconfined(mesh, bc.boundary, elementMatrices(mesh, kx, ky), pervious, options.onRound);
  if (state === null)
    return { ok: false, errors: [{ code: "cancelled", path: "", message: "The seepage run was cancelled." }] };
  const field: Field = {
    mesh,
    head: state.head,
    material,
    materials: problem.materials,
    locator: buildLocator(mesh, (e) => pervious[e] === 1),
    gammaW: problem.gammaW,
  };
  const { qIn, qOut, nodal } = flows(state);
  const q = (qIn + qOut) / 2;
  const warnings: SeepageIssue[] = [];
  if (!state.converged)
    warnings.push({
      code: "free-surface-not-converged",
      path: "seepage",
      message: unsettledMessage(state),
    });
  // With equal pools nothing flows: q is round-off (about 1e-20 here), and 1 % of it means nothing.
  const kMax = problem.materials.reduce((m, mat) => Math.max(m, mat.kx, mat.ky), 0);
  if (q > 1e-9 * kMax && Math.abs(qIn - qOut) > 0.01 * q)
    warnings.push({
      code: "flow-not-balanced",
      path: "seepage",
      message:
        `Inflow ${qIn.toExponential(3)} and outflow ${qOut.toExponential(3)} m³/s per metre ` +
        `differ by more than 1 %.`,
    });
  const exits = exitGradients(field, bc.boundary, state, nodal);
  for (const g of exits)
    if (g.pipingFactor !== null && g.pipingFactor < PIPING_FACTOR_RULE)
      warnings.push({
        code: "low-piping-factor",
        path: "seepage",
        message:
          `Factor against piping ${g.pipingFactor.toFixed(2)} at (${g.x}, ${g.y}) is below ${PIPING_FACTOR_RULE} ` +
          `(common practice for earth embankments, no single source).`,
      });
  const solution: SeepageSolution = {
    ok: true,
    q: sig(q),
    qIn: sig(qIn),
    qOut: sig(qOut),
    qTotal: problem.crestLength === null ? null : sig(q * problem.crestLength),
    phreatic: phreaticLine(field, problem.meshSize / 2),
    probes: problem.probes.map(([x, y]) => {
      const h = headAt(field, x, y) ?? NaN;
      return { x, y, head: sig(h), pressure: sig(problem.gammaW * (h - y)) };
    }),
    exitGradients: exits,
    uplift: upliftUnder(field, bc.boundary, mesh.region),
    flowNet: buildFlowNet(field, bc.boundary, state, nodal, q, problem.headDrops, problem.meshSize / 3),
    mesh: { nodes: countActive(mesh, pervious), elements: pervious.reduce((s, v) => s + v, 0) },
    iterations: { freeSurface: state.rounds, solver: state.solverIterations, converged: state.converged },
    warnings,
    cautions: SEEPAGE_CAUTIONS,
  };
  return { ok: true, solution, model: { problem, field, boundary: bc.boundary, state } };
}

/**
 * Where and by how much an unsettled run still moved, and how steady q was: the statement a run that
 * stops at the round limit makes instead of pretending to have converged.
 */
function unsettledMessage(state: FlowState): string {
  const at = state.lastChangeAt;
  const where = at ? ` near (${at[0].toFixed(1)}, ${at[1].toFixed(1)})` : "";
  return (
    `The phreatic surface did not settle in ${state.rounds} rounds: heads still moved by up to ` +
    `${state.lastChange.toPrecision(2)} m${where} in the last one, and q varied by ` +
    `${(100 * state.flowSpread).toFixed(1)} % over the last ${FLOW_WINDOW} rounds. This happens where water ` +
    `leaves a much less pervious zone into a dry, much more pervious one (a core against a chimney drain): ` +
    `the results are the last round's. Drawing the chimney as a zone of its own high-k material (with a drain at ` +
    `its foot) rather than as a drain line usually settles; otherwise judge q and the pore pressures near that ` +
    `point with that spread in mind.`
  );
}

function countActive(mesh: TriMesh, pervious: Uint8Array): number {
  const seen = new Uint8Array(mesh.x.length);
  for (let e = 0; e < pervious.length; e++) if (pervious[e]) for (let s = 0; s < 3; s++) seen[mesh.tri[3 * e + s]] = 1;
  return seen.reduce((s, v) => s + v, 0);
}
