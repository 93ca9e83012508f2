/** The browser's view of a job, with a sentence when the queue is down or a worker died. */
import type { JobRecord, JobView } from "./types";

export const QUEUE_DOWN_NOTICE =
  "The job queue cannot be reached just now. The job is kept and starts as soon as the queue is back; " +
  "this page keeps checking.";

export function toJobView(job: JobRecord, queueUp: boolean): JobView {
  let notice: string | null = null;
  if (job.state === "queued" && !job.enqueuedAt && !queueUp) notice = QUEUE_DOWN_NOTICE;
  else if ((job.state === "queued" || job.state === "running") && job.attempts > 0 && job.error)
    notice = "A worker stopped while running this job; another attempt is on its way.";
  else if (job.state === "queued" && job.attempts > 0)
    notice = "A worker stopped while running this job; it is being retried.";
  return {
    id: job.id,
    kind: job.kind,
    state: job.state,
    done: job.done,
    total: job.total,
    attempts: job.attempts,
    error: job.error,
    createdAt: job.createdAt,
    startedAt: job.startedAt,
    finishedAt: job.finishedAt,
    result: job.state === "done" ? job.result : null,
    queue: queueUp ? "up" : "down",
    notice,
  };
}
