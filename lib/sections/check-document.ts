import { validateSection, type SectionDocument, type Issue } from "../stability";
import { ApiError } from "../api/errors";
import { sectionLimitErrors } from "../validations/section-limits";

/**
 * Validates a section document with the engine's own rules before it is stored, within the sizes
 * of lib/validations/section-limits.ts.
 * Answers 400 with one field per problem, keyed by its place in the document.
 */
export function requireValidSection(raw: unknown): { document: SectionDocument; warnings: Issue[] } {
  // Sizes first: an oversized document is refused before the engine spends time on its geometry.
  const tooLarge = sectionLimitErrors(raw);
  if (tooLarge) {
    const first = Object.values(tooLarge)[0][0];
    throw new ApiError(400, "section_too_large", `The section is larger than Scarpline accepts: ${first}`, tooLarge);
  }
  const result = validateSection(raw);
  if (!result.ok) {
    const fields: Record<string, string[]> = {};
    for (const issue of result.errors) (fields[`document.${issue.path || "_"}`] ??= []).push(issue.message);
    throw new ApiError(
      400,
      "invalid_section",
      `The section has ${result.errors.length} problem${result.errors.length === 1 ? "" : "s"}; nothing was saved.`,
      fields,
    );
  }
  return { document: result.section, warnings: result.warnings };
}
