/**
 * Runs a whole sweep through any executor (a pool of Web Workers in the browser, of worker
 * threads on the server): the planned jobs first, then the recommended pair rechecked under
 * every case. Progress counts jobs; cancelling stops handing out new ones.
 */
import type { EmbankmentParams } from "./parameters";
import { readSweep, type RequiredFs } from "./pick-ratio";
import type { SweepPoint } from "./run-job";
import { planRecheck, planSweep, type SweepJob, type SweepSettings } from "./sweep-plan";

export interface SweepProgress {
  done: number;
  total: number;
  phase: SweepJob["phase"];
}

export interface SweepRunOptions {
  params: EmbankmentParams;
  settings: SweepSettings;
  required: RequiredFs;
  /** Runs one job somewhere; several may be in flight at once, up to `concurrency`. */
  execute: (job: SweepJob) => Promise<SweepPoint>;
  concurrency: number;
  onProgress?: (p: SweepProgress) => void;
  isCancelled?: () => boolean;
}

export interface SweepRunOutcome {
  points: SweepPoint[];
  cancelled: boolean;
}

/** Runs jobs with at most `concurrency` in flight; results come back in the jobs' order. */
export async function runPooled(
  jobs: readonly SweepJob[],
  execute: (job: SweepJob) => Promise<SweepPoint>,
  concurrency: number,
  onDone: () => void,
  isCancelled: () => boolean,
): Promise<SweepPoint[] | null> {
  const results: (SweepPoint | undefined)[] = new Array(jobs.length);
  let next = 0;
  const lane = async () => {
    while (next < jobs.length && !isCancelled()) {
      const i = next++;
      results[i] = await execute(jobs[i]);
      onDone();
    }
  };
  await Promise.all(Array.from({ length: Math.max(1, Math.min(concurrency, jobs.length)) }, lane));
  return isCancelled() ? null : (results as SweepPoint[]);
}

export async function runWholeSweep(o: SweepRunOptions): Promise<SweepRunOutcome> {
  const cancelled = o.isCancelled ?? (() => false);
  const jobs = planSweep(o.params, o.settings);
  // The recheck adds one job per case; count it from the start so the bar never runs backwards.
  const total = jobs.length + 3;
  let done = 0;
  const tick = (phase: SweepJob["phase"]) => () => o.onProgress?.({ done: ++done, total, phase });
  const points = await runPooled(jobs, o.execute, o.concurrency, tick("sweep"), cancelled);
  if (!points) return { points: [], cancelled: true };
  const pair = readSweep(points, o.required).pair;
  if (!pair) {
    o.onProgress?.({ done: total, total, phase: "recheck" });
    return { points, cancelled: false };
  }
  const recheck = await runPooled(planRecheck(pair), o.execute, o.concurrency, tick("recheck"), cancelled);
  if (!recheck) return { points: [], cancelled: true };
  return { points: [...points, ...recheck], cancelled: false };
}
