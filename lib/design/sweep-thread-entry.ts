/**
 * Entry of a server engine thread (node:worker_threads). scripts/build-engine.mjs bundles it with
 * the engine into .engine/sweep-worker.mjs, which lib/design/engine-threads.ts starts for the
 * search of a run being kept (lib/runs/record/server-search.ts): the built app keeps no TypeScript
 * sources a thread could load. Sweep jobs run on the job queue's workers (lib/jobs).
 */
import { parentPort } from "node:worker_threads";
import type { EngineFailure, SectionDocument } from "@/lib/stability";
import { searchRecord, type SearchRecord } from "@/lib/runs/record/search-record";

/** The whole search of a run's document, as the browser's preview ran it. */
export interface RecordRequest {
  seq: number;
  kind: "record";
  document: SectionDocument;
}

export type EngineThreadRequest = RecordRequest;
export type EngineThreadReply = { seq: number; record: SearchRecord | EngineFailure } | { seq: number; error: string };

parentPort?.on("message", (m: EngineThreadRequest) => {
  let reply: EngineThreadReply;
  try {
    reply = { seq: m.seq, record: searchRecord(m.document) };
  } catch (err) {
    reply = { seq: m.seq, error: err instanceof Error ? err.message : String(err) };
  }
  parentPort?.postMessage(reply);
});
