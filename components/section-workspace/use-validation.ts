"use client";

import { useDeferredValue, useMemo } from "react";
import { validateSection, type Issue, type SectionDocument } from "@/lib/stability";
import { checkWaterConditions } from "@/lib/sections/check-water-conditions";

/** The engine's validation of the working document and its water conditions, recomputed as the drawing changes. */
export function useValidation(doc: SectionDocument): { errors: Issue[]; warnings: Issue[] } {
  const deferred = useDeferredValue(doc);
  return useMemo(() => {
    const v = validateSection(deferred);
    if (!v.ok) return { errors: v.errors, warnings: v.warnings };
    return { errors: checkWaterConditions(deferred).errors, warnings: v.warnings };
  }, [deferred]);
}
