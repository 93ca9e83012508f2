/**
 * The circle loop of scripts/bench.ts on its own (the bench section's 32,000 circles, both methods),
 * for scripts/bench.ts to bundle and run in a fresh process: the engine as the app ships it, one
 * ES module with direct calls (scripts/build-engine.mjs). Prints `circles_per_cpu_second=N` for the
 * loop and `search_circles_per_cpu_second=N` for the whole search (validation, preparation, search,
 * result assembly: runGridSearch), each the median of 7 runs after two warm-up runs.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { evaluateCircle } from "../lib/stability/evaluate-circle";
import { runGridSearch } from "../lib/stability/grid-search";
import { prepareSection } from "../lib/stability/prepare";
import { createScratch } from "../lib/stability/scratch";
import type { SectionDocument } from "../lib/stability/schema";
import { validateSection } from "../lib/stability/validate";

const file = process.argv[2] ?? path.join("tests", "fixtures", "sections", "three-material-embankment.json");
const doc = JSON.parse(readFileSync(file, "utf8")) as SectionDocument;
const v = validateSection(doc);
if (!v.ok) throw new Error("benchmark section is invalid");
const P = prepareSection(v.section);
const S = createScratch();
const g = v.section.analysis!.grid!;
const rr = v.section.analysis!.radii as { tangentY1: number; tangentY2: number; n: number };

/** One pass over every circle; returns how many were evaluated. */
function pass(): number {
  let count = 0;
  for (let iy = 0; iy < g.ny; iy++) {
    const yc = g.y1 + ((g.y2 - g.y1) * iy) / (g.ny - 1);
    for (let ix = 0; ix < g.nx; ix++) {
      const xc = g.x1 + ((g.x2 - g.x1) * ix) / (g.nx - 1);
      for (let k = 0; k < rr.n; k++) {
        const yt = rr.tangentY1 + ((rr.tangentY2 - rr.tangentY1) * k) / (rr.n - 1);
        evaluateCircle(P, S, xc, yc, yc - yt, true);
        count++;
      }
    }
  }
  return count;
}

pass();
pass();
const rates: number[] = [];
for (let rep = 0; rep < 7; rep++) {
  const c0 = process.cpuUsage();
  const n = pass();
  const c = process.cpuUsage(c0);
  rates.push(n / ((c.user + c.system) / 1e6));
}
rates.sort((a, b) => a - b);
console.log(`circles_per_cpu_second=${Math.round(rates[3])}`);

/** CPU seconds of one whole search, and how many circles it tried. */
function search(): { cpu: number; tried: number } {
  const c0 = process.cpuUsage();
  const r = runGridSearch(doc);
  const c = process.cpuUsage(c0);
  if (!r.ok) throw new Error("benchmark section is invalid");
  return { cpu: (c.user + c.system) / 1e6, tried: r.circles.tried };
}
search();
search();
const searchRates: number[] = [];
for (let rep = 0; rep < 7; rep++) {
  const { cpu, tried } = search();
  searchRates.push(tried / cpu);
}
searchRates.sort((a, b) => a - b);
console.log(`search_circles_per_cpu_second=${Math.round(searchRates[3])}`);
