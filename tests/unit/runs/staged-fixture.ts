/** A small staged-drawdown search on the staged embankment fixture, shared by the staged-view tests. */
import { readFileSync } from "node:fs";
import path from "node:path";
import {
  analyzeCircle,
  runGridSearch,
  type GridSearchSuccess,
  type SectionDocument,
  type SliceRow,
} from "@/lib/stability";

export function stagedEmbankment(): SectionDocument {
  const file = path.resolve(__dirname, "../../fixtures/sections/drawdown-staged-embankment.json");
  return JSON.parse(readFileSync(file, "utf8")) as SectionDocument;
}

let cached: {
  doc: SectionDocument;
  result: GridSearchSuccess;
  slices: Record<"bishop" | "fellenius", SliceRow[]>;
} | null = null;

/** The fixture on a coarse 6 × 5 grid of centres, 5 tangent levels, no refinement. */
export function smallStagedRun() {
  if (cached) return cached;
  const doc = stagedEmbankment();
  doc.analysis = {
    ...doc.analysis,
    grid: { x1: 15, y1: 25, x2: 45, y2: 45, nx: 6, ny: 5 },
    radii: { tangentY1: 8, tangentY2: 1, n: 5 },
  };
  const result = runGridSearch(doc);
  if (!result.ok) throw new Error("staged fixture search failed");
  const slices = { bishop: [] as SliceRow[], fellenius: [] as SliceRow[] };
  for (const m of ["bishop", "fellenius"] as const) {
    const c = result.results[m];
    const one = c ? analyzeCircle(doc, c.circle) : null;
    if (one?.ok) slices[m] = one.slices;
  }
  cached = { doc, result, slices };
  return cached;
}
