/**
 * The server's engine threads: long-lived node:worker_threads that load the bundled engine
 * (.engine/sweep-worker.mjs, built at build time by scripts/build-engine.mjs) and run the searches
 * of runs being kept (lib/design/sweep-thread-entry.ts). Design sweeps run on the job queue's
 * workers instead (lib/jobs). The threads stay up between requests: a fresh thread starts with a
 * cold JIT and costs several times one search. Requests queue in order when every thread is busy;
 * a thread that fails is dropped and replaced on demand.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Worker } from "node:worker_threads";
import type { EngineThreadReply, EngineThreadRequest } from "./sweep-thread-entry";

/** The engine bundle built at build time, or null when it is missing (the caller searches in process). */
export function engineBundle(): string | null {
  const file = path.join(process.cwd(), ".engine", "sweep-worker.mjs");
  if (fs.existsSync(file)) return file;
  console.error(`[engine] ${file} is missing: run npm run build:engine (npm start and npm run build do)`);
  return null;
}

/** At most four threads: more gain little on the machines this runs on and crowd other requests. */
export const MAX_THREADS = 4;

interface Slot {
  worker: Worker;
  busy: boolean;
}

interface Pool {
  file: string;
  size: number;
  slots: Slot[];
  waiting: ((slot: Slot) => void)[];
  seq: number;
}

// One pool per server process (kept on globalThis so a dev-mode reload does not start more).
const g = globalThis as unknown as { scarplineEngineThreads?: Pool };

/** How many threads the pool runs: the cores there are, at most MAX_THREADS. */
export function threadCount(): number {
  const cores = typeof os.availableParallelism === "function" ? os.availableParallelism() : os.cpus().length;
  return Math.max(1, Math.min(MAX_THREADS, cores));
}

function pool(file: string): Pool {
  if (!g.scarplineEngineThreads || g.scarplineEngineThreads.file !== file)
    g.scarplineEngineThreads = { file, size: threadCount(), slots: [], waiting: [], seq: 0 };
  return g.scarplineEngineThreads;
}

function acquire(p: Pool): Promise<Slot> {
  const idle = p.slots.find((s) => !s.busy);
  if (idle) {
    idle.busy = true;
    idle.worker.ref();
    return Promise.resolve(idle);
  }
  if (p.slots.length < p.size) {
    const slot = { worker: new Worker(p.file), busy: true };
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

function discard(p: Pool, slot: Slot): void {
  p.slots = p.slots.filter((s) => s !== slot);
  void slot.worker.terminate();
  const next = p.waiting.shift();
  if (next) void acquire(p).then(next);
}

type Request = EngineThreadRequest extends infer R ? (R extends unknown ? Omit<R, "seq"> : never) : never;

/** Runs one request on an engine thread of the bundle `file`; rejects with the thread's error. */
export async function onEngineThread(file: string, request: Request): Promise<EngineThreadReply> {
  const p = pool(file);
  const slot = await acquire(p);
  const seq = ++p.seq;
  try {
    const reply = await new Promise<EngineThreadReply>((resolve, reject) => {
      const onMessage = (r: EngineThreadReply) => {
        if (r.seq !== seq) return;
        slot.worker.off("message", onMessage);
        slot.worker.off("error", onError);
        if ("error" in r) reject(new Error(r.error));
        else resolve(r);
      };
      const onError = (err: Error) => {
        slot.worker.off("message", onMessage);
        reject(err);
      };
      slot.worker.on("message", onMessage);
      slot.worker.once("error", onError);
      slot.worker.postMessage({ ...request, seq } as EngineThreadRequest);
    });
    release(p, slot);
    return reply;
  } catch (err) {
    discard(p, slot);
    throw err;
  }
}
