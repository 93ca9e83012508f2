/**
 * What a kept run stores, computed on the server: the analysed document, the server's whole
 * search (critical circles, FS map, lowest circles, counts, warnings), its slice tables, and how
 * the preview compared. Nothing the browser computed is stored.
 */
import { ApiError } from "@/lib/api/errors";
import {
  documentForRun,
  runSetupSchema,
  UnknownWaterConditionError,
  waterConditionForRun,
  type RunSetup,
} from "@/lib/analysis/run-setup";
import type { WaterCondition } from "@/lib/sections/water-conditions";
import {
  validateSection,
  type GridSearchSuccess,
  type Method,
  type SectionDocument,
  type SliceRow,
} from "@/lib/stability";
import type { PreviewCheck } from "./compare-preview";
import { refusalText } from "@/lib/runs/view/rigorous-text";
import { searchOnServer } from "./server-search";
import { userIssue } from "@/lib/runs/view/engine-issue-text";
import { withSeepageKeys, type SeepageSummary } from "@/lib/seepage-stability";
import { analyzeDrawnSurface, rigorousPart, surfaceRefusal, type RigorousRunPart } from "./rigorous-part";

export type StoredSliceTables = Partial<Record<Method, { slices: SliceRow[]; minMAlpha: number | null }>>;

/** The result JSON of a kept run: the server's search, the set-up it ran, and the preview's comparison. */
export type StoredRunResult = GridSearchSuccess & {
  setup: RunSetup;
  previewCheck: PreviewCheck;
  /** Water from a seepage solution: its q and mesh, for the run page and the review. */
  seepage?: SeepageSummary;
  /** Spencer and Morgenstern–Price on the critical circle and every method on a drawn surface, when asked. */
  rigorous?: RigorousRunPart;
};

export interface RunRecord {
  document: SectionDocument;
  result: StoredRunResult;
  sliceTables: StoredSliceTables;
  fsBishop: number | null;
  fsFellenius: number | null;
  /** The section's water condition the run analysed (its key and name as they stood in that version). */
  waterCondition: { id: string; name: string };
  /** Where the server searched (for the benchmark and the logs). */
  mode: "thread" | "in-process";
}

type EngineIssue = { code: string; path: string; message: string };

/** A 400 listing the engine's objections in the user's words (materials by name, plain text for known codes). */
const invalid = (message: string, errors: readonly EngineIssue[], section: SectionDocument) =>
  new ApiError(400, "invalid_section", message, {
    setup: errors.map((e) => {
      const issue = userIssue(e, section.materials);
      return `${issue.where}: ${issue.message}`;
    }),
  });

/**
 * Runs the whole search of a section version with a set-up on the server and builds the record
 * to keep. `compare` says how the preview (the browser's search, a sweep's point) differs from it.
 * Bad input is a 400; a search with no valid circle at all is a 422, and nothing is kept.
 */
export async function computeRunRecord(
  section: SectionDocument,
  rawSetup: RunSetup,
  compare: (server: GridSearchSuccess) => PreviewCheck,
): Promise<RunRecord> {
  // The shared schema carries the bound on the search's size (lib/runs/record/limits.ts).
  const setup = runSetupSchema.parse(rawSetup);
  const water = waterConditionOrRefuse(section, setup);
  const runDocument = documentForRun(section, setup, water);
  const valid = validateSection(runDocument);
  if (!valid.ok) throw invalid("The section and set-up do not validate.", valid.errors, section);
  // Water from seepage keeps the keys the engine's validation drops, so the frozen document solves again.
  const document = withSeepageKeys(runDocument, valid.section);
  const { record, mode } = await searchOnServer(document);
  if (!record.ok) throw invalid("The section and set-up do not validate.", record.errors, section);
  const { result, critical, seepage } = record;
  const sliceTables: StoredSliceTables = {};
  for (const method of result.methods) {
    const one = critical[method];
    if (one) sliceTables[method] = { slices: one.slices, minMAlpha: one.minMAlpha ?? null };
  }
  if (Object.keys(sliceTables).length === 0) {
    throw new ApiError(422, "no_result", "The search found no valid circle; there is nothing to keep.", {
      setup: ["No trial circle gave a factor of safety: check that the grid lies above the slope."],
    });
  }
  const surface = setup.surface ? drawnSurfaceOrRefuse(document, setup.surface) : null;
  const rigorous = rigorousPart(document, result, surface);
  const fsOf = (m: Method) => (result.methods.includes(m) ? (result.results[m]?.fs ?? null) : null);
  return {
    document,
    result: {
      ...result,
      setup,
      previewCheck: compare(result),
      ...(seepage ? { seepage } : {}),
      ...(rigorous ? { rigorous } : {}),
    },
    sliceTables,
    fsBishop: fsOf("bishop"),
    fsFellenius: fsOf("fellenius"),
    waterCondition: { id: water.id, name: water.name },
    mode,
  };
}

/** The drawn slip surface analysed; a surface the engine refuses is a 400 with its reason and place. */
function drawnSurfaceOrRefuse(section: SectionDocument, points: [number, number][]) {
  const surface = analyzeDrawnSurface(section, points);
  const refused = surface ? surfaceRefusal(surface) : null;
  if (!surface || refused) {
    const text = refused ? refusalText(refused) : "The drawn slip surface could not be analysed.";
    throw new ApiError(400, "invalid_surface", text, { "setup.surface": [text] });
  }
  return surface;
}

/** The water condition the set-up names (or its loading condition's usual one); 400 if the version lacks it. */
function waterConditionOrRefuse(section: SectionDocument, setup: RunSetup): WaterCondition {
  try {
    return waterConditionForRun(section, setup);
  } catch (err) {
    if (err instanceof UnknownWaterConditionError)
      throw new ApiError(400, "unknown_water_condition", err.message, { "setup.waterCondition": [err.message] });
    throw err;
  }
}
