/**
 * Benchmark of the rigorous methods (docs/engine.md §11–§12): the cost of one 50-slice circle by
 * Bishop's simplified method and by Spencer and Morgenstern–Price (each on top of the same slicing),
 * on the three-material embankment of `npm run bench`; target Spencer ≤ 5 × Bishop. Then the time
 * of a surfaces search on the demo weak-layer section (target < 5 s on one core). Prints figures only.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { evaluateCircle } from "../lib/stability/evaluate-circle";
import { createGleSlices } from "../lib/stability/methods/gle";
import { prepareSection } from "../lib/stability/prepare";
import { createRigorousPick, rigorousOnCircle } from "../lib/stability/rigorous-circle";
import type { RigorousMethod, SectionDocument } from "../lib/stability/schema";
import { createScratch } from "../lib/stability/scratch";
import { runSurfaceSearch } from "../lib/stability/surfaces/search-surfaces";
import { validateSection } from "../lib/stability/validate";

const fixtures = path.join(__dirname, "..", "tests", "fixtures", "sections");
const doc = JSON.parse(readFileSync(path.join(fixtures, "three-material-embankment.json"), "utf8")) as SectionDocument;
const v = validateSection(doc);
if (!v.ok) throw new Error("benchmark section is invalid");
const P = prepareSection(v.section);
const S = createScratch();
const G = createGleSlices();
const pick = createRigorousPick();

// A ring of circles around the embankment's critical region, all valid.
const circles: [number, number, number][] = [];
for (let i = 0; i < 40; i++)
  for (let j = 0; j < 5; j++) {
    const xc = 62 + (i % 10) * 1.5;
    const yc = 30 + Math.floor(i / 10) * 2;
    circles.push([xc, yc, yc - 4 - j]);
  }
const valid = circles.filter(([x, y, r]) => evaluateCircle(P, S, x, y, r, true) === 0 && S.fsB > 0);

function cpuSeconds(fn: () => void): number {
  const c0 = process.cpuUsage();
  fn();
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1e6;
}

function perCircle(method: "bishop" | RigorousMethod): number {
  const run = () => {
    for (const [x, y, r] of valid) {
      evaluateCircle(P, S, x, y, r, true);
      if (method !== "bishop") rigorousOnCircle(P, S, G, x, y, r, method, true, pick);
    }
  };
  run();
  const times: number[] = [];
  for (let k = 0; k < 7; k++)
    times.push(
      cpuSeconds(() => {
        for (let rep = 0; rep < 10; rep++) run();
      }),
    );
  times.sort((a, b) => a - b);
  return times[3] / (10 * valid.length);
}

const tb = perCircle("bishop");
const ts = perCircle("spencer");
const tm = perCircle("morgenstern-price");
console.log(`rigorous circles: ${valid.length} valid 50-slice circles on the three-material embankment`);
console.log(`bishop_us_per_circle=${(tb * 1e6).toFixed(1)}`);
console.log(`spencer_us_per_circle=${(ts * 1e6).toFixed(1)} (${(ts / tb).toFixed(2)} x Bishop; target <= 5)`);
console.log(`morgenstern_price_us_per_circle=${(tm * 1e6).toFixed(1)} (${(tm / tb).toFixed(2)} x Bishop)`);

// The surfaces search on the weak-layer demo section (Spencer and Morgenstern–Price), CPU time on one core.
const weak = JSON.parse(readFileSync(path.join(fixtures, "weak-layer-outline.json"), "utf8")) as SectionDocument;
weak.analysis = { ...weak.analysis, methods: ["spencer", "morgenstern-price"], search: "surfaces" };
let found = "";
const searchTimes: number[] = [];
for (let k = 0; k < 3; k++)
  searchTimes.push(
    cpuSeconds(() => {
      const r = runSurfaceSearch(weak);
      if (!r.ok) throw new Error("demo section is invalid");
      found = `Spencer ${r.results.spencer?.fs.toFixed(4)}, M–P ${r.results["morgenstern-price"]?.fs.toFixed(4)}`;
    }),
  );
searchTimes.sort((a, b) => a - b);
console.log(`surfaces search on the weak-layer demo: ${found}`);
console.log(`surfaces_search_seconds=${searchTimes[1].toFixed(2)} (target < 5 s, one core)`);
