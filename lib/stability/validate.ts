/**
 * validateSection: the one entry point that checks a section document (docs/engine.md §1,
 * docs/engine-io.md "Errors"). It reports every problem found, each with a code, a path such as
 * `regions[2].points[4]`, a message saying what is wrong and how to fix it and, where it
 * has one, the location in metres. Errors block a run; warnings do not.
 */
import { DEFAULT_GAMMA_W } from "./defaults";
import { deriveGround, type GroundLine } from "./ground";
import type { Issue } from "./issues";
import { lenientSectionDocumentSchema, sectionDocumentSchema, type SectionDocument } from "./schema";
import { sectionRings } from "./prepare";
import { checkAnalysis } from "./validate-analysis";
import { checkMaterials } from "./validate-materials";
import { checkStagedMaterials } from "./validate-staged";
import { checkRegionLayout, checkRegionMaterials, cleanRegions } from "./validate-regions";
import { checkLoads, checkWater } from "./validate-water";
import { fromZodIssues } from "./zod-issues";

export type { Issue };

/** Outcome of validation: the cleaned section, or every error; warnings either way. */
export type ValidationResult =
  { ok: true; section: SectionDocument; warnings: Issue[] } | { ok: false; errors: Issue[]; warnings: Issue[] };

/**
 * Checks a section document of unknown shape.
 * @param doc parsed JSON (anything)
 * @returns the cleaned section (closing points dropped, vertices within 1 mm snapped) when valid
 */
export function validateSection(doc: unknown): ValidationResult {
  const parsed = lenientSectionDocumentSchema.safeParse(doc);
  if (!parsed.success) return { ok: false, errors: fromZodIssues(parsed.error.issues), warnings: [] };
  const errors: Issue[] = [];
  const warnings: Issue[] = [];
  const src = parsed.data;
  const gammaW = src.water?.gammaW ?? DEFAULT_GAMMA_W;
  checkMaterials(src.materials, gammaW, errors, warnings);
  const polygonErrors: Issue[] = [];
  const regions = cleanRegions(src.regions, polygonErrors, warnings);
  errors.push(...polygonErrors);
  checkRegionMaterials(regions, new Set(src.materials.map((m) => m.id)), errors);
  // Once every material has passed checkMaterials, γ is present where the strict schema needs it.
  const section = { ...src, regions } as SectionDocument;
  let ground: GroundLine | null = null;
  // Overlaps and voids can only be found between simple polygons.
  if (polygonErrors.length === 0) {
    const table = checkRegionLayout(sectionRings(section), errors);
    if (table) ground = deriveGround(table);
  }
  let xmin = Infinity;
  let xmax = -Infinity;
  for (const r of regions)
    for (const [x] of r.points) {
      xmin = Math.min(xmin, x);
      xmax = Math.max(xmax, x);
    }
  checkWater(src.water, xmin, xmax, errors, warnings);
  checkLoads(src.loads, xmin, xmax, errors, warnings);
  checkAnalysis(src.analysis, src.water, errors.length === 0 ? ground : null, errors, warnings);
  checkStagedMaterials(src, src.analysis, errors, warnings);
  if (errors.length === 0 && !sectionDocumentSchema.safeParse(section).success) {
    errors.push({
      code: "invalid-document",
      path: "",
      message: "The section does not match the document format after cleaning; please report this.",
    });
  }
  if (errors.length > 0) return { ok: false, errors, warnings };
  return { ok: true, section, warnings };
}
