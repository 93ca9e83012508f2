/**
 * The shape of a grid-search result as the browser sends it with a save: a preview that the
 * server compares with its own search (compare-preview.ts) and never stores. Checked for shape
 * and size so a malformed or huge body is refused.
 */
import { z } from "zod";

const finite = z.number();
const point = z.tuple([finite, finite]);
const circle = z.object({ xc: finite, yc: finite, r: finite.positive() });
const circleFs = z.object({
  fs: finite.positive(),
  circle,
  entry: point,
  exit: point,
  direction: z.enum(["left", "right"]),
});
const fsMap = z.object({
  nx: z.number().int().positive(),
  ny: z.number().int().positive(),
  xs: z.array(finite).max(1000),
  ys: z.array(finite).max(1000),
  values: z.array(finite.nullable()).max(40000),
});

export const searchResultSchema = z.object({
  ok: z.literal(true),
  engineVersion: z.string().max(40),
  case: z.string().max(20),
  methods: z
    .array(z.enum(["bishop", "fellenius"]))
    .min(1)
    .max(2),
  ordinaryForm: z.string().max(30),
  results: z.object({ bishop: circleFs.nullable().optional(), fellenius: circleFs.nullable().optional() }),
  fsMap: z.object({ bishop: fsMap.optional(), fellenius: fsMap.optional() }),
  lowest: z.object({ bishop: z.array(circleFs).max(100).optional(), fellenius: z.array(circleFs).max(100).optional() }),
  circles: z.object({
    tried: z.number().int().nonnegative(),
    valid: z.number().int().nonnegative(),
    rejected: z
      .record(z.string().max(40), z.number().int().nonnegative())
      .refine((r) => Object.keys(r).length <= 20, "At most 20 kinds of rejected circle."),
  }),
  warnings: z.array(z.object({ code: z.string().max(60), message: z.string().max(500) })).max(200),
  cancelled: z.literal(false, { error: "A cancelled search cannot be saved; run it to the end." }),
});

export type StoredSearchResult = z.infer<typeof searchResultSchema>;
