/**
 * Keeping a sweep that ran in the browser: a queue worker runs the whole sweep again from the same
 * settings (lib/jobs/design-sweep-job.ts) and the study keeps the worker's points; the answer says
 * where the browser's differed. A point without an FS, or with a doctored one, is never kept as sent.
 */
import { ENGINE_VERSION } from "@/lib/stability";
import type { StoredSweep } from "./sweep-results";
import { compareSweepPoints } from "./compare-sweep";
import type { PreviewCheck } from "@/lib/runs/record/compare-preview";

export interface KeptSweep {
  sweep: StoredSweep;
  check: PreviewCheck;
}

/** The comparison of the browser's sweep with the server's own run of it. */
export function checkBrowserSweep(sent: StoredSweep, server: StoredSweep): KeptSweep {
  const check = compareSweepPoints(sent, { points: server.points, engineVersion: ENGINE_VERSION });
  return { sweep: server, check };
}
