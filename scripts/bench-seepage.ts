/**
 * Benchmark of the seepage solver (npm run bench:seepage): an invented zoned dam like the demo's
 * (clay core, gravel shells, toe drain, pervious foundation over rock) meshed to about 5,000 nodes
 * and solved with its free-surface rounds. Prints the mesh, the rounds and the time of each run;
 * the last line is `seepage_ms=N`, the median wall-clock time of the timed runs (the CPU time is
 * printed above it). Then a stability search of the downstream face on the solution's pore pressures
 * against the same search on its phreatic line drawn by hand (circles per CPU second each): what
 * reading u from the field costs. Figures only, no pass or fail.
 */
import { runSeepage } from "../lib/seepage";
import { prepareWater } from "../lib/seepage-stability";
import { runGridSearch, type SectionDocument } from "../lib/stability";
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
/** Circles per CPU second of the same search on the seepage field and on its line drawn by hand. */
function fieldSearch(): void {
  const doc = {
    ...zonedDam(1.5),
    version: 1,
    water: { source: "seepage" },
    analysis: {
      case: "steady",
      methods: ["bishop"],
      slices: 40,
      grid: { x1: 75, y1: 28, x2: 105, y2: 50, nx: 15, ny: 15 },
      radii: { tangentY1: 1, tangentY2: 16, n: 10 },
    },
  };
  const water = prepareWater(doc);
  if (!water.ok) throw new Error(`the search section is invalid: ${JSON.stringify(water.errors)}`);
  const solved = water.document as SectionDocument;
  const drawn = { ...solved, water: { gammaW: 9.81, phreatic: solved.water?.phreatic } } as SectionDocument;
  const rate = (run: () => ReturnType<typeof runGridSearch>) => {
    run();
    const c0 = process.cpuUsage();
    const r = run();
    const c = process.cpuUsage(c0);
    return (r.ok ? r.circles.tried : 0) / ((c.user + c.system) / 1e6);
  };
  const onField = rate(() => runGridSearch(solved, { waterField: water.waterField }));
  const onLine = rate(() => runGridSearch(drawn));
  console.log(`search on the seepage field: ${Math.round(onField)} circles per CPU second`);
  console.log(`same search on its line drawn by hand: ${Math.round(onLine)} circles per CPU second`);
}

const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];
console.log(`nodes=${last.nodes} elements=${last.elements}`);
console.log(`free_surface_rounds=${last.rounds} cg_iterations=${last.cg}`);
console.log(`q=${last.q.toExponential(4)} m3/s per m`);
console.log(`cpu_ms=${Math.round(median(cpus))}`);
fieldSearch();
console.log(`seepage_ms=${Math.round(median(times))}`);
