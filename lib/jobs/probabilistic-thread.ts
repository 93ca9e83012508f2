/**
 * Runs the engine's probabilistic analysis for a queue job on a thread of its own
 * (.engine/probabilistic-worker.mjs), passing progress up and a cancel down. Without the bundle
 * (a worker started from sources) it runs in this process: correct, but the worker cannot renew
 * its hold meanwhile, so only short runs should go that way.
 */
import fs from "node:fs";
import path from "node:path";
import { Worker } from "node:worker_threads";
import { runProbabilistic, type ProbabilisticResult } from "@/lib/stability";
import type { ProbabilisticThreadData, ProbabilisticThreadMessage } from "./probabilistic-thread-entry";

const CANCEL_POLL_MS = 200;

export function probabilisticBundle(): string | null {
  const file = path.join(process.cwd(), ".engine", "probabilistic-worker.mjs");
  return fs.existsSync(file) ? file : null;
}

export async function runProbabilisticOffThread(
  document: unknown,
  o: { onProgress: (fraction: number) => void; cancelled: () => boolean },
): Promise<ProbabilisticResult> {
  const file = probabilisticBundle();
  if (!file) {
    await new Promise((r) => setImmediate(r));
    return runProbabilistic(document, { onProgress: (f) => (o.onProgress(f), !o.cancelled()) });
  }
  const cancel = new SharedArrayBuffer(4);
  const flag = new Int32Array(cancel);
  const data: ProbabilisticThreadData = { document, cancel };
  const thread = new Worker(file, { workerData: data });
  const poll = setInterval(() => {
    if (o.cancelled()) Atomics.store(flag, 0, 1);
  }, CANCEL_POLL_MS);
  try {
    return await new Promise<ProbabilisticResult>((resolve, reject) => {
      thread.on("message", (m: ProbabilisticThreadMessage) => {
        if (m.type === "progress") o.onProgress(m.fraction);
        else if (m.type === "done") resolve(m.result);
        else reject(new Error(m.message));
      });
      thread.once("error", reject);
      thread.once("exit", (code) => reject(new Error(`the probabilistic thread stopped (exit code ${code})`)));
    });
  } finally {
    clearInterval(poll);
    void thread.terminate();
  }
}
