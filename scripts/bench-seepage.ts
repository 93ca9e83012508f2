/**
 * Benchmark of the seepage solver (npm run bench:seepage): an invented zoned dam like the demo's
 * (clay core, gravel shells, toe drain, pervious foundation over rock) meshed to about 5,000 nodes
 * and solved with its free-surface rounds. Prints the mesh, the rounds and the time of each run;
 * the last line is `seepage_ms=N`, the median wall-clock time of the timed runs (the CPU time is
 * printed above it). Figures only, no pass or fail.
 */
import { runSeepage } from "../lib/seepage";
import { zonedDam } from "../tests/unit/seepage/sections";

// The same invented zoned dam the seepage tests solve (one definition of it).
const DAM = zonedDam(0.62);

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
