/**
 * Keeps the queue and the jobs table in step. Run by every worker every few seconds (and by the
 * web app for the one job a page asks about): rows made while Redis was down are enqueued once it
 * answers; rows the queue lost (Redis restarted without its data) are enqueued again; rows whose
 * queue job failed for good (a worker died on every try) are marked failed.
 */
import type { Queue } from "bullmq";
import { fetchEnqueuedActiveJobs, fetchUnenqueuedJobs, markEnqueued, markFailed } from "@/db/queries/jobs";
import { bullJobId, offerJob, type QueueJobData } from "./queue";

const BATCH = 100;

/** Offers one row to the queue and notes it; false when Redis is down. */
export async function enqueueRow(id: number, queue?: Queue<QueueJobData>): Promise<boolean> {
  if (!(await offerJob(id, queue))) return false;
  await markEnqueued(id);
  return true;
}

export async function reconcile(queue: Queue<QueueJobData>): Promise<{ enqueued: number; failed: number }> {
  let enqueued = 0;
  let failed = 0;
  for (const id of await fetchUnenqueuedJobs(BATCH)) {
    if (!(await enqueueRow(id, queue))) return { enqueued, failed };
    enqueued++;
  }
  for (const id of await fetchEnqueuedActiveJobs(BATCH)) {
    const job = await queue.getJob(bullJobId(id));
    if (!job) {
      if (await offerJob(id, queue)) enqueued++;
      continue;
    }
    if ((await job.getState()) === "failed") {
      const why = /stalled/i.test(job.failedReason ?? "")
        ? "The workers running this job stopped on every try; it was given up."
        : `The job failed: ${job.failedReason}`;
      await markFailed(id, why);
      failed++;
    }
  }
  return { enqueued, failed };
}
