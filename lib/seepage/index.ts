/** Public API of the seepage solver (docs/seepage.md): re-exports only. */
export {
  runSeepage,
  PIPING_FACTOR_RULE,
  SEEPAGE_CAUTIONS,
  type SeepageRun,
  type SeepageModel,
  type RunOptions,
} from "./solve";
export type { RoundListener } from "./free-surface";
export { seepageWater, type SeepageWater } from "./pore-pressure";
export { seepageDocumentSchema, type SeepageDocument, type SeepageSettings } from "./schema";
export { MAX_NODES, DEFAULT_GAMMA_W, DEFAULT_HEAD_DROPS } from "./validate";
export type {
  Point,
  Pool,
  SeepageIssue,
  SeepageSolution,
  SeepageFailure,
  ProbeResult,
  ExitGradient,
  Uplift,
  FlowNet,
  TriMesh,
} from "./types";
