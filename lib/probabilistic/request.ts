/**
 * What the probabilistic panel submits, checked at the edge (zod) before anything is queued: the
 * sampling settings, each material's spread and the lowered pool's. Sample counts are bounded per
 * mode by the engine's own limits (MAX_SAMPLES), with a message naming both numbers.
 */
import { z } from "zod";
import {
  MAX_SAMPLES,
  MIN_SAMPLES,
  distributionSchema,
  probabilisticInputErrors,
  probabilisticSettingsSchema,
  varySchema,
  type Issue,
} from "@/lib/stability";

const modeSchema = probabilisticSettingsSchema.shape.mode.unwrap();
const samplingSchema = probabilisticSettingsSchema.shape.sampling.unwrap();

export const probabilisticRequestSchema = z
  .object({
    samples: z
      .number({ error: "Enter a whole number of samples." })
      .int("Enter a whole number of samples.")
      .min(MIN_SAMPLES, `At least ${MIN_SAMPLES} samples.`),
    seed: z
      .number({ error: "Enter a seed." })
      .int("The seed is a whole number.")
      .min(0, "The seed is 0 or more.")
      .max(0xffffffff, "The seed is at most 4294967295."),
    sampling: samplingSchema,
    mode: modeSchema,
    materials: z
      .record(z.string().min(1).max(60), varySchema)
      .refine((m) => Object.keys(m).length <= 100, "At most 100 materials."),
    level: distributionSchema.optional(),
  })
  .superRefine((r, ctx) => {
    const max = MAX_SAMPLES[r.mode];
    if (r.samples > max)
      ctx.addIssue({
        code: "custom",
        path: ["samples"],
        message:
          `${r.samples.toLocaleString("en-US")} samples is more than the ${max.toLocaleString("en-US")} ` +
          `a "${r.mode}" run may take` +
          (r.mode === "full-search" ? " (each sample is a whole search)." : "."),
      });
  });

export type ProbabilisticRequest = z.infer<typeof probabilisticRequestSchema>;

interface DocLike {
  [key: string]: unknown;
  materials: { id: string; [key: string]: unknown }[];
  analysis?: Record<string, unknown>;
}

/**
 * The run's frozen document with the request's spreads on its materials and the sampling settings
 * in analysis.probabilistic: the whole input of the engine's probabilistic run.
 * @throws Error naming a material the run does not have
 */
export function probabilisticDocument(document: unknown, r: ProbabilisticRequest): DocLike {
  const doc = document as DocLike;
  const ids = new Set(doc.materials.map((m) => m.id));
  const unknown = Object.keys(r.materials).filter((id) => !ids.has(id));
  if (unknown.length > 0) throw new UnknownMaterialError(unknown);
  return {
    ...doc,
    materials: doc.materials.map((m) => {
      const vary = r.materials[m.id];
      return vary && Object.keys(vary).length > 0 ? { ...m, vary } : m;
    }),
    analysis: {
      ...(doc.analysis ?? {}),
      probabilistic: {
        samples: r.samples,
        seed: r.seed,
        sampling: r.sampling,
        mode: r.mode,
        ...(r.level ? { level: r.level } : {}),
      },
    },
  };
}

export class UnknownMaterialError extends Error {
  constructor(readonly ids: string[]) {
    super(`This run has no material ${ids.map((i) => `'${i}'`).join(", ")}.`);
  }
}

/**
 * The engine's objections to a probabilistic document, keyed for the panel's fields:
 * `materials.<id>.<quantity>` for a material's spread, `level`, `samples`, or `_`.
 */
export function requestFieldErrors(doc: DocLike): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const e of probabilisticInputErrors(doc)) (fields[fieldKey(doc, e)] ??= []).push(e.message);
  return fields;
}

function fieldKey(doc: DocLike, e: Issue): string {
  const m = /^materials\[(\d+)\]\.vary\.(\w+)/.exec(e.path);
  if (m) return `materials.${doc.materials[Number(m[1])]?.id ?? m[1]}.${m[2]}`;
  if (e.path.startsWith("analysis.probabilistic.level")) return "level";
  if (e.path.startsWith("analysis.probabilistic.samples")) return "samples";
  return "_";
}
