/**
 * The queue (BullMQ on the project's Redis) as the web app and the workers see it. The queue
 * carries only job ids; the jobs table is the truth. Adding is idempotent (BullMQ job id
 * "job-<row id>"), so a row may be offered again whenever there is doubt that Redis holds it.
 */
import { Queue, type ConnectionOptions } from "bullmq";
import { readServerEnv } from "@/lib/env";

export const QUEUE_NAME = "scarpline-jobs";

/** BullMQ refuses custom ids that are bare integers. */
export const bullJobId = (id: number) => `job-${id}`;

export interface QueueJobData {
  jobId: number;
}

/** How often a job is tried: a worker that throws or dies gets one retry, then the job fails. */
export const JOB_ATTEMPTS = 2;

/** Connection settings; `forWorker` waits on Redis as long as it takes, the web app fails fast. */
export function redisConnection(forWorker: boolean): ConnectionOptions {
  const env = readServerEnv();
  return {
    host: env.REDIS_HOST,
    port: env.REDIS_PORT,
    password: env.REDIS_PASSWORD,
    // BullMQ workers need unlimited retries per command; a web request must not hang on a dead Redis.
    maxRetriesPerRequest: forWorker ? null : 1,
    enableOfflineQueue: forWorker,
    connectTimeout: 2_000,
    retryStrategy: (times: number) => Math.min(250 * times, 2_000),
  };
}

const g = globalThis as unknown as { scarplineQueue?: Queue<QueueJobData> };

/** One Queue per process (kept on globalThis so a dev-mode reload does not open more connections). */
export function jobQueue(): Queue<QueueJobData> {
  if (!g.scarplineQueue) {
    const queue = new Queue<QueueJobData>(QUEUE_NAME, { connection: redisConnection(false) });
    // An unreachable Redis is reported per request (queueUp / offerJob); the client keeps reconnecting.
    queue.on("error", () => undefined);
    g.scarplineQueue = queue;
  }
  return g.scarplineQueue;
}

function within<T>(ms: number, p: Promise<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`the queue did not answer within ${ms} ms`)), ms);
    p.then(
      (v) => (clearTimeout(timer), resolve(v)),
      (e) => (clearTimeout(timer), reject(e)),
    );
  });
}

/** Whether Redis answers now. */
export async function queueUp(queue: Queue<QueueJobData> = jobQueue()): Promise<boolean> {
  try {
    await within(2_000, queue.count());
    return true;
  } catch {
    return false;
  }
}

/** Hands a job row to the queue; false when Redis cannot be reached (the row stays for later). */
export async function offerJob(id: number, queue: Queue<QueueJobData> = jobQueue()): Promise<boolean> {
  try {
    await within(
      3_000,
      queue.add(
        "run",
        { jobId: id },
        {
          jobId: bullJobId(id),
          attempts: JOB_ATTEMPTS,
          backoff: { type: "fixed", delay: 1_000 },
          removeOnComplete: { age: 24 * 3600 },
          removeOnFail: { age: 7 * 24 * 3600 },
        },
      ),
    );
    return true;
  } catch {
    return false;
  }
}
