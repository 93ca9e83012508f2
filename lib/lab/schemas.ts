import { z } from "zod";

/**
 * zod schemas for the lab test sets the server stores. They check shape and sign only; the derive
 * functions repeat the checks with row-numbered messages and add the physical ones (σ3 − u > 0 …).
 * zod 4's z.number() already refuses NaN and ±Infinity.
 */

const rowRef = {
  id: z.string().min(1).max(100).optional(),
  specimen: z.string().max(100).optional(),
};
const kPa = z.number();
const positive = z.number().positive();
const nonNegative = z.number().nonnegative();

export const directShearTestSchema = z.object({ ...rowRef, normalStress: positive, shearStress: positive });
export const directShearInputSchema = z.object({
  tests: z.array(directShearTestSchema).min(2).max(200),
  zeroCohesion: z.boolean().optional(),
});

export const triaxialCuSpecimenSchema = z.object({
  ...rowRef,
  cellPressure: nonNegative,
  deviatorStress: positive,
  porePressure: kPa,
});
export const triaxialCuInputSchema = z.object({
  specimens: z.array(triaxialCuSpecimenSchema).min(2).max(200),
  space: z.enum(["p-q", "s-t"]),
  backPressure: nonNegative.optional(),
});

export const undrainedTestSchema = z.object({
  ...rowRef,
  depth: nonNegative.optional(),
  elevation: z.number().optional(),
  deviatorStress: positive.optional(),
  su: positive.optional(),
});
export const undrainedStrengthInputSchema = z
  .object({
    source: z.enum(["uu", "vane"]),
    tests: z.array(undrainedTestSchema).min(1).max(500),
    model: z.enum(["constant", "linear"]),
    groundElevation: z.number().optional(),
    datumElevation: z.number().optional(),
    vaneCorrectionFactor: positive.optional(),
    vanePlasticityIndex: positive.optional(),
  })
  .superRefine((input, ctx) => {
    const field = input.source === "uu" ? "deviatorStress" : "su";
    input.tests.forEach((t, i) => {
      if (t[field] === undefined)
        ctx.addIssue({
          code: "custom",
          path: ["tests", i, field],
          message: `${field} is required for ${input.source} tests`,
        });
    });
  });

export const compactionPointSchema = z
  .object({
    ...rowRef,
    moistureContent: nonNegative,
    dryDensity: positive.optional(),
    bulkDensity: positive.optional(),
  })
  .refine((p) => p.dryDensity !== undefined || p.bulkDensity !== undefined, {
    message: "dry density or bulk density is needed",
    path: ["dryDensity"],
  });
export const compactionInputSchema = z.object({
  points: z.array(compactionPointSchema).min(3).max(100),
  specificGravity: z.number().min(2).max(3.2).optional(),
  acceptancePercent: z.number().gt(0).lt(100).optional(),
});

export const atterbergInputSchema = z.object({
  ...rowRef,
  liquidLimit: positive,
  plasticLimit: nonNegative.optional(),
  waterContent: nonNegative.optional(),
  nonPlastic: z.boolean().optional(),
});

export const permeabilityReadingSchema = z.object({
  ...rowRef,
  head: positive,
  headEnd: positive.optional(),
  time: positive,
  volume: positive.optional(),
});
export const permeabilityInputSchema = z
  .object({
    method: z.enum(["constant-head", "falling-head"]),
    length: positive,
    diameter: positive,
    standpipeDiameter: positive.optional(),
    readings: z.array(permeabilityReadingSchema).min(1).max(200),
  })
  .superRefine((input, ctx) => {
    const field = input.method === "falling-head" ? "headEnd" : "volume";
    if (input.method === "falling-head" && input.standpipeDiameter === undefined)
      ctx.addIssue({
        code: "custom",
        path: ["standpipeDiameter"],
        message: "a falling-head test needs the standpipe diameter",
      });
    input.readings.forEach((r, i) => {
      if (r[field] === undefined)
        ctx.addIssue({
          code: "custom",
          path: ["readings", i, field],
          message: `${field} is required for ${input.method} tests`,
        });
    });
  });

export type DirectShearInputData = z.infer<typeof directShearInputSchema>;
export type TriaxialCuInputData = z.infer<typeof triaxialCuInputSchema>;
export type UndrainedStrengthInputData = z.infer<typeof undrainedStrengthInputSchema>;
export type CompactionInputData = z.infer<typeof compactionInputSchema>;
export type AtterbergInputData = z.infer<typeof atterbergInputSchema>;
export type PermeabilityInputData = z.infer<typeof permeabilityInputSchema>;
