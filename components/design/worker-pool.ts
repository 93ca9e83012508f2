/**
 * A pool of Web Workers for the browser sweep: as many as the browser reports cores, at most
 * four, each taking one job at a time. Terminating the pool cancels whatever is running.
 */
import type { EmbankmentParams, JobSettings, SweepJob, SweepPoint } from "@/lib/design";
import type { Material } from "@/lib/stability";
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

export function startWorkerPool(
  params: EmbankmentParams,
  materials: Material[],
  settings: JobSettings,
  size = browserWorkerCount(),
): WorkerPool {
  const workers = Array.from(
    { length: size },
    () => new Worker(new URL("./sweep.worker.ts", import.meta.url), { type: "module" }),
  );
  const idle = [...workers];
  const waiting: ((w: Worker) => void)[] = [];
  const rejectors = new Set<(e: Error) => void>();
  let seq = 0;
  let stopped = false;
  const take = () =>
    new Promise<Worker>((resolve) => (idle.length ? resolve(idle.pop() as Worker) : waiting.push(resolve)));
  const give = (w: Worker) => {
    const next = waiting.shift();
    if (next) next(w);
    else idle.push(w);
  };
  const execute = async (job: SweepJob): Promise<SweepPoint> => {
    const w = await take();
    const mine = ++seq;
    try {
      return await new Promise<SweepPoint>((resolve, reject) => {
        if (stopped) return reject(new Error("cancelled"));
        rejectors.add(reject);
        w.onmessage = (event: MessageEvent<SweepWorkerReply>) => {
          if (event.data.seq !== mine) return;
          rejectors.delete(reject);
          if ("point" in event.data) resolve(event.data.point);
          else reject(new Error(event.data.error));
        };
        w.onerror = (e) => {
          rejectors.delete(reject);
          reject(new Error(e.message || "A sweep worker stopped unexpectedly."));
        };
        const request: SweepWorkerRequest = { seq: mine, params, materials, job, settings };
        w.postMessage(request);
      });
    } finally {
      give(w);
    }
  };
  const terminate = () => {
    stopped = true;
    for (const w of workers) w.terminate();
    for (const reject of rejectors) reject(new Error("cancelled"));
    rejectors.clear();
  };
  return { size, execute, terminate };
}
