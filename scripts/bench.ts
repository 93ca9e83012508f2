/**
 * Benchmark of the stability engine (docs/engine.md §5 "Performance"): a three-material
 * embankment with a phreatic line, 50 slices, Bishop's simplified and the ordinary method,
 * a 40 × 40 centre grid × 20 radii (32,000 circles), on one core. Prints figures only;
 * the last line is `circles_per_second=N`, the whole search on the engine bundled as the app runs it
 * (see bundledRates below). Target: ≥ 250,000 circles/s on a quiet machine, search < 0.5 s.
 * It also times validation and one circle on surveyed grounds of 2,000 and 20,000 vertices
 * (docs/engine.md §1: validation is near-linear, so ten times the vertices cost about ten times).
 */
import { build } from "esbuild";
import { execFileSync } from "node:child_process";
import { readFileSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { analyzeCircle } from "../lib/stability/analyze-circle";
import { evaluateCircle } from "../lib/stability/evaluate-circle";
import { runGridSearch } from "../lib/stability/grid-search";
import { prepareSection } from "../lib/stability/prepare";
import { createScratch } from "../lib/stability/scratch";
import type { SectionDocument } from "../lib/stability/schema";
import { validateSection } from "../lib/stability/validate";

const file = path.join(__dirname, "..", "tests", "fixtures", "sections", "three-material-embankment.json");
const doc = JSON.parse(readFileSync(file, "utf8")) as SectionDocument;
const v = validateSection(doc);
if (!v.ok) {
  console.error(JSON.stringify(v.errors, null, 2));
  process.exit(2);
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

/** Wall-clock and CPU seconds of one call; CPU time is what "per core" means when others share the machine. */
function timed(fn: () => void): { wall: number; cpu: number } {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  fn();
  const wall = (performance.now() - t0) / 1000;
  const c = process.cpuUsage(c0);
  return { wall, cpu: (c.user + c.system) / 1e6 };
}

// Whole search, as the app runs it (validation, preparation, search, result assembly).
runGridSearch(doc); // warm-up: lets the JIT compile the slice loop
runGridSearch(doc);
const runs: { wall: number; cpu: number }[] = [];
let tried = 0;
let valid = 0;
let fs = "";
for (let i = 0; i < 7; i++) {
  runs.push(
    timed(() => {
      const r = runGridSearch(doc);
      if (!r.ok) throw new Error("benchmark section is invalid");
      tried = r.circles.tried;
      valid = r.circles.valid;
      fs = `Bishop ${r.results.bishop?.fs.toFixed(4)}, ordinary ${r.results.fellenius?.fs.toFixed(4)}`;
    }),
  );
}
const wallSearch = median(runs.map((r) => r.wall));
const cpuSearch = median(runs.map((r) => r.cpu));

// The circle loop alone, on the same circles.
const P = prepareSection(v.section);
const S = createScratch();
const g = v.section.analysis!.grid!;
const rr = v.section.analysis!.radii as { tangentY1: number; tangentY2: number; n: number };
const loopCpu: number[] = [];
let loopCount = 0;
for (let rep = 0; rep < 5; rep++) {
  loopCount = 0;
  loopCpu.push(
    timed(() => {
      for (let iy = 0; iy < g.ny; iy++) {
        const yc = g.y1 + ((g.y2 - g.y1) * iy) / (g.ny - 1);
        for (let ix = 0; ix < g.nx; ix++) {
          const xc = g.x1 + ((g.x2 - g.x1) * ix) / (g.nx - 1);
          for (let k = 0; k < rr.n; k++) {
            const yt = rr.tangentY1 + ((rr.tangentY2 - rr.tangentY1) * k) / (rr.n - 1);
            evaluateCircle(P, S, xc, yc, yc - yt, true);
            loopCount++;
          }
        }
      }
    }).cpu,
  );
}
const loopRate = loopCount / median(loopCpu);

/**
 * The same circle loop on the engine bundled as the app ships it (one ES module, as
 * scripts/build-engine.mjs writes for the worker threads), in a fresh process: under tsx every
 * module is compiled to CommonJS on its own and each call of an imported function reads a getter,
 * and a second copy of the engine in one process runs slower than the first, so neither the
 * figures above nor an in-process copy show what a worker thread does.
 */
async function bundledRates(): Promise<{ loop: number; search: number }> {
  const root = path.join(__dirname, "..");
  const outfile = path.join(os.tmpdir(), `scarpline-bench-loop-${process.pid}.mjs`);
  await build({
    entryPoints: [path.join(root, "scripts", "bench-circle-loop.ts")],
    outfile,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    tsconfig: path.join(root, "tsconfig.json"),
    logLevel: "warning",
  });
  try {
    const out = execFileSync(process.execPath, [outfile, file], { encoding: "utf8" });
    const loop = /^circles_per_cpu_second=(\d+)/m.exec(out);
    const search = /^search_circles_per_cpu_second=(\d+)/m.exec(out);
    if (!loop || !search) throw new Error(`bundled benchmark printed no rate: ${out}`);
    return { loop: Number(loop[1]), search: Number(search[1]) };
  } finally {
    rmSync(outfile, { force: true });
  }
}

/** A 2H:1V slope over a weak layer whose ground is surveyed at n vertices with a few cm of relief. */
function surveyedSection(n: number): SectionDocument {
  const ground: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    const x = (200 * i) / (n - 1);
    const y = x <= 80 ? 20 : x >= 120 ? 0 : 20 - (x - 80) / 2;
    ground.push([x, y + 0.03 * Math.sin(i * 0.7)]);
  }
  return {
    version: 1,
    materials: [
      { id: "fill", model: "mohr-coulomb", gamma: 19, c: 12, phi: 30 },
      { id: "weak", model: "mohr-coulomb", gamma: 18, c: 4, phi: 14 },
    ],
    regions: [
      { material: "fill", points: [...ground, [200, -2], [0, -2]] },
      {
        material: "weak",
        points: [
          [0, -2],
          [200, -2],
          [200, -15],
          [0, -15],
        ],
      },
    ],
  } as SectionDocument;
}

const surveyTimes = [2000, 20000].map((n) => {
  const survey = surveyedSection(n);
  validateSection(survey);
  const t = median([0, 1, 2].map(() => timed(() => validateSection(survey)).cpu));
  const c = median([0, 1, 2].map(() => timed(() => analyzeCircle(survey, { xc: 100, yc: 40, r: 43 })).cpu));
  return { n, t, c };
});
const searchRate = tried / cpuSearch;
const load = os.loadavg()[0];

console.log("Section: three-material embankment (shell, clay core, foundation) with a phreatic line and ponded pool");
console.log(`Methods: Bishop's simplified + ordinary (classical), ${v.section.analysis!.slices} slices, one thread`);
console.log(`Circles: ${tried} tried (${g.nx} × ${g.ny} centres × ${rr.n} radii), ${valid} valid; ${fs}`);
console.log(
  `Search of ${tried} circles (median of 7): ${cpuSearch.toFixed(3)} s of CPU, ${wallSearch.toFixed(3)} s wall clock  (target < 0.5 s)`,
);
console.log(
  `Machine load average (1 min): ${load.toFixed(2)} on ${os.cpus().length} cores; wall clock includes waiting for a core`,
);
for (const { n, t, c } of surveyTimes)
  console.log(
    `Surveyed ground of ${n} vertices: validation ${(t * 1000).toFixed(0)} ms, ` +
      `one circle with validation ${(c * 1000).toFixed(0)} ms (CPU)`,
  );
console.log(`Circle loop alone: ${Math.round(loopRate)} circles per CPU second`);
void bundledRates().then((bundled) => {
  console.log(`Circle loop alone, engine bundled as the app runs it: ${bundled.loop} circles per CPU second`);
  console.log(`Whole search under tsx (each module compiled on its own): ${Math.round(searchRate)} circles per second`);
  console.log(
    `Whole search, engine bundled as the app runs it: ${bundled.search} circles per second per core  (target ≥ 250000)`,
  );
  console.log(`circles_per_second=${bundled.search}`);
});
