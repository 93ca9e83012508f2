/**
 * Making a job from a web request: check its input and size, bound how many jobs wait, write
 * the row (input frozen), then offer it to the queue. When Redis is down the row stays queued
 * and the workers enqueue it as soon as Redis answers (lib/jobs/reconcile.ts); nothing is lost.
 */
import { ApiError } from "@/lib/api/errors";
import { countActiveJobs, createJob, fetchJob } from "@/db/queries/jobs";
import type { JobKind } from "./kind";
import { enqueueRow } from "./reconcile";
import { toJobView } from "./view";
import type { JobView } from "./types";

/** Jobs one project may have waiting or running at once. */
export const MAX_ACTIVE_PER_PROJECT = 20;
/** Jobs waiting or running across all projects; past this the queue is full. */
export const MAX_ACTIVE_TOTAL = 1_000;

export async function startJob<I, R>(
  kind: JobKind<I, R>,
  o: { projectId: number; subject: string; input: I; userId: number },
): Promise<JobView> {
  const parsed = kind.input.safeParse(o.input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new ApiError(400, "invalid_job", `The job's input is not valid at ${issue.path.join(".")}: ${issue.message}`);
  }
  const units = kind.units(parsed.data);
  if (units > kind.maxUnits)
    throw new ApiError(
      400,
      "job_too_large",
      `This job holds ${units} ${kind.unitName}; one job may hold at most ${kind.maxUnits}. Make it smaller.`,
      { _: [`at most ${kind.maxUnits} ${kind.unitName}`] },
    );
  if ((await countActiveJobs(o.projectId)) >= MAX_ACTIVE_PER_PROJECT)
    throw new ApiError(
      429,
      "too_many_jobs",
      `This project already has ${MAX_ACTIVE_PER_PROJECT} jobs waiting or running; wait for one to end or cancel one.`,
    );
  if ((await countActiveJobs(null)) >= MAX_ACTIVE_TOTAL)
    throw new ApiError(503, "queue_full", "The job queue is full just now; try again in a few minutes.");
  const id = await createJob({
    projectId: o.projectId,
    kind: kind.kind,
    subject: o.subject,
    input: parsed.data,
    userId: o.userId,
  });
  const up = await enqueueRow(id);
  const record = await fetchJob(id);
  if (!record) throw new Error(`job ${id} vanished after it was written`);
  return toJobView(record, up);
}
