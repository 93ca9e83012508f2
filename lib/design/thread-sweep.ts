/**
 * The sweep on the server: jobs run on the engine threads (lib/design/engine-threads.ts), which
 * load the bundled engine (.engine/sweep-worker.mjs, built by scripts/build-engine.mjs). When the
 * bundle is missing the route builds it once; should that fail, the jobs run in this process one
 * at a time, yielding between jobs, and the outcome says so.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import type { Material } from "../stability";
import type { EmbankmentParams } from "./parameters";
import type { RequiredFs } from "./pick-ratio";
import { runSweepJob, type SweepPoint } from "./run-job";
import { runWholeSweep, type SweepProgress } from "./sweep-runner";
import type { SweepJob, SweepSettings } from "./sweep-plan";
import { onEngineThread, threadCount } from "./engine-threads";

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
  if (!file) {
    const execute = async (job: SweepJob) => {
      await new Promise((r) => setImmediate(r)); // let other requests in between jobs
      return runSweepJob(o.params, o.materials, job, o.settings);
    };
    const out = await runWholeSweep({ ...o, execute, concurrency: 1 });
    return { ...out, mode: "in-process", workers: 1, elapsedMs: Date.now() - t0 };
  }
  const size = threadCount();
  const execute = async (job: SweepJob): Promise<SweepPoint> => {
    const reply = await onEngineThread(file, {
      kind: "job",
      params: o.params,
      materials: o.materials,
      job,
      settings: o.settings,
    });
    if (!("point" in reply)) throw new Error("the engine thread answered a sweep job without its point");
    return reply.point;
  };
  const out = await runWholeSweep({ ...o, execute, concurrency: size });
  return { ...out, mode: "threads", workers: size, elapsedMs: Date.now() - t0 };
}
