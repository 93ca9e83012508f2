/**
 * Benchmark of the design sweep's search set-up on the demo embankment (docs/engine.md §9): the
 * default sweep (2:1 to 4:1 by 0.25, three cases, 12 × 12 centres × 8 tangent levels) run on one
 * core as the browser workers run it. Prints figures only: wall time, circles rejected for
 * entering impenetrable material, grid moves toward an edge minimum, points left unsettled.
 */
import { DEFAULT_PARAMS } from "../lib/design/parameters";
import { DEFAULT_SWEEP, planSweep } from "../lib/design/sweep-plan";
import { runSweepJob, searchJob } from "../lib/design/run-job";
import { readSweep } from "../lib/design/pick-ratio";
import { DEMO_MATERIALS } from "../db/seeds/demo-section";

const jobs = planSweep(DEFAULT_PARAMS, DEFAULT_SWEEP);
const t0 = performance.now();
const points = jobs.map((j) => runSweepJob(DEFAULT_PARAMS, DEMO_MATERIALS, j, DEFAULT_SWEEP));
const wall = (performance.now() - t0) / 1000;

let tried = 0;
let rejectedRock = 0;
for (const j of jobs) {
  const o = searchJob(DEFAULT_PARAMS, DEMO_MATERIALS, j, DEFAULT_SWEEP);
  if (!o.ok) continue;
  tried += o.search.result.circles.tried;
  rejectedRock += o.search.result.circles.rejected.impenetrable ?? 0;
}
const reading = readSweep(points, { "steady-seepage": 1.5, "drawdown-storage": 1.3, "drawdown-surcharge": 1.1 });
console.log(`jobs=${jobs.length}`);
console.log(`sweep_seconds=${wall.toFixed(2)}`);
console.log(`grid_moves=${points.reduce((n, p) => n + p.gridMoves, 0)}`);
console.log(`points_unsettled_on_grid_edge=${points.filter((p) => p.gridEdge).length}`);
console.log(`circles_tried_final_grids=${tried}`);
console.log(`circles_rejected_impenetrable=${rejectedRock}`);
console.log(
  `recommended_upstream=${reading.faces.upstream.ratio} recommended_downstream=${reading.faces.downstream.ratio}`,
);
