/**
 * A queue worker (lib/jobs/worker.ts). `npm start` starts one; `npm run worker` adds more, here or
 * on another host whose REDIS_* and DATABASE_* settings point at the shared Redis and MariaDB.
 * scripts/build-engine.mjs bundles this file into .engine/worker.mjs at build time, so a worker
 * runs with node alone: `node .engine/worker.mjs` (scripts/worker-start.sh runs it in the background).
 */
import fs from "node:fs";
import { startWorker } from "../lib/jobs/worker";
import { getDb } from "../db/index";

// Settings written by scripts/ensure-env.sh; variables already set (tests, other hosts) win.
if (fs.existsSync(".env.local")) process.loadEnvFile(".env.local");

const log = (line: string) => console.log(`[worker ${process.pid}] ${line}`);

async function main(): Promise<void> {
  const worker = await startWorker(log);
  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    log("stopping after the current job");
    // A job that outlasts this is taken over by another worker once its hold lapses.
    const forced = setTimeout(() => process.exit(0), 10_000);
    forced.unref();
    await worker.close();
    await getDb().destroy();
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop());
  process.on("SIGINT", () => void stop());
}

main().catch((err) => {
  console.error("[worker] could not start:", err);
  process.exit(1);
});
