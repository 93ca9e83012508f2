/**
 * Reading a job for a page: the row, with the queue's health. A row still waiting for a queue
 * that was down is offered again here, so a page that polls also brings its job in.
 */
import { fetchJobOfProject, fetchLatestJob } from "@/db/queries/jobs";
import { queueUp } from "./queue";
import { enqueueRow } from "./reconcile";
import type { JobRecord, JobView } from "./types";
import { toJobView } from "./view";

async function withQueue(job: JobRecord): Promise<JobView> {
  if (job.state === "queued" && !job.enqueuedAt) {
    const up = await enqueueRow(job.id);
    return toJobView(up ? { ...job, enqueuedAt: new Date().toISOString() } : job, up);
  }
  const active = job.state === "queued" || job.state === "running";
  return toJobView(job, active ? await queueUp() : true);
}

export async function readJob(projectId: number, jobId: number): Promise<JobView | null> {
  const job = await fetchJobOfProject(projectId, jobId);
  return job ? withQueue(job) : null;
}

export async function readLatestJob(projectId: number, subject: string): Promise<JobView | null> {
  const job = await fetchLatestJob(projectId, subject);
  return job ? withQueue(job) : null;
}
