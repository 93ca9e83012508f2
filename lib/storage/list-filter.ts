import { z } from "zod";
import { ApiError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/handler";
import type { DocumentFilter } from "@/lib/documents/types";

const optionalId = (what: string) =>
  z
    .string()
    .regex(/^[1-9]\d{0,9}$/, `${what} must be a positive whole number.`)
    .transform(Number)
    .optional();

const listQuerySchema = z
  .object({ sectionId: optionalId("sectionId"), materialId: optionalId("materialId") })
  .refine((q) => q.sectionId === undefined || q.materialId === undefined, {
    path: ["materialId"],
    message: "Filter by sectionId or by materialId, not both.",
  });

/** Reads `?sectionId=` or `?materialId=` from a list request; none means every document of the project. */
export function readListFilter(url: string): DocumentFilter {
  const params = new URL(url).searchParams;
  const parsed = listQuerySchema.safeParse({
    sectionId: params.get("sectionId") ?? undefined,
    materialId: params.get("materialId") ?? undefined,
  });
  if (!parsed.success)
    throw new ApiError(400, "invalid_input", "The list filter is not valid.", fieldErrors(parsed.error));
  return parsed.data;
}
