/**
 * Entry of the thread a probabilistic job runs on (node:worker_threads). The engine's run is
 * synchronous; on its own thread it leaves the worker's event loop free to renew its hold on the
 * job, write progress and read a cancel. scripts/build-engine.mjs bundles this file into
 * .engine/probabilistic-worker.mjs. A cancel arrives through a shared flag, read at every progress
 * report, because a busy thread reads no messages.
 */
import { parentPort, workerData } from "node:worker_threads";
import { runProbabilistic, type ProbabilisticResult } from "@/lib/stability";

export interface ProbabilisticThreadData {
  document: unknown;
  /** Int32Array over it: 1 once the job is cancelled. */
  cancel: SharedArrayBuffer;
}

export type ProbabilisticThreadMessage =
  | { type: "progress"; fraction: number }
  | { type: "done"; result: ProbabilisticResult }
  | { type: "error"; message: string };

if (parentPort && workerData) {
  const data = workerData as ProbabilisticThreadData;
  const flag = new Int32Array(data.cancel);
  const post = (m: ProbabilisticThreadMessage) => parentPort!.postMessage(m);
  try {
    const result = runProbabilistic(data.document, {
      onProgress: (fraction) => {
        post({ type: "progress", fraction });
        return Atomics.load(flag, 0) === 0;
      },
    });
    post({ type: "done", result });
  } catch (err) {
    post({ type: "error", message: err instanceof Error ? err.message : String(err) });
  }
}
