/** Stability runs on seepage water (docs/seepage.md §6): re-exports only. */
export { solveWater, asksForSeepage, withSeepageKeys, type SolvedWater } from "./solve-water";
export { prepareWater, searchOnWater, circleOnWater, surfaceOnWater } from "./run";
export { seepageWaterLine } from "./water-line";
export type { SeepageSummary } from "./types";
export { attachSeepage, seepageWaterBlock, type SeepageInputs, type AttachedSeepage } from "./attach";
