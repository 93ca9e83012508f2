/** Public API of the stability engine: re-exports only. */
export * from "./schema";
export { ENGINE_VERSION } from "./version";
export type { Issue, EngineWarning } from "./issues";
export { validateSection, type ValidationResult } from "./validate";
export {
  resolveAnalysis,
  DEFAULT_SLICES,
  DEFAULT_GAMMA_W,
  DEFAULT_LOWEST_COUNT,
  MAX_SLICES,
  type ResolvedAnalysis,
} from "./defaults";
export { runGridSearch, type GridSearchOptions, type GridSearchResult, type GridSearchSuccess } from "./grid-search";
export { analyzeCircle, type CircleResult, type CircleSuccess, type SliceRow } from "./analyze-circle";
export type { Circle, CircleFs, FsMap, EngineFailure, MethodRecord } from "./results";
export {
  RIGOROUS_METHODS,
  type XY,
  type IntersliceForce,
  type RigorousSlice,
  type RigorousWarning,
  type RigorousWarningCode,
  type RigorousFs,
  type RigorousRecord,
  type LambdaRecord,
  type AnalysisFsRecord,
  type MethodReason,
  type SurfaceSliceRow,
  type SurfaceSuccess,
  type SurfaceSearchProgress,
} from "./rigorous-types";
export { analyzeSurface, type SurfaceResult } from "./surfaces/analyze-surface";
export { runSurfaceSearch, type SurfaceSearchOptions } from "./surfaces/search-surfaces";
export { sectionGround } from "./prepare";
export type { StageFs, SliceStage } from "./drawdown/staged-report";
export {
  threeStageStrength,
  twoStageStrength,
  threeStageDetail,
  consolidationRatio,
  failureRatio,
  kc1Intercept,
  kc1Slope,
  type StageTwoDetail,
} from "./drawdown/staged-strength";
export { REASONS } from "./status";
export { infiniteSlopeFactor, infiniteSlopeUndrained, type InfiniteSlopeInput } from "./infinite-slope";
export {
  computeFilterSeepage,
  kozenyY0,
  criticalGradient,
  type SeepageInput,
  type SeepageResult,
  type SeepageConstruction,
  type SeepageLimit,
  type PipingCheck,
  type SeepageFlow,
} from "./seepage";
export * from "./probabilistic";
