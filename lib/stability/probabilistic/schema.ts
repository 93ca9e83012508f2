/**
 * The probabilistic keys of a section document (docs/probabilistic.md):
 * `vary` on a material and `analysis.probabilistic`. They are read from the raw document here
 * rather than in ../schema.ts, so a deterministic run never depends on them.
 */
import { z } from "zod";

/** Samples allowed per mode. A critical-surface sample is one circle (tens of µs); a full-search
 * sample is a whole grid search (a typical 32,000-circle grid takes about 0.3 s), so 2,000 of them
 * already take about ten minutes on one core. */
export const MAX_SAMPLES = { "critical-surface": 100_000, "full-search": 2_000 } as const;
/** Fewer samples than this give no usable standard deviation or histogram. */
export const MIN_SAMPLES = 10;

const finite = z.number().min(-1e6).max(1e6);

/** One varied quantity: its mean is the material's own value; `sd` in the quantity's unit. */
export const distributionSchema = z
  .object({
    dist: z.enum(["normal", "lognormal"]),
    sd: z.number().min(0).max(1e6),
    min: finite.optional(),
    max: finite.optional(),
  })
  .strict();

/** Per-material variation: c′, φ′, su, γ, and the correlation coefficient between c′ and φ′. */
export const varySchema = z
  .object({
    c: distributionSchema.optional(),
    phi: distributionSchema.optional(),
    su: distributionSchema.optional(),
    gamma: distributionSchema.optional(),
    correlation: z.number().min(-0.99).max(0.99).optional(),
  })
  .strict();

export const samplingSchema = z.enum(["monte-carlo", "latin-hypercube"]);
export const probabilisticModeSchema = z.enum(["critical-surface", "full-search"]);

/** analysis.probabilistic; `level` varies the lowered pool of a drawdown (analysis.drawdown.to). */
export const probabilisticSettingsSchema = z
  .object({
    samples: z.number().int(),
    seed: z.number().int().min(0).max(0xffffffff),
    sampling: samplingSchema.optional(),
    mode: probabilisticModeSchema.optional(),
    level: distributionSchema.optional(),
  })
  .strict();

/** Only the parts of the raw document this module reads; everything else is the engine's. */
export const probabilisticDocumentSchema = z.looseObject({
  materials: z.array(z.looseObject({ vary: varySchema.optional() })),
  analysis: z.looseObject({ probabilistic: probabilisticSettingsSchema }),
});

export type Distribution = z.infer<typeof distributionSchema>;
export type Vary = z.infer<typeof varySchema>;
export type Sampling = z.infer<typeof samplingSchema>;
export type ProbabilisticMode = z.infer<typeof probabilisticModeSchema>;
export type ProbabilisticSettings = z.infer<typeof probabilisticSettingsSchema>;
