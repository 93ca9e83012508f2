/**
 * Signing off a run whose factor of safety is below the required value. It is allowed, because a
 * failing case is sometimes kept on record on purpose, but never by accident: the reviewer states
 * why, and the status reads "signed off — below the required FS" wherever it is shown.
 */
import { verdictOf } from "@/lib/runs/view/verdict";

/** Shortest reason accepted: a few words, not a stray key press. */
export const MIN_BELOW_REQUIRED_REASON = 10;

export interface RunFsFacts {
  methods: readonly string[];
  fsBishop: number | null;
  fsFellenius: number | null;
  requiredFs: number;
}

/**
 * True when any method the run used falls short of the required FS (at the 3 decimals shown), or
 * gave no FS at all: a run meets the requirement only when every method it reports does.
 */
export function isBelowRequired(run: RunFsFacts): boolean {
  const used = (["bishop", "fellenius"] as const).filter((m) => run.methods.includes(m));
  if (used.length === 0) return true;
  return used.some((m) => verdictOf(m === "bishop" ? run.fsBishop : run.fsFellenius, run.requiredFs) !== "pass");
}

/** The lowest FS of the methods a run used, for the sentence that explains the status. */
export function governingFsOf(run: RunFsFacts): number | null {
  const values = (["bishop", "fellenius"] as const)
    .filter((m) => run.methods.includes(m))
    .map((m) => (m === "bishop" ? run.fsBishop : run.fsFellenius))
    .filter((v): v is number => v !== null && Number.isFinite(v));
  return values.length > 0 ? Math.min(...values) : null;
}
