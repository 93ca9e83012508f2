"use client";

import { useDeferredValue, useMemo } from "react";
import { validateSection, type Issue, type SectionDocument } from "@/lib/stability";
import { issueInWords, placeNamesOf } from "@/lib/issue-words";
import { checkWaterConditions } from "@/lib/sections/check-water-conditions";

/** The engine's validation of the working document and its water conditions, recomputed as the drawing changes. */
export function useValidation(doc: SectionDocument): { errors: Issue[]; warnings: Issue[] } {
  const deferred = useDeferredValue(doc);
  return useMemo(() => {
    const v = validateSection(deferred);
    // The messages are read beside the panels, so they use the panels' numbering.
    const names = placeNamesOf(deferred);
    const words = (list: readonly Issue[]) => list.map((i) => issueInWords(i, names));
    if (!v.ok) return { errors: words(v.errors), warnings: words(v.warnings) };
    return { errors: words(checkWaterConditions(deferred).errors), warnings: words(v.warnings) };
  }, [deferred]);
}
