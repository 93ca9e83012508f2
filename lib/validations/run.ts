import { z } from "zod";
import { runSetupSchema } from "@/lib/analysis/run-setup";
import { searchResultSchema } from "@/lib/runs/record/result-schema";

export const createRunSchema = z.object({
  sectionId: z.number().int().positive(),
  sectionVersion: z.number().int().positive(),
  title: z.string().trim().min(3, "At least 3 characters.").max(200, "At most 200 characters."),
  setup: runSetupSchema,
  /** The browser's own search: a preview the server compares with its search, never stored. */
  result: searchResultSchema.optional(),
  revisesRunId: z.number().int().positive().optional(),
});
