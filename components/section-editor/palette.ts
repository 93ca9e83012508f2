/**
 * Canvas colours. The page colours are Scarpline's own (paper, ink, clay); water, issue and
 * fallback material colours come from a colour-blind-safe set, and issue markers also
 * differ in shape (solid ring for errors, dashed for warnings) so colour is never the only cue.
 */
export const CANVAS_COLORS = {
  paper: "#fffdf8",
  axisBand: "#f6f4ef",
  ink: "#1f1d1a",
  inkSoft: "#4a4640",
  inkFaint: "#66605a",
  grid: "#e8e3d8",
  gridStrong: "#d9d3c7",
  accent: "#b5562b",
  accentSoft: "#f4dccb",
  waterLine: "#0072b2",
  pondFill: "#56b4e9",
  error: "#a3282c",
  warning: "#c98a00",
  unknownMaterial: "#bdb6aa",
} as const;

/** Regions are filled at this opacity so the grid and outlines show through. */
export const REGION_FILL_OPACITY = 0.55;
export const POND_FILL_OPACITY = 0.35;
