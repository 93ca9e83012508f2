/**
 * Benchmark of the probabilistic engine (docs/probabilistic.md "Speed"): the demo embankment's
 * downstream face (db/seeds/demo-section.ts) with c′, φ′, γ of the fill and c′, φ′ of the
 * foundation varied, Bishop's simplified and the ordinary method, a 12 × 10 centre grid × 8 radii.
 * Prints figures only, on one core; the last line is `critical_surface_samples_per_second=N`.
 */
import { buildDemoSection } from "../db/seeds/demo-section";
import { runProbabilistic } from "../lib/stability/probabilistic";

function demoDoc(samples: number, mode: string, sampling: string): unknown {
  const d = buildDemoSection() as unknown as Record<string, unknown> & { materials: Record<string, unknown>[] };
  for (const m of d.materials) {
    if (m.id === "fill")
      m.vary = {
        c: { dist: "lognormal", sd: 3 },
        phi: { dist: "normal", sd: 2 },
        gamma: { dist: "normal", sd: 0.5 },
        correlation: -0.3,
      };
    if (m.id === "foundation") m.vary = { c: { dist: "lognormal", sd: 1.5 }, phi: { dist: "normal", sd: 2 } };
  }
  d.analysis = {
    methods: ["bishop", "fellenius"],
    grid: { x1: 64, y1: 20, x2: 96, y2: 44, nx: 12, ny: 10 },
    radii: { tangentY1: 12, tangentY2: 1, n: 8 },
    probabilistic: { samples, seed: 1, sampling, mode },
  };
  return d;
}

/** CPU seconds of one call: what "per core" means when others share the machine. */
function cpuSeconds(fn: () => void): number {
  const c0 = process.cpuUsage();
  fn();
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1e6;
}

function timedRun(samples: number, mode: string, sampling: string): { cpu: number; wall: number; pf: string } {
  const doc = demoDoc(samples, mode, sampling);
  let pf = "";
  const t0 = performance.now();
  const cpu = cpuSeconds(() => {
    const r = runProbabilistic(doc);
    if (!r.ok) throw new Error(`benchmark input is invalid: ${JSON.stringify(r.errors)}`);
    pf = `Bishop pf ${r.probabilistic.bishop?.pf}, β ${r.probabilistic.bishop?.betaNormal?.toFixed(2)}`;
  });
  return { cpu, wall: (performance.now() - t0) / 1000, pf };
}

timedRun(2000, "critical-surface", "monte-carlo"); // warm-up: lets the JIT compile the slice loop
const baseline = timedRun(10, "critical-surface", "monte-carlo"); // the deterministic search alone, nearly
const n = 20_000;
for (const sampling of ["monte-carlo", "latin-hypercube"]) {
  const r = timedRun(n, "critical-surface", sampling);
  console.log(
    `critical-surface ${sampling}: ${n} samples in ${r.cpu.toFixed(2)} s CPU (${r.wall.toFixed(2)} s wall), ` +
      `search and Taylor series ${baseline.cpu.toFixed(2)} s; ${r.pf}`,
  );
}
const full = timedRun(20, "full-search", "monte-carlo");
console.log(
  `full-search: 20 samples (960 circles each) in ${full.cpu.toFixed(2)} s CPU; ` +
    `${(20 / full.cpu).toFixed(1)} samples/s`,
);
const cs = timedRun(n, "critical-surface", "monte-carlo");
console.log(`critical_surface_samples_per_second=${Math.round(n / Math.max(1e-9, cs.cpu - baseline.cpu))}`);
