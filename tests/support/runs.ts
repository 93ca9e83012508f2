import { runGridSearch, type SectionDocument } from "@/lib/stability";
import { documentForRun, type RunSetup } from "@/lib/analysis/run-setup";
import { directionForFace } from "@/lib/analysis/face";
import { suggestGrid } from "@/lib/analysis/auto-grid";

/** A small, quick set-up for a face of a section (the grid placed as the app places it). */
export function quickSetup(
  doc: SectionDocument,
  face: "upstream" | "downstream",
  overrides: Partial<RunSetup> = {},
): RunSetup {
  const g = suggestGrid(doc, directionForFace(doc, face), { nx: 8, ny: 8, nr: 6 });
  return {
    condition: face === "downstream" ? "steady-seepage" : "drawdown-storage",
    face,
    methods: ["bishop", "fellenius"],
    slices: 40,
    ordinaryForm: "classical",
    grid: g.grid,
    radii: g.radii,
    refine: false,
    drawdownMethod: "effective",
    requiredFs: face === "downstream" ? 1.5 : 1.3,
    ...(face === "upstream" ? { drawdownFrom: 16, drawdownTo: 8 } : {}),
    ...overrides,
  };
}

/** Runs the search as the browser would, returning the body the run route expects. */
export function searchFor(doc: SectionDocument, setup: RunSetup) {
  const result = runGridSearch(documentForRun(doc, setup));
  if (!result.ok) throw new Error(`search failed: ${JSON.stringify(result.errors)}`);
  return result;
}
