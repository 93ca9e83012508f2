import { validateSection, type SectionDocument, type Issue } from "@/lib/stability";
import { ApiError } from "@/lib/api/errors";
import { checkWaterConditions } from "./check-water-conditions";
import type { StoredSection } from "./water-conditions";
import { sectionLimitErrors } from "@/lib/validations/section-limits";
import { messageWords, placeNamesOf } from "@/lib/issue-words";
import { countOf } from "@/lib/format";

/**
 * Validates a section document with the engine's own rules, and its named water conditions, before
 * it is stored, within the sizes of lib/validations/section-limits.ts.
 * Answers 400 with one field per problem, keyed by its place in the document.
 */
export function requireValidSection(raw: unknown): { document: StoredSection; warnings: Issue[] } {
  // Sizes first: an oversized document is refused before the engine spends time on its geometry.
  const tooLarge = sectionLimitErrors(raw);
  if (tooLarge) {
    const first = Object.values(tooLarge)[0][0];
    throw new ApiError(400, "section_too_large", `The section is larger than Scarpline accepts: ${first}`, tooLarge);
  }
  const result = validateSection(raw);
  const water = result.ok ? checkWaterConditions(raw as SectionDocument) : { errors: [] };
  const errors = result.ok ? water.errors : result.errors;
  if (!result.ok || errors.length > 0) {
    const fields: Record<string, string[]> = {};
    const names = placeNamesOf(raw);
    for (const issue of errors)
      (fields[`document.${issue.path || "_"}`] ??= []).push(messageWords(issue.message, names));
    throw new ApiError(
      400,
      "invalid_section",
      `The section has ${countOf(errors.length, "problem")}; nothing was saved.`,
      fields,
    );
  }
  const document: StoredSection = water.conditions
    ? { ...result.section, waterConditions: water.conditions }
    : result.section;
  return { document, warnings: result.warnings };
}
