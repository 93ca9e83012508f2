/**
 * A pool of Web Workers for the browser sweep: as many as the browser reports cores, at most
 * four, each taking one job at a time. Terminating the pool cancels whatever is running.
 */
import type { EmbankmentParams, JobSettings, SweepJob, SweepPoint } from "@/lib/design";
import type { Material } from "@/lib/stability";
import { createWorkerPool, type PoolWorker } from "@/lib/worker-pool";
import type { SweepWorkerReply, SweepWorkerRequest } from "./sweep.worker";

export const MAX_BROWSER_WORKERS = 4;

export function browserWorkerCount(): number {
  const cores = typeof navigator !== "undefined" && navigator.hardwareConcurrency ? navigator.hardwareConcurrency : 2;
  return Math.max(1, Math.min(MAX_BROWSER_WORKERS, cores));
}

export interface WorkerPool {
  size: number;
  execute: (job: SweepJob) => Promise<SweepPoint>;
  terminate: () => void;
}

/** A Web Worker as the shared pool (lib/worker-pool.ts) sees it. */
function poolWorker(w: Worker): PoolWorker<SweepWorkerRequest, SweepWorkerReply> {
  return {
    post: (message) => w.postMessage(message),
    listen: (onReply, onFailure) => {
      const message = (event: MessageEvent<SweepWorkerReply>) => onReply(event.data);
      const error = (event: ErrorEvent) =>
        onFailure(new Error(event.message || "A sweep worker stopped unexpectedly."));
      w.addEventListener("message", message);
      w.addEventListener("error", error);
      return () => {
        w.removeEventListener("message", message);
        w.removeEventListener("error", error);
      };
    },
    terminate: () => w.terminate(),
  };
}

export function startWorkerPool(
  params: EmbankmentParams,
  materials: Material[],
  settings: JobSettings,
  size = browserWorkerCount(),
): WorkerPool {
  const pool = createWorkerPool(
    Array.from({ length: size }, () =>
      poolWorker(new Worker(new URL("./sweep.worker.ts", import.meta.url), { type: "module" })),
    ),
  );
  const execute = async (job: SweepJob): Promise<SweepPoint> => {
    const reply = await pool.request((seq) => ({ seq, params, materials, job, settings }));
    if ("point" in reply) return reply.point;
    throw new Error(reply.error);
  };
  return { size, execute, terminate: () => void pool.terminate() };
}
