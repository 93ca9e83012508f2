/**
 * The server's own search of a run being kept, off the request thread: a worker thread loads the
 * bundled engine (.engine/sweep-worker.mjs, the one the server sweep uses) and runs searchRecord,
 * so a large set-up does not stall other users' requests. Without the bundle the search runs in
 * this process after yielding once, and the outcome says so.
 */
import { Worker } from "node:worker_threads";
import type { EngineFailure, SectionDocument } from "../stability";
import { ensureBundle } from "../design/thread-sweep";
import type { RecordReply, RecordRequest } from "../design/sweep-thread-entry";
import { searchRecord, type SearchRecord } from "./search-record";

export interface ServerSearch {
  record: SearchRecord | EngineFailure;
  mode: "thread" | "in-process";
}

function inThread(file: string, document: SectionDocument): Promise<SearchRecord | EngineFailure> {
  const worker = new Worker(file);
  return new Promise<SearchRecord | EngineFailure>((resolve, reject) => {
    worker.once("message", (reply: RecordReply) => {
      if ("record" in reply) resolve(reply.record);
      else reject(new Error(reply.error));
    });
    worker.once("error", reject);
    const request: RecordRequest = { seq: 1, kind: "record", document };
    worker.postMessage(request);
  }).finally(() => void worker.terminate());
}

/** Runs the whole search of a run's document (the analysis block included) on the server. */
export async function searchOnServer(document: SectionDocument): Promise<ServerSearch> {
  const file = ensureBundle();
  if (file) return { record: await inThread(file, document), mode: "thread" };
  await new Promise((r) => setImmediate(r));
  return { record: searchRecord(document), mode: "in-process" };
}
