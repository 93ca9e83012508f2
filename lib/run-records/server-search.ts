/**
 * The server's own search of a run being kept, off the request thread: long-lived worker threads
 * load the bundled engine (.engine/sweep-worker.mjs, the one the server sweep uses) and run
 * searchRecord, so a large set-up does not stall other users' requests. The threads stay up
 * between saves: a fresh thread would start with a cold JIT and cost several times the search.
 * Without the bundle the search runs in this process after yielding once, and the outcome says so.
 */
import os from "node:os";
import { Worker } from "node:worker_threads";
import type { EngineFailure, SectionDocument } from "../stability";
import { ensureBundle } from "../design/thread-sweep";
import type { RecordReply, RecordRequest } from "../design/sweep-thread-entry";
import { searchRecord, type SearchRecord } from "./search-record";

export interface ServerSearch {
  record: SearchRecord | EngineFailure;
  mode: "thread" | "in-process";
}

/** Two threads at most: saves are short, and the sweeps and other requests share the cores. */
const MAX_THREADS = 2;

interface Slot {
  worker: Worker;
  busy: boolean;
}

interface Pool {
  file: string;
  slots: Slot[];
  waiting: ((slot: Slot) => void)[];
  seq: number;
}

// One pool per server process (kept on globalThis so a dev-mode reload does not start more).
const g = globalThis as unknown as { scarplineRecordPool?: Pool };

function pool(file: string): Pool {
  if (!g.scarplineRecordPool || g.scarplineRecordPool.file !== file)
    g.scarplineRecordPool = { file, slots: [], waiting: [], seq: 0 };
  return g.scarplineRecordPool;
}

function acquire(p: Pool): Promise<Slot> {
  const idle = p.slots.find((s) => !s.busy);
  if (idle) {
    idle.busy = true;
    idle.worker.ref();
    return Promise.resolve(idle);
  }
  const cores = typeof os.availableParallelism === "function" ? os.availableParallelism() : os.cpus().length;
  if (p.slots.length < Math.max(1, Math.min(MAX_THREADS, cores))) {
    const worker = new Worker(p.file);
    const slot = { worker, busy: true };
    p.slots.push(slot);
    return Promise.resolve(slot);
  }
  return new Promise((resolve) => p.waiting.push(resolve));
}

function release(p: Pool, slot: Slot): void {
  const next = p.waiting.shift();
  if (next) next(slot);
  else {
    slot.busy = false;
    slot.worker.unref(); // an idle thread must not keep a script or test process alive
  }
}

/** A thread that failed is dropped; the next search starts a new one. */
function discard(p: Pool, slot: Slot): void {
  p.slots = p.slots.filter((s) => s !== slot);
  void slot.worker.terminate();
  const next = p.waiting.shift();
  if (next) void acquire(p).then(next);
}

async function inThread(p: Pool, document: SectionDocument): Promise<SearchRecord | EngineFailure> {
  const slot = await acquire(p);
  const seq = ++p.seq;
  try {
    const record = await new Promise<SearchRecord | EngineFailure>((resolve, reject) => {
      const onMessage = (reply: RecordReply) => {
        if (reply.seq !== seq) return;
        slot.worker.off("message", onMessage);
        slot.worker.off("error", onError);
        if ("record" in reply) resolve(reply.record);
        else reject(new Error(reply.error));
      };
      const onError = (err: Error) => {
        slot.worker.off("message", onMessage);
        reject(err);
      };
      slot.worker.on("message", onMessage);
      slot.worker.once("error", onError);
      const request: RecordRequest = { seq, kind: "record", document };
      slot.worker.postMessage(request);
    });
    release(p, slot);
    return record;
  } catch (err) {
    discard(p, slot);
    throw err;
  }
}

/** Runs the whole search of a run's document (the analysis block included) on the server. */
export async function searchOnServer(document: SectionDocument): Promise<ServerSearch> {
  const file = ensureBundle();
  if (file) {
    try {
      return { record: await inThread(pool(file), document), mode: "thread" };
    } catch (err) {
      // A bundle built before this module existed cannot run the search (npm run build:engine
      // renews it); the save must not fail for that, so the search runs here instead.
      console.error("[runs] the search thread failed; searching in this process:", err);
    }
  }
  await new Promise((r) => setImmediate(r));
  return { record: searchRecord(document), mode: "in-process" };
}
