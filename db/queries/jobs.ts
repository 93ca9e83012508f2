import type { Knex } from "knex";
import { getDb } from "../index";
import type { JobRecord, JobState } from "../../lib/jobs/types";

const iso = (v: unknown) => (v ? new Date(v as Date).toISOString() : null);

function toRecord(r: Record<string, unknown>): JobRecord {
  return {
    id: r.id as number,
    projectId: r.project_id as number,
    kind: r.kind as string,
    subject: r.subject as string,
    state: r.state as JobState,
    // Written by this module from checked values.
    input: JSON.parse(r.input as string),
    result: r.result ? JSON.parse(r.result as string) : null,
    error: (r.error as string | null) ?? null,
    done: r.progress_done as number,
    total: r.progress_total as number,
    attempts: r.attempts as number,
    cancelRequested: Boolean(r.cancel_requested),
    worker: (r.worker as string | null) ?? null,
    createdBy: r.created_by as number,
    createdAt: iso(r.created_at)!,
    enqueuedAt: iso(r.enqueued_at),
    startedAt: iso(r.started_at),
    finishedAt: iso(r.finished_at),
  };
}

export async function createJob(
  input: { projectId: number; kind: string; subject: string; input: unknown; userId: number },
  db: Knex = getDb(),
): Promise<number> {
  const [id] = await db("jobs").insert({
    project_id: input.projectId,
    kind: input.kind,
    subject: input.subject,
    state: "queued",
    input: JSON.stringify(input.input),
    created_by: input.userId,
  });
  return id;
}

export async function fetchJob(id: number, db: Knex = getDb()): Promise<JobRecord | null> {
  const row = await db("jobs").where({ id }).first();
  return row ? toRecord(row) : null;
}

export async function fetchJobOfProject(projectId: number, id: number, db: Knex = getDb()): Promise<JobRecord | null> {
  const row = await db("jobs").where({ id, project_id: projectId }).first();
  return row ? toRecord(row) : null;
}

/** The newest job about a subject (a study, a run), so a page that reloads finds it again. */
export async function fetchLatestJob(projectId: number, subject: string, db: Knex = getDb()) {
  const row = await db("jobs").where({ project_id: projectId, subject }).orderBy("id", "desc").first();
  return row ? toRecord(row) : null;
}

export async function countActiveJobs(projectId: number | null, db: Knex = getDb()): Promise<number> {
  const q = db("jobs").whereIn("state", ["queued", "running"]);
  if (projectId !== null) q.andWhere("project_id", projectId);
  const [{ n }] = await q.count({ n: "*" });
  return Number(n);
}

export async function markEnqueued(id: number, db: Knex = getDb()): Promise<void> {
  await db("jobs")
    .where({ id })
    .whereNull("enqueued_at")
    .update({ enqueued_at: db.fn.now(3) });
}

/** Queued jobs whose queue was down when they were made, oldest first. */
export async function fetchUnenqueuedJobs(limit: number, db: Knex = getDb()): Promise<number[]> {
  const rows = await db("jobs").where("state", "queued").whereNull("enqueued_at").orderBy("id").limit(limit);
  return rows.map((r: { id: number }) => r.id);
}

/** Waiting or running jobs that were handed to the queue, for checking the queue still holds them. */
export async function fetchEnqueuedActiveJobs(limit: number, db: Knex = getDb()): Promise<number[]> {
  const rows = await db("jobs")
    .whereIn("state", ["queued", "running"])
    .whereNotNull("enqueued_at")
    .orderBy("id")
    .limit(limit);
  return rows.map((r: { id: number }) => r.id);
}

/**
 * A worker takes the job: running, one more attempt. Returns null when the job is no longer
 * waiting or running (cancelled, or finished by an earlier attempt that died after committing).
 */
export async function claimJob(id: number, worker: string, db: Knex = getDb()): Promise<JobRecord | null> {
  const n = await db("jobs")
    .where({ id })
    .whereIn("state", ["queued", "running"])
    .update({
      state: "running",
      worker,
      attempts: db.raw("attempts + 1"),
      started_at: db.fn.now(3),
      updated_at: db.fn.now(3),
    });
  return n > 0 ? fetchJob(id, db) : null;
}

export async function saveJobProgress(id: number, done: number, total: number, db: Knex = getDb()): Promise<void> {
  await db("jobs")
    .where({ id, state: "running" })
    .update({ progress_done: done, progress_total: total, updated_at: db.fn.now(3) });
}

export async function isCancelRequested(id: number, db: Knex = getDb()): Promise<boolean> {
  const row = await db("jobs").where({ id }).first("cancel_requested");
  return !row || Boolean(row.cancel_requested);
}

/**
 * Asks to cancel. A job still waiting is cancelled at once; a running one stops at its next
 * check. Returns the job's state after the request, or null when there is no such job.
 */
export async function requestCancel(projectId: number, id: number, db: Knex = getDb()): Promise<JobState | null> {
  return db.transaction(async (trx) => {
    const row = await trx("jobs").where({ id, project_id: projectId }).forUpdate().first();
    if (!row) return null;
    if (row.state === "queued") {
      await trx("jobs")
        .where({ id })
        .update({ state: "cancelled", cancel_requested: true, finished_at: trx.fn.now(3), updated_at: trx.fn.now(3) });
      return "cancelled";
    }
    if (row.state === "running") await trx("jobs").where({ id }).update({ cancel_requested: true });
    return row.state as JobState;
  });
}

/** Ends a job that was cancelled while running; nothing of its work is kept. */
export async function markCancelled(id: number, db: Knex = getDb()): Promise<void> {
  await db("jobs")
    .where({ id })
    .whereIn("state", ["queued", "running"])
    .update({ state: "cancelled", finished_at: db.fn.now(3), updated_at: db.fn.now(3) });
}

export async function markFailed(id: number, error: string, db: Knex = getDb()): Promise<void> {
  await db("jobs")
    .where({ id })
    .whereIn("state", ["queued", "running"])
    .update({ state: "failed", error: error.slice(0, 1000), finished_at: db.fn.now(3), updated_at: db.fn.now(3) });
}

/** A worker that will try again later puts the job back to waiting. */
export async function markRetrying(id: number, error: string, db: Knex = getDb()): Promise<void> {
  await db("jobs")
    .where({ id, state: "running" })
    .update({ state: "queued", error: error.slice(0, 1000), updated_at: db.fn.now(3) });
}

/**
 * Ends a job in one transaction: `commit` writes what the result changes elsewhere, then the job
 * row gets its result (what `commit` returned, when it returned something). A job cancelled
 * meanwhile keeps nothing. Returns the state it ended in.
 */
export async function finishJob(
  id: number,
  result: unknown,
  commit: (trx: Knex, job: JobRecord) => Promise<unknown>,
  db: Knex = getDb(),
): Promise<JobState> {
  return db.transaction(async (trx) => {
    const row = await trx("jobs").where({ id }).forUpdate().first();
    if (!row) return "cancelled";
    const job = toRecord(row);
    if (job.state !== "running" && job.state !== "queued") return job.state;
    if (job.cancelRequested) {
      await trx("jobs")
        .where({ id })
        .update({ state: "cancelled", finished_at: trx.fn.now(3), updated_at: trx.fn.now(3) });
      return "cancelled";
    }
    const kept = await commit(trx, job);
    await trx("jobs")
      .where({ id })
      .update({
        state: "done",
        result: JSON.stringify(kept === undefined ? result : kept),
        error: null,
        progress_done: trx.raw("progress_total"),
        finished_at: trx.fn.now(3),
        updated_at: trx.fn.now(3),
      });
    return "done";
  });
}
