"use client";

import { useMemo, useState } from "react";
import type { RigorousRunPart } from "@/lib/runs/record/rigorous-part";
import { solutionChoices } from "@/lib/runs/view/surface-overlay";

/** The rigorous solutions of a run and the one the reader is looking at (the first by default). */
export function useSolutionChoice(part: RigorousRunPart | undefined) {
  const choices = useMemo(() => solutionChoices(part), [part]);
  const [wanted, setChosen] = useState<string | null>(null);
  const current = choices.find((c) => c.key === wanted) ?? choices[0] ?? null;
  return { choices, chosen: current?.key ?? null, setChosen, current };
}
