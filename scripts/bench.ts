/**
 * Benchmark of the stability engine (docs/engine.md §5 "Performance"): a three-material
 * embankment with a phreatic line, 50 slices, Bishop's simplified and the ordinary method,
 * a 40 × 40 centre grid × 20 radii (32,000 circles), on one core. Prints figures only;
 * the last line is `circles_per_second=N`. Target: ≥ 100,000 circles/s, search < 0.5 s.
 */
import { readFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
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
console.log(`Circle loop alone: ${Math.round(loopRate)} circles per CPU second`);
console.log(`Whole search: ${Math.round(searchRate)} circles per second per core  (target ≥ 100000)`);
console.log(`circles_per_second=${Math.round(searchRate)}`);
