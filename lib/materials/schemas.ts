import { z } from "zod";
import { MATERIAL_KEY_HINT, MATERIAL_KEY_PATTERN } from "./keys";
import { HEX_COLOR } from "./palette";
import { PARAMETER_KEYS, materialParametersSchema } from "./parameters";
import { LAB_TEST_KINDS } from "./lab-kinds";

/**
 * Request bodies of the materials and lab-test routes. Shapes only: engineering bounds are checked
 * by checkMaterialParameters, lab rows by checkAndDeriveLabTest, so their messages can say where.
 */

export const materialKeySchema = z.string().trim().regex(MATERIAL_KEY_PATTERN, MATERIAL_KEY_HINT);
const nameSchema = z.string().trim().min(1, "Give the material a name.").max(200, "At most 200 characters.");
const colorSchema = z.string().regex(HEX_COLOR, "Use a colour written as #RRGGBB.");
const notesSchema = z.string().trim().max(4000, "At most 4000 characters.");

export const createMaterialSchema = z.object({
  key: materialKeySchema,
  name: nameSchema,
  color: colorSchema.optional(),
  notes: notesSchema.default(""),
  parameters: materialParametersSchema,
});
export type CreateMaterialInput = z.infer<typeof createMaterialSchema>;

/** Which lab test set each parameter comes from; ids of `lab_test_sets`. */
export const parameterSourcesSchema = z.partialRecord(z.enum(PARAMETER_KEYS), z.number().int().positive());

export const updateMaterialSchema = z.object({
  name: nameSchema.optional(),
  color: colorSchema.optional(),
  notes: notesSchema.optional(),
  parameters: materialParametersSchema,
  /** New sources; parameters not named keep theirs while their value is unchanged. */
  sources: parameterSourcesSchema.optional(),
});
export type UpdateMaterialInput = z.infer<typeof updateMaterialSchema>;

/** A whole materials CSV (lib/section-io's format), about 2 000 rows at most. */
export const importMaterialsSchema = z.object({ csv: z.string().max(200_000, "The file is too large (over 200 kB).") });

export const createLabTestSchema = z.object({
  materialId: z.number().int().positive().nullable().default(null),
  kind: z.enum(LAB_TEST_KINDS),
  name: z
    .string()
    .trim()
    .min(1, "Give the test set a name, e.g. the borehole and depth.")
    .max(200, "At most 200 characters."),
  /** Checked against lib/lab's schema for `kind`. */
  data: z.unknown(),
});
export type CreateLabTestInput = z.infer<typeof createLabTestSchema>;
