import type { Knex } from "knex";
import { getDb } from "../index";
import type { ProbabilisticOutcome, StoredProbabilistic } from "../../lib/probabilistic/types";

function toStored(r: Record<string, unknown>): StoredProbabilistic {
  return {
    id: r.id as number,
    runId: r.run_id as number,
    jobId: r.job_id as number,
    settings: JSON.parse(r.settings as string),
    outcome: JSON.parse(r.result as string) as ProbabilisticOutcome,
    createdByName: r.user_name as string,
    createdAt: new Date(r.created_at as Date).toISOString(),
  };
}

/** Keeps a probabilistic job's result; called inside the transaction that ends the job. */
export async function insertProbabilisticResult(
  o: {
    projectId: number;
    runId: number;
    jobId: number;
    settings: unknown;
    outcome: ProbabilisticOutcome;
    userId: number;
  },
  db: Knex = getDb(),
): Promise<number> {
  const [id] = await db("probabilistic_results").insert({
    project_id: o.projectId,
    run_id: o.runId,
    job_id: o.jobId,
    settings: JSON.stringify(o.settings),
    result: JSON.stringify(o.outcome),
    created_by: o.userId,
  });
  return id;
}

/** The run's latest probabilistic result, or null. */
export async function fetchLatestProbabilistic(
  projectId: number,
  runId: number,
  db: Knex = getDb(),
): Promise<StoredProbabilistic | null> {
  const row = await db("probabilistic_results as p")
    .join("users as u", "u.id", "p.created_by")
    .where({ "p.project_id": projectId, "p.run_id": runId })
    .orderBy("p.id", "desc")
    .first("p.*", "u.name as user_name");
  return row ? toStored(row) : null;
}

export async function countProbabilisticResults(runId: number, db: Knex = getDb()): Promise<number> {
  const row = await db("probabilistic_results").where({ run_id: runId }).count({ n: "*" }).first();
  return Number(row?.n ?? 0);
}

/** The project's own target β with its reason, or null for the default. */
export async function fetchReliabilityTargetRow(
  projectId: number,
  db: Knex = getDb(),
): Promise<{ beta: number; reason: string; updatedByName: string } | null> {
  const row = await db("project_reliability_targets as t")
    .join("users as u", "u.id", "t.updated_by")
    .where("t.project_id", projectId)
    .first("t.target_beta", "t.reason", "u.name as user_name");
  return row
    ? { beta: Number(row.target_beta), reason: row.reason as string, updatedByName: row.user_name as string }
    : null;
}

/** Sets the project's target β; the default value removes the project's own. */
export async function saveReliabilityTarget(
  o: { projectId: number; beta: number; reason: string; userId: number; isDefault: boolean },
  db: Knex = getDb(),
): Promise<void> {
  if (o.isDefault) {
    await db("project_reliability_targets").where({ project_id: o.projectId }).delete();
    return;
  }
  await db("project_reliability_targets")
    .insert({ project_id: o.projectId, target_beta: o.beta, reason: o.reason, updated_by: o.userId })
    .onConflict(["project_id"])
    .merge({ target_beta: o.beta, reason: o.reason, updated_by: o.userId, updated_at: db.fn.now() });
}
