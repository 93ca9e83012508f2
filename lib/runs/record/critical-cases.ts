/**
 * The critical case per loading condition: among runs of one condition, the lowest FS by the
 * governing method (Bishop where it was run, else the ordinary method). Pure; shared by lists.
 */
export interface RankableRun {
  id: number;
  loadingCondition: string;
  face: string;
  fsBishop: number | null;
  fsFellenius: number | null;
}

export function governingFs(run: Pick<RankableRun, "fsBishop" | "fsFellenius">): number | null {
  return run.fsBishop ?? run.fsFellenius;
}

/** Ids of the run with the lowest governing FS for each loading condition and face. */
export function criticalRunIds(runs: readonly RankableRun[]): Set<number> {
  const best = new Map<string, RankableRun>();
  for (const run of runs) {
    const fs = governingFs(run);
    if (fs === null) continue;
    const key = `${run.loadingCondition}|${run.face}`;
    const cur = best.get(key);
    if (!cur || fs < (governingFs(cur) ?? Infinity)) best.set(key, run);
  }
  return new Set([...best.values()].map((r) => r.id));
}
