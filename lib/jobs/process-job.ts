/**
 * What a worker does with one job id taken from the queue: claim the row, check the frozen
 * input, run the kind, and end the job in one transaction (db/queries/jobs.ts finishJob). A worker
 * killed mid-job has written nothing but progress; BullMQ hands the job to another worker, which
 * starts it again from its frozen input.
 */
import {
  claimJob,
  finishJob,
  isCancelRequested,
  markCancelled,
  markFailed,
  markRetrying,
  saveJobProgress,
} from "@/db/queries/jobs";
import { ApiError } from "@/lib/api/errors";
import { CANCELLED, type JobContext } from "./kind";
import { jobKind } from "./kinds";

/** Progress is written at most this often (ms); the page polls about once a second. */
const PROGRESS_EVERY_MS = 400;
/** How often a running job looks for a cancel request (ms). */
const CANCEL_CHECK_MS = 500;

/** Thrown for a job that must not be retried (its input or kind is wrong, not the worker). */
export class JobInputError extends Error {}

export interface ProcessOptions {
  worker: string;
  /** Whether a failure now is the job's last try (BullMQ attemptsMade + 1 >= attempts). */
  lastAttempt: boolean;
}

export async function processJob(jobId: number, o: ProcessOptions): Promise<"done" | "cancelled" | "skipped"> {
  const record = await claimJob(jobId, o.worker);
  if (!record) return "skipped";
  if (record.cancelRequested) {
    await markCancelled(jobId);
    return "cancelled";
  }
  const kind = jobKind(record.kind);
  if (!kind) {
    await markFailed(jobId, `No worker knows the job kind '${record.kind}'.`);
    throw new JobInputError(`unknown job kind ${record.kind}`);
  }
  const parsed = kind.input.safeParse(record.input);
  if (!parsed.success) {
    await markFailed(jobId, `The job's input is not valid: ${parsed.error.issues[0]?.message ?? "unknown"}`);
    throw new JobInputError("invalid job input");
  }

  let cancelled = false;
  let lastWrite = 0;
  let pending: Promise<void> = Promise.resolve();
  const cancelTimer = setInterval(() => {
    void isCancelRequested(jobId).then(
      (c) => (cancelled ||= c),
      () => undefined,
    );
  }, CANCEL_CHECK_MS);
  const ctx: JobContext = {
    jobId,
    attempt: record.attempts,
    progress(done, total) {
      const now = Date.now();
      if (now - lastWrite < PROGRESS_EVERY_MS && done < total) return;
      lastWrite = now;
      pending = pending.then(() => saveJobProgress(jobId, done, total)).catch(() => undefined);
    },
    cancelled: () => cancelled,
  };
  try {
    const result = await kind.run(parsed.data, ctx);
    await pending;
    if (result === CANCELLED) {
      await markCancelled(jobId);
      return "cancelled";
    }
    const state = await finishJob(jobId, result, (trx, job) =>
      kind.commit ? kind.commit(trx, job, parsed.data, result) : Promise.resolve(),
    );
    return state === "done" ? "done" : "cancelled";
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    // Input the engine refuses fails the same way on every worker: no retry.
    if (err instanceof ApiError) {
      await markFailed(jobId, err.message);
      throw new JobInputError(message);
    }
    if (o.lastAttempt) await markFailed(jobId, `The job failed: ${message}`);
    else await markRetrying(jobId, `An attempt failed (${message}); trying again.`);
    throw err;
  } finally {
    clearInterval(cancelTimer);
  }
}
