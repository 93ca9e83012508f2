/** Jobs: long work that runs on queue workers (docs/jobs.md). Plain types, shared by server and browser code. */

export const JOB_STATES = ["queued", "running", "done", "failed", "cancelled"] as const;
export type JobState = (typeof JOB_STATES)[number];

/** A job as the database keeps it (db/queries/jobs.ts). */
export interface JobRecord {
  id: number;
  projectId: number;
  kind: string;
  /** What the job belongs to, e.g. "design-study:12". */
  subject: string;
  state: JobState;
  input: unknown;
  result: unknown;
  error: string | null;
  done: number;
  total: number;
  attempts: number;
  cancelRequested: boolean;
  worker: string | null;
  createdBy: number;
  createdAt: string;
  enqueuedAt: string | null;
  startedAt: string | null;
  finishedAt: string | null;
}

/** A job as the browser sees it (GET /api/projects/:id/jobs/:jobId). */
export interface JobView {
  id: number;
  kind: string;
  state: JobState;
  done: number;
  total: number;
  attempts: number;
  error: string | null;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  /** The kind's result once the job is done, else null. */
  result: unknown;
  /** Whether the queue answered when this view was made; "down" jobs are kept and enqueued later. */
  queue: "up" | "down";
  /** A sentence for the page when something is not as usual (queue down, a retry), else null. */
  notice: string | null;
}
