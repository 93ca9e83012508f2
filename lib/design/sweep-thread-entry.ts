/**
 * Entry of a server worker thread (node:worker_threads). scripts/build-engine.mjs bundles it with
 * the engine into .engine/sweep-worker.mjs, which lib/design/thread-sweep.ts (sweep jobs) and
 * lib/run-records/server-search.ts (the search of a run being kept) start: the built app keeps no
 * TypeScript sources a thread could load.
 */
import { parentPort } from "node:worker_threads";
import { runSweepJob, type JobSettings, type SweepPoint } from "./run-job";
import type { EmbankmentParams } from "./parameters";
import type { EngineFailure, Material, SectionDocument } from "../stability";
import type { SweepJob } from "./sweep-plan";
import { searchRecord, type SearchRecord } from "../run-records/search-record";

export interface ThreadRequest {
  seq: number;
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

export type ThreadReply = { seq: number; point: SweepPoint } | { seq: number; error: string };
export type RecordReply = { seq: number; record: SearchRecord | EngineFailure } | { seq: number; error: string };

parentPort?.on("message", (m: ThreadRequest | RecordRequest) => {
  let reply: ThreadReply | RecordReply;
  try {
    reply =
      "kind" in m
        ? { seq: m.seq, record: searchRecord(m.document) }
        : { seq: m.seq, point: runSweepJob(m.params, m.materials, m.job, m.settings) };
  } catch (err) {
    reply = { seq: m.seq, error: err instanceof Error ? err.message : String(err) };
  }
  parentPort?.postMessage(reply);
});
