/**
 * What live mode searches: the run set-up of the section's last kept run (its grid, radii,
 * methods and loading condition), or an automatic one for the downstream face, applied to the
 * drawing as it is under the pointer. The document is built by the same documentForRun the
 * server uses when a run is kept, so a live FS and the FS of a full run of the same state are
 * the same number (the engine is deterministic; docs/engine.md §5).
 */
import { suggestGrid } from "@/lib/analysis/auto-grid";
import { directionForFace } from "@/lib/analysis/face";
import { loadingCondition, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import { documentForRun, type RunSetup } from "@/lib/analysis/run-setup";
import { searchCircleCount } from "@/lib/runs/record/limits";
import { storeDrawnWater } from "@/lib/sections/water-condition-edits";
import { findWaterCondition, pickWaterCondition } from "@/lib/sections/water-conditions";
import type { SectionDocument } from "@/lib/stability";

/** The set-up a new run form starts from: steady seepage, downstream face, both methods, the automatic grid. */
export function automaticSetup(doc: SectionDocument, condition: LoadingConditionKey = "steady-seepage"): RunSetup {
  const face = "downstream";
  const g = suggestGrid(doc, directionForFace(doc, face));
  return {
    condition,
    waterCondition: pickWaterCondition(doc, condition).id,
    face,
    methods: ["bishop", "fellenius"],
    slices: 50,
    ordinaryForm: "classical",
    grid: g.grid,
    radii: g.radii,
    refine: true,
    drawdownMethod: "effective",
    requiredFs: loadingCondition(condition).requiredFs,
  };
}

export interface LiveSetup {
  setup: RunSetup;
  /** Where the search set-up came from, said beside the live result. */
  source: "last-run" | "automatic";
}

/** The last run's set-up when there is one, else the automatic one. */
export function liveSetupFor(doc: SectionDocument, lastRun: RunSetup | null | undefined): LiveSetup {
  return lastRun ? { setup: lastRun, source: "last-run" } : { setup: automaticSetup(doc), source: "automatic" };
}

/**
 * The set-up of a live search on the water the user is drawing: the engineer drags the phreatic
 * line they see, so that condition is the one analysed (a full run of the kept state names it).
 */
export function setupOnWater(section: SectionDocument, setup: RunSetup, activeWater: string): RunSetup {
  const water = findWaterCondition(section, activeWater) ? activeWater : undefined;
  return { ...setup, waterCondition: water };
}

/**
 * The section a live state would be kept as: the stored section with the drawn (shown) water put
 * back into its condition, exactly as the editor commits an edit.
 */
export function keptSection(stored: SectionDocument, shown: SectionDocument, activeWater: string): SectionDocument {
  return storeDrawnWater(stored, shown, activeWater);
}

/** The engine document of a live search: what a run with this set-up would analyse on the kept state. */
export function liveDocument(section: SectionDocument, setup: RunSetup, activeWater: string): SectionDocument {
  return documentForRun(section, setupOnWater(section, setup, activeWater));
}

/** Circles one live search tries: centres × radii (refinement adds a few more around the minimum). */
export function liveCircleCount(setup: RunSetup): number {
  return searchCircleCount(setup.grid, setup.radii);
}
