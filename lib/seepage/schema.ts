/**
 * The seepage keys of the section document (docs/seepage.md; the contract in docs/engine-io.md §2)
 * as zod schemas. Only what a seepage run reads is checked here: strengths and the stability
 * analysis are the engine's business, so other keys pass through untouched.
 */
import { z } from "zod";

const LIMIT = 1e6;
const coordinate = z.number().min(-LIMIT).max(LIMIT);
export const seepagePointSchema = z.tuple([coordinate, coordinate]);

export const seepageMaterialSchema = z
  .object({
    id: z.string().min(1, "material id must not be empty"),
    model: z.string(),
    /** Saturated horizontal conductivity (m/s). */
    k: z.number().positive("k must be a conductivity above 0 m/s").max(1).optional(),
    /** kv / kh; default 1. */
    kRatio: z.number().positive("kRatio must be above 0").max(1e6).optional(),
    gamma: z.number().optional(),
    gammaSat: z.number().optional(),
  })
  .loose();

export const seepageRegionSchema = z
  .object({
    material: z.string(),
    points: z.array(seepagePointSchema).min(3, "a region needs at least 3 points"),
  })
  .loose();

export const poolSchema = z.object({ side: z.enum(["left", "right"]), level: coordinate });

export const seepageSettingsSchema = z.object({
  pools: z.array(poolSchema).max(2).optional(),
  drains: z.array(z.array(seepagePointSchema).min(2, "a drain needs at least 2 points")).optional(),
  /** Target element size (m); default from the section's area. */
  meshSize: z.number().positive("meshSize must be above 0 m").max(LIMIT).optional(),
  probes: z.array(seepagePointSchema).optional(),
  /** Crest length (m) for the total seepage. */
  crestLength: z.number().positive().max(LIMIT).optional(),
  /** Equal head drops of the drawn flow net; default 12. */
  headDrops: z.number().int().min(2).max(100).optional(),
  /** Ids of materials that pass no water here, as if impenetrable (a base taken as tight, say). */
  noFlow: z.array(z.string()).max(100).optional(),
});

export const seepageDocumentSchema = z
  .object({
    version: z.union([z.literal(1), z.literal(2)]).optional(),
    materials: z.array(seepageMaterialSchema).min(1, "at least one material is needed"),
    regions: z.array(seepageRegionSchema).min(1, "at least one region is needed"),
    seepage: seepageSettingsSchema,
    water: z
      .object({ gammaW: z.number().positive().max(100).optional() })
      .loose()
      .optional(),
  })
  .loose();

export type SeepageDocument = z.infer<typeof seepageDocumentSchema>;
export type SeepageSettings = z.infer<typeof seepageSettingsSchema>;
