/** Public API of the design exploration modules (pure: no React, Next or database). */
export * from "./parameters";
export * from "./embankment-geometry";
export * from "./fill-quantities";
export * from "./phreatic-line";
export * from "./generate-embankment";
export * from "./sweep-plan";
export * from "./grid-follow";
export * from "./run-job";
export * from "./pick-ratio";
export * from "./sweep-runner";
export * from "./sweep-results";
export * from "./compaction-spec";
export * from "./form-values";
export * from "./case-styles";
export * from "./compare-sweep";
export * from "./fs-axis";
export * from "./piping-exit";
