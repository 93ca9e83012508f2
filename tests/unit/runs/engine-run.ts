/** A small grid search on the three-material embankment fixture, shared by the run-view tests. */
import { readFileSync } from "node:fs";
import path from "node:path";
import {
  analyzeCircle,
  runGridSearch,
  type CircleSuccess,
  type GridSearchSuccess,
  type SectionDocument,
} from "@/lib/stability";

export function embankment(): SectionDocument {
  const file = path.resolve(__dirname, "../../fixtures/sections/three-material-embankment.json");
  return JSON.parse(readFileSync(file, "utf8")) as SectionDocument;
}

let cached: { doc: SectionDocument; result: GridSearchSuccess; bishop: CircleSuccess } | null = null;

/** The fixture searched on a coarse 8 × 6 grid without refinement, so the map holds the minimum exactly. */
export function smallRun() {
  if (cached) return cached;
  const doc = embankment();
  doc.analysis = {
    ...doc.analysis,
    grid: { x1: 55, y1: 25, x2: 85, y2: 45, nx: 8, ny: 6 },
    radii: { tangentY1: 10, tangentY2: 1, n: 6 },
    refine: false,
  };
  const result = runGridSearch(doc);
  if (!result.ok) throw new Error("fixture search failed");
  const crit = result.results.bishop!;
  const one = analyzeCircle(doc, crit.circle);
  if (!one.ok) throw new Error("fixture circle failed");
  cached = { doc, result, bishop: one };
  return cached;
}
