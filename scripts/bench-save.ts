/**
 * Benchmark of keeping a run: what the server adds to an ordinary save of the demo dam since it
 * runs the whole search itself (issue 12 item 1; target: under 0.3 s). The set-up is the one the
 * run form starts with (downstream face, steady seepage, the suggested grid, 50 slices, both
 * methods, refinement on). Prints figures only; the last line is `server_search_seconds=N`.
 * Database writes are not included: they were there before and do not change.
 */
import os from "node:os";
import { buildDemoSection } from "../db/seeds/demo-section";
import { suggestGrid } from "../lib/analysis/auto-grid";
import { directionForFace } from "../lib/analysis/face";
import { documentForRun, type RunSetup } from "../lib/analysis/run-setup";
import { comparePreview } from "../lib/runs/record/compare-preview";
import { searchResultSchema } from "../lib/runs/record/result-schema";
import { computeRunRecord } from "../lib/runs/record/run-record";
import { searchRecord } from "../lib/runs/record/search-record";
import { searchCircleCount } from "../lib/runs/record/limits";

const section = buildDemoSection();
const g = suggestGrid(section, directionForFace(section, "downstream"));
const setup: RunSetup = {
  condition: "steady-seepage",
  face: "downstream",
  methods: ["bishop", "fellenius"],
  slices: 50,
  ordinaryForm: "classical",
  grid: g.grid,
  radii: g.radii,
  refine: true,
  drawdownMethod: "effective",
  requiredFs: 1.5,
};

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  const doc = documentForRun(section, setup);
  // The browser's preview, as the save request carries it.
  const browser = searchRecord(doc);
  if (!browser.ok) throw new Error(JSON.stringify(browser.errors));
  const preview = searchResultSchema.parse(JSON.parse(JSON.stringify(browser.result)));

  const inProcess: number[] = [];
  for (let i = 0; i < 7; i++) {
    const t0 = performance.now();
    searchRecord(doc);
    inProcess.push((performance.now() - t0) / 1000);
  }
  const server: number[] = [];
  let mode = "";
  let status = "";
  for (let i = 0; i < 7; i++) {
    const t0 = performance.now();
    const record = await computeRunRecord(section, setup, (s) => comparePreview(s, preview));
    server.push((performance.now() - t0) / 1000);
    mode = record.mode;
    status = record.result.previewCheck.status;
  }
  console.log(`machine: ${os.cpus()[0]?.model ?? "unknown"}, ${os.cpus().length} cores (shared)`);
  const circles = searchCircleCount(setup.grid, setup.radii);
  const tried = browser.result.circles.tried;
  console.log(`demo save: ${circles} grid circles (${tried} with refinement), ${setup.slices} slices, both methods`);
  console.log(`search + critical-circle reports in this process: median ${median(inProcess).toFixed(3)} s`);
  console.log(
    `server's part of a save (${mode}, validation, search, comparison): median ${median(server).toFixed(3)} s`,
  );
  console.log(`first save after the server starts (its search thread still cold): ${server[0].toFixed(3)} s`);
  console.log(`all server runs: ${server.map((s) => s.toFixed(3)).join(" ")} s`);
  console.log(`preview compared with the server's search: ${status}`);
  console.log(`server_search_seconds=${median(server).toFixed(3)}`);
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
