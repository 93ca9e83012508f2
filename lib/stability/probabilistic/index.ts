/** Public API of the probabilistic analysis (docs/probabilistic.md): re-exports only. */
export {
  runProbabilistic,
  hasProbabilisticSettings,
  probabilisticInputErrors,
  type ProbabilisticOptions,
  type ProbabilisticResult,
  type ProbabilisticSuccess,
  type ProbabilisticRunInfo,
  type MethodProbabilistic,
} from "./run";
export type { FosmResult, FosmContribution } from "./fosm";
export type { FsSummary, Histogram } from "./statistics";
export { betaLognormalOf, betaNormalOf } from "./statistics";
export { normalCdf, normalQuantile } from "./normal";
export {
  MAX_SAMPLES,
  MIN_SAMPLES,
  distributionSchema,
  varySchema,
  probabilisticSettingsSchema,
  type Distribution,
  type Vary,
  type Sampling,
  type ProbabilisticMode,
  type ProbabilisticSettings,
} from "./schema";
