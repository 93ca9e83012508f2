export * from "./lab-input";
export * from "./least-squares";
export * from "./direct-shear";
export * from "./triaxial-cu";
export * from "./undrained-strength";
export * from "./compaction";
export * from "./atterberg";
export * from "./schemas";
