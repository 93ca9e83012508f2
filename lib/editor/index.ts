/** Pure logic of the section editor (no React): re-exports only. */
export * from "./view-transform";
export * from "./snapping";
export * from "./refs";
export * from "./hit-testing";
export * from "./document-edits";
export * from "./ground-surface";
export * from "./ponded-water";
export * from "./reservoir-level";
export * from "./history";
export * from "./issue-paths";
export * from "./bounds";
export * from "./drafts";
export * from "./move-parts";
export * from "./keyboard-selection";
