/// <reference lib="webworker" />
/**
 * One lane of the browser sweep: runs the sweep jobs it is handed, one at a time, with the
 * same function the server's worker threads run (lib/design/run-job.ts).
 */
import { runSweepJob, type EmbankmentParams, type JobSettings, type SweepJob, type SweepPoint } from "@/lib/design";
import type { Material } from "@/lib/stability";

export interface SweepWorkerRequest {
  seq: number;
  params: EmbankmentParams;
  materials: Material[];
  job: SweepJob;
  settings: JobSettings;
}

export type SweepWorkerReply = { seq: number; point: SweepPoint } | { seq: number; error: string };

const ctx = self as unknown as DedicatedWorkerGlobalScope;

ctx.onmessage = (event: MessageEvent<SweepWorkerRequest>) => {
  const m = event.data;
  let reply: SweepWorkerReply;
  try {
    reply = { seq: m.seq, point: runSweepJob(m.params, m.materials, m.job, m.settings) };
  } catch (err) {
    reply = { seq: m.seq, error: err instanceof Error ? err.message : String(err) };
  }
  ctx.postMessage(reply);
};
