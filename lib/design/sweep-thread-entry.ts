/**
 * Entry of a server engine thread (node:worker_threads). scripts/build-engine.mjs bundles it with
 * the engine into .engine/sweep-worker.mjs, which lib/design/engine-threads.ts starts for sweep
 * jobs (lib/design/thread-sweep.ts) and for the search of a run being kept
 * (lib/run-records/server-search.ts): the built app keeps no TypeScript sources a thread could load.
 */
import { parentPort } from "node:worker_threads";
import { runSweepJob, type JobSettings, type SweepPoint } from "./run-job";
import type { EmbankmentParams } from "./parameters";
import type { EngineFailure, Material, SectionDocument } from "../stability";
import type { SweepJob } from "./sweep-plan";
import { searchRecord, type SearchRecord } from "../run-records/search-record";

/** One job of a design sweep. */
export interface JobRequest {
  seq: number;
  kind: "job";
  params: EmbankmentParams;
  materials: Material[];
  job: SweepJob;
  settings: JobSettings;
}

/** The whole search of a run's document, as the browser's preview ran it. */
export interface RecordRequest {
  seq: number;
  kind: "record";
  document: SectionDocument;
}

export type EngineThreadRequest = JobRequest | RecordRequest;
export type EngineThreadReply =
  | { seq: number; point: SweepPoint }
  | { seq: number; record: SearchRecord | EngineFailure }
  | { seq: number; error: string };

parentPort?.on("message", (m: EngineThreadRequest) => {
  let reply: EngineThreadReply;
  try {
    reply =
      m.kind === "record"
        ? { seq: m.seq, record: searchRecord(m.document) }
        : { seq: m.seq, point: runSweepJob(m.params, m.materials, m.job, m.settings) };
  } catch (err) {
    reply = { seq: m.seq, error: err instanceof Error ? err.message : String(err) };
  }
  parentPort?.postMessage(reply);
});
