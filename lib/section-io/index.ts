export * from "./section-types";
export * from "./csv-read";
export * from "./csv-write";
export * from "./geometry-csv";
export * from "./phreatic-csv";
export * from "./materials-csv";
export * from "./csv-templates";
export * from "./detect";
