"use client";

import { useDeferredValue, useMemo } from "react";
import { validateSection, type Issue, type SectionDocument } from "@/lib/stability";

/** The engine's validation of the working document, recomputed as the drawing changes. */
export function useValidation(doc: SectionDocument): { errors: Issue[]; warnings: Issue[] } {
  const deferred = useDeferredValue(doc);
  return useMemo(() => {
    const v = validateSection(deferred);
    return v.ok ? { errors: [], warnings: v.warnings } : { errors: v.errors, warnings: v.warnings };
  }, [deferred]);
}
