import { z } from "zod";

/** The section document itself is checked by the engine's validateSection, not here. */
export const createSectionSchema = z.object({
  name: z.string().trim().min(2, "At least 2 characters.").max(200, "At most 200 characters."),
  description: z.string().trim().max(4000).default(""),
  document: z.unknown(),
  summary: z.string().trim().max(300).optional(),
});

export const saveSectionSchema = z.object({
  baseVersion: z.number().int().positive(),
  document: z.unknown(),
  summary: z.string().trim().max(300).optional(),
  name: z.string().trim().min(2).max(200).optional(),
  description: z.string().trim().max(4000).optional(),
});
