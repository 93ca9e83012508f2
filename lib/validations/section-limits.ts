import { z } from "zod";

/**
 * Sizes a real section never reaches. An embankment-dam section is drawn with tens of regions of tens of
 * points each, a handful of materials and a phreatic line of a few dozen points (common practice, from
 * memory), though a surveyed ground can carry thousands of points (a 200 m survey at 5 cm is 4,000); the limits
 * leave room for that and keep one save's checking well under a second (near-linear validation).
 */
export const SECTION_LIMITS = {
  regions: 200,
  pointsPerRegion: 5000,
  pointsInAllRegions: 10000,
  materials: 100,
  phreaticPoints: 1000,
  surcharges: 50,
  waterConditions: 20,
} as const;

const most = (max: number, what: string) =>
  z.array(z.unknown()).max(max, `At most ${max} ${what}; a real section has far fewer.`);

/**
 * Only the sizes of a section document's lists; their contents are the engine's to check (validateSection).
 * Anything not shaped like the document is let through here so the engine reports it in its own words.
 */
export const sectionLimitsSchema = z
  .object({
    regions: z
      .array(z.object({ points: most(SECTION_LIMITS.pointsPerRegion, "points in one region").optional() }).loose())
      .max(SECTION_LIMITS.regions, `At most ${SECTION_LIMITS.regions} regions; a real section has far fewer.`)
      .optional(),
    materials: most(SECTION_LIMITS.materials, "materials").optional(),
    water: z.object({ phreatic: most(SECTION_LIMITS.phreaticPoints, "phreatic line points").optional() }).loose(),
    loads: z.object({ surcharges: most(SECTION_LIMITS.surcharges, "surcharges").optional() }).loose(),
    waterConditions: z
      .array(
        z
          .object({
            water: z
              .object({ phreatic: most(SECTION_LIMITS.phreaticPoints, "phreatic line points").optional() })
              .loose(),
          })
          .loose(),
      )
      .max(SECTION_LIMITS.waterConditions, `At most ${SECTION_LIMITS.waterConditions} water conditions.`),
  })
  .partial()
  .loose()
  .superRefine((doc, ctx) => {
    const total = (doc.regions ?? []).reduce((n, r) => n + (Array.isArray(r.points) ? r.points.length : 0), 0);
    if (total > SECTION_LIMITS.pointsInAllRegions) {
      ctx.addIssue({
        code: "custom",
        path: ["regions"],
        message: `The regions have ${total} points together; at most ${SECTION_LIMITS.pointsInAllRegions} are taken.`,
      });
    }
  });

/** The limits broken by a document, keyed "document.<path>" like every other section field error. */
export function sectionLimitErrors(raw: unknown): Record<string, string[]> | null {
  const parsed = sectionLimitsSchema.safeParse(raw);
  if (parsed.success) return null;
  const fields: Record<string, string[]> = {};
  for (const issue of parsed.error.issues) {
    if (issue.code !== "too_big" && issue.code !== "custom") continue;
    (fields[["document", ...issue.path].join(".")] ??= []).push(issue.message);
  }
  return Object.keys(fields).length ? fields : null;
}
