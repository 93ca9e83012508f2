/**
 * Entry of a server worker thread (node:worker_threads). scripts/build-engine.mjs bundles it with
 * the engine into .engine/sweep-worker.mjs, which lib/design/thread-sweep.ts starts: the built app
 * keeps no TypeScript sources a thread could load.
 */
import { parentPort } from "node:worker_threads";
import { runSweepJob, type JobSettings, type SweepPoint } from "./run-job";
import type { EmbankmentParams } from "./parameters";
import type { Material } from "../stability";
import type { SweepJob } from "./sweep-plan";

export interface ThreadRequest {
  seq: number;
  params: EmbankmentParams;
  materials: Material[];
  job: SweepJob;
  settings: JobSettings;
}

export type ThreadReply = { seq: number; point: SweepPoint } | { seq: number; error: string };

parentPort?.on("message", (m: ThreadRequest) => {
  let reply: ThreadReply;
  try {
    reply = { seq: m.seq, point: runSweepJob(m.params, m.materials, m.job, m.settings) };
  } catch (err) {
    reply = { seq: m.seq, error: err instanceof Error ? err.message : String(err) };
  }
  parentPort?.postMessage(reply);
});
