/**
 * Seepage settings of a section under one water condition (docs/seepage.md): what the engine's
 * section document does not carry. Stored per section and water condition (db migration 011).
 */
import { z } from "zod";

const LIMIT = 1e6;
const coordinate = z.number().min(-LIMIT, "too far from the origin").max(LIMIT, "too far from the origin");
const point = z.tuple([coordinate, coordinate]);

export const seepageSettingsInputSchema = z.object({
  /** Polylines held at atmospheric pressure: toe, blanket and chimney drains (m). */
  drains: z.array(z.array(point).min(2, "A drain needs at least 2 points.").max(200)).max(20).default([]),
  /** Target element size (m); blank lets the solver choose about 3,000 nodes. */
  meshSize: z.number().positive("The element size must be above 0 m.").max(1000).optional(),
  /** Crest length (m) for the total seepage along the dam. */
  crestLength: z.number().positive("The crest length must be above 0 m.").max(LIMIT).optional(),
  /** Equal head drops of the drawn flow net; default 12. */
  headDrops: z.number().int().min(2, "At least 2 head drops.").max(60, "At most 60 head drops.").optional(),
  /**
   * Free water against the side the water condition leaves dry (a tailwater at ground level at the
   * toe, say), so the foundation discharges there rather than through the section's far side.
   */
  tailwater: z.object({ side: z.enum(["left", "right"]), level: coordinate }).optional(),
  /** Pool levels set in the seepage view (typed or dragged), replacing the water condition's on that side (m). */
  pools: z.object({ left: coordinate.optional(), right: coordinate.optional() }).optional(),
});

export type SeepageSettingsInput = z.infer<typeof seepageSettingsInputSchema>;

export const EMPTY_SEEPAGE_SETTINGS: SeepageSettingsInput = { drains: [] };

/** k and kv/kh of a library material (m/s), keyed by the material's key (the section's material id). */
export interface MaterialConductivity {
  key: string;
  name: string;
  k?: number;
  kRatio?: number;
  /** The permeability test set k came from, if any. */
  sourceSetId?: number;
}
