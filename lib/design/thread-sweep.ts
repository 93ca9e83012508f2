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

function startPool(
  file: string,
  size: number,
  params: EmbankmentParams,
  materials: Material[],
  settings: SweepSettings,
): ThreadPool {
  const workers = Array.from({ length: size }, () => new Worker(file));
  const idle = [...workers];
  const waiting: ((w: Worker) => void)[] = [];
  const take = () =>
    new Promise<Worker>((resolve) => (idle.length ? resolve(idle.pop() as Worker) : waiting.push(resolve)));
  const give = (w: Worker) => {
    const next = waiting.shift();
    if (next) next(w);
    else idle.push(w);
  };
  let seq = 0;
  const execute = async (job: SweepJob): Promise<SweepPoint> => {
    const w = await take();
    const mine = ++seq;
    try {
      return await new Promise<SweepPoint>((resolve, reject) => {
        const onMessage = (reply: ThreadReply) => {
          if (reply.seq !== mine) return;
          w.off("message", onMessage);
          w.off("error", onError);
          if ("point" in reply) resolve(reply.point);
          else reject(new Error(reply.error));
        };
        const onError = (err: Error) => {
          w.off("message", onMessage);
          reject(err);
        };
        w.on("message", onMessage);
        w.once("error", onError);
        const request: ThreadRequest = { seq: mine, params, materials, job, settings };
        w.postMessage(request);
      });
    } finally {
      give(w);
    }
  };
  return {
    execute,
    size,
    close: async () => {
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
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
