/**
 * A queue worker process (scripts/worker.ts): takes jobs from BullMQ one at a time (the work is
 * CPU-bound; more throughput comes from more worker processes, on this machine or others) and
 * keeps the queue and the jobs table in step (lib/jobs/reconcile.ts).
 */
import os from "node:os";
import { Queue, UnrecoverableError, Worker } from "bullmq";
import { readServerEnv } from "@/lib/env";
import { JOB_ATTEMPTS, QUEUE_NAME, redisConnection, type QueueJobData } from "./queue";
import { JobInputError, processJob } from "./process-job";
import { reconcile } from "./reconcile";

const RECONCILE_EVERY_MS = 2_000;

export interface RunningWorker {
  name: string;
  close(): Promise<void>;
}

export async function startWorker(log: (line: string) => void = console.log): Promise<RunningWorker> {
  const env = readServerEnv();
  const name = `${os.hostname()}:${process.pid}`;
  const worker = new Worker<QueueJobData>(
    QUEUE_NAME,
    async (job) => {
      try {
        const lastAttempt = job.attemptsMade + 1 >= (job.opts.attempts ?? JOB_ATTEMPTS);
        const outcome = await processJob(job.data.jobId, { worker: name, lastAttempt });
        log(`job ${job.data.jobId}: ${outcome}`);
      } catch (err) {
        if (err instanceof JobInputError) throw new UnrecoverableError(err.message);
        throw err;
      }
    },
    {
      connection: redisConnection(true),
      concurrency: 1,
      lockDuration: env.JOB_LOCK_MS,
      stalledInterval: env.JOB_LOCK_MS,
      // A job whose worker died is tried again on another; twice dead, it fails (reconcile marks the row).
      maxStalledCount: 1,
    },
  );
  worker.on("error", (err) => log(`queue error: ${err.message}`));
  worker.on("failed", (job, err) => log(`job ${job?.data.jobId}: attempt failed: ${err.message}`));

  const queue = new Queue<QueueJobData>(QUEUE_NAME, { connection: redisConnection(true) });
  queue.on("error", () => undefined);
  let busy = false;
  const timer = setInterval(() => {
    if (busy) return;
    busy = true;
    reconcile(queue)
      .then((r) => {
        if (r.enqueued || r.failed) log(`reconciled: ${r.enqueued} enqueued, ${r.failed} failed`);
      })
      .catch(() => undefined)
      .finally(() => (busy = false));
  }, RECONCILE_EVERY_MS);

  await worker.waitUntilReady();
  log(`worker ${name} ready on ${env.REDIS_HOST}:${env.REDIS_PORT}, queue ${QUEUE_NAME}`);
  return {
    name,
    async close() {
      clearInterval(timer);
      await worker.close();
      await queue.close();
    },
  };
}
