/**
 * The sweep on the server: jobs run in node:worker_threads that load the bundled engine
 * (.engine/sweep-worker.mjs, built by scripts/build-engine.mjs). When the bundle is missing the
 * route builds it once; should that fail, the jobs run in this process one at a time, yielding
 * between jobs, and the outcome says so.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Worker } from "node:worker_threads";
import type { Material } from "../stability";
import type { EmbankmentParams } from "./parameters";
import type { RequiredFs } from "./pick-ratio";
import { runSweepJob, type SweepPoint } from "./run-job";
import { runWholeSweep, type SweepProgress } from "./sweep-runner";
import type { SweepJob, SweepSettings } from "./sweep-plan";
import type { ThreadReply, ThreadRequest } from "./sweep-thread-entry";
import { createWorkerPool, type PoolWorker } from "../worker-pool";

/** At most four threads: more gain little on the machines this runs on and crowd other requests. */
export const MAX_THREADS = 4;

export function bundlePath(): string {
  return path.join(process.cwd(), ".engine", "sweep-worker.mjs");
}

let building: boolean | null = null;

/** The bundle's path, building it once if it is missing; null when it cannot be had. */
export function ensureBundle(): string | null {
  const file = bundlePath();
  if (fs.existsSync(file)) return file;
  if (building === false) return null;
  const script = path.join(process.cwd(), "scripts", "build-engine.mjs");
  const r = spawnSync(process.execPath, [script], { cwd: process.cwd(), encoding: "utf8", timeout: 60_000 });
  building = r.status === 0 && fs.existsSync(file);
  if (!building) console.error("[design] could not build the sweep worker bundle:", r.stderr || r.error?.message);
  return building ? file : null;
}

interface ThreadPool {
  execute: (job: SweepJob) => Promise<SweepPoint>;
  size: number;
  close: () => Promise<void>;
}

/** A worker thread as the shared pool (lib/worker-pool.ts) sees it. */
function poolWorker(w: Worker): PoolWorker<ThreadRequest, ThreadReply> {
  return {
    post: (message) => w.postMessage(message),
    listen: (onReply, onFailure) => {
      w.on("message", onReply);
      w.on("error", onFailure);
      return () => {
        w.off("message", onReply);
        w.off("error", onFailure);
      };
    },
    terminate: () => w.terminate(),
  };
}

function startPool(
  file: string,
  size: number,
  params: EmbankmentParams,
  materials: Material[],
  settings: SweepSettings,
): ThreadPool {
  const pool = createWorkerPool(Array.from({ length: size }, () => poolWorker(new Worker(file))));
  const execute = async (job: SweepJob): Promise<SweepPoint> => {
    const reply = await pool.request((seq) => ({ seq, params, materials, job, settings }));
    if ("point" in reply) return reply.point;
    throw new Error(reply.error);
  };
  return { execute, size, close: pool.terminate };
}

export interface ServerSweepOutcome {
  points: SweepPoint[];
  cancelled: boolean;
  mode: "threads" | "in-process";
  workers: number;
  elapsedMs: number;
}

export async function runSweepOnServer(o: {
  params: EmbankmentParams;
  materials: Material[];
  settings: SweepSettings;
  required: RequiredFs;
  onProgress?: (p: SweepProgress) => void;
  isCancelled?: () => boolean;
}): Promise<ServerSweepOutcome> {
  const t0 = Date.now();
  const file = ensureBundle();
  const cores = typeof os.availableParallelism === "function" ? os.availableParallelism() : os.cpus().length;
  if (!file) {
    const execute = async (job: SweepJob) => {
      await new Promise((r) => setImmediate(r)); // let other requests in between jobs
      return runSweepJob(o.params, o.materials, job, o.settings);
    };
    const out = await runWholeSweep({ ...o, execute, concurrency: 1 });
    return { ...out, mode: "in-process", workers: 1, elapsedMs: Date.now() - t0 };
  }
  const pool = startPool(file, Math.max(1, Math.min(MAX_THREADS, cores)), o.params, o.materials, o.settings);
  try {
    const out = await runWholeSweep({ ...o, execute: pool.execute, concurrency: pool.size });
    return { ...out, mode: "threads", workers: pool.size, elapsedMs: Date.now() - t0 };
  } finally {
    await pool.close();
  }
}
