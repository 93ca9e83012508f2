/**
 * Benchmark of the seepage solver (npm run bench:seepage): an invented zoned dam like the demo's
 * (clay core, gravel shells, toe drain, pervious foundation over rock) meshed to about 5,000 nodes
 * and solved with its free-surface rounds. Prints the mesh, the rounds and the time of each run;
 * the last line is `seepage_ms=N`, the median wall-clock time of the timed runs (the CPU time is
 * printed above it). Figures only, no pass or fail.
 */
import { runSeepage } from "../lib/seepage";

const DAM = {
  materials: [
    { id: "core", model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 10, phi: 25, k: 1e-9, kRatio: 0.25 },
    { id: "shell", model: "mohr-coulomb", gamma: 20, gammaSat: 21, c: 0, phi: 36, k: 1e-5 },
    { id: "foundation", model: "mohr-coulomb", gamma: 18, gammaSat: 19, c: 4, phi: 28, k: 1e-7, kRatio: 0.5 },
    { id: "drain", model: "mohr-coulomb", gamma: 20, gammaSat: 21, c: 0, phi: 38, k: 1e-3 },
    { id: "rock", model: "impenetrable", gamma: 23 },
  ],
  regions: [
    {
      material: "rock",
      points: [
        [0, -4],
        [120, -4],
        [120, 0],
        [0, 0],
      ],
    },
    {
      material: "foundation",
      points: [
        [0, 0],
        [120, 0],
        [120, 6],
        [98, 6],
        [84, 6],
        [64, 6],
        [48, 6],
        [20, 6],
        [0, 6],
      ],
    },
    {
      material: "shell",
      points: [
        [20, 6],
        [48, 6],
        [56, 24],
        [54, 24],
      ],
    },
    {
      material: "core",
      points: [
        [48, 6],
        [64, 6],
        [60, 24],
        [56, 24],
      ],
    },
    {
      material: "shell",
      points: [
        [64, 6],
        [84, 6],
        [84, 7],
        [96, 7],
        [62, 24],
        [60, 24],
      ],
    },
    {
      material: "drain",
      points: [
        [84, 6],
        [98, 6],
        [96, 7],
        [84, 7],
      ],
    },
  ],
  seepage: {
    pools: [
      { side: "left", level: 21 },
      { side: "right", level: 6 },
    ],
    meshSize: 0.62,
  },
};

const RUNS = 5;

function once(): { ms: number; cpu: number; nodes: number; elements: number; rounds: number; cg: number; q: number } {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const r = runSeepage(DAM);
  const ms = performance.now() - t0;
  const c = process.cpuUsage(c0);
  if (!r.ok) throw new Error(`the benchmark section is invalid: ${JSON.stringify(r.errors)}`);
  const s = r.solution;
  return {
    ms,
    // CPU time of this process: on a shared machine it shows the work apart from the waiting.
    cpu: (c.user + c.system) / 1000,
    nodes: s.mesh.nodes,
    elements: s.mesh.elements,
    rounds: s.iterations.freeSurface,
    cg: s.iterations.solver,
    q: s.q,
  };
}

once(); // warm-up: the first run also compiles
const times: number[] = [];
const cpus: number[] = [];
let last = once();
for (let i = 0; i < RUNS; i++) {
  last = once();
  times.push(last.ms);
  cpus.push(last.cpu);
  console.log(`run ${i + 1}: ${last.ms.toFixed(1)} ms wall, ${last.cpu.toFixed(1)} ms cpu`);
}
const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];
console.log(`nodes=${last.nodes} elements=${last.elements}`);
console.log(`free_surface_rounds=${last.rounds} cg_iterations=${last.cg}`);
console.log(`q=${last.q.toExponential(4)} m3/s per m`);
console.log(`cpu_ms=${Math.round(median(cpus))}`);
console.log(`seepage_ms=${Math.round(median(times))}`);
