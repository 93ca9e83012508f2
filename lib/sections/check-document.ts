import { validateSection, type SectionDocument, type Issue } from "../stability";
import { ApiError } from "../api/errors";

/**
 * Validates a section document with the engine's own rules before it is stored.
 * Answers 400 with one field per problem, keyed by its place in the document.
 */
export function requireValidSection(raw: unknown): { document: SectionDocument; warnings: Issue[] } {
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
