import type { Knex } from "knex";
import { getDb } from "../index";
import type { AuthorWork, QueueRun, ReviewerQueue, WorkCounts } from "../../lib/review/work-queue";

const iso = (d: unknown) => (d ? new Date(d as Date).toISOString() : null);
const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

function queueRunQuery(db: Knex, reviewerId: number) {
  return db("runs as r")
    .join("projects as p", "p.id", "r.project_id")
    .join("sections as s", "s.id", "r.section_id")
    .join("section_versions as v", "v.id", "r.section_version_id")
    .join("users as u", "u.id", "r.created_by")
    .leftJoin("runs as prev", "prev.id", "r.revises_run_id")
    .select(
      "r.id",
      "r.project_id",
      "p.name as project_name",
      "r.title",
      "s.name as section_name",
      "v.version as section_version",
      "r.loading_condition",
      "r.face",
      "r.status",
      "r.fs_bishop",
      "r.fs_fellenius",
      "r.required_fs",
      "u.name as author_name",
      "r.submitted_at",
      "r.reviewed_at",
      "r.created_at",
      "r.below_required_reason",
      db.raw("case when prev.status = 'returned' and prev.reviewed_by = ? then prev.id end as revises_returned", [
        reviewerId,
      ]),
    );
}

function toQueueRun(r: Record<string, unknown>): QueueRun {
  const status = r.status as QueueRun["status"];
  return {
    id: r.id as number,
    projectId: r.project_id as number,
    projectName: r.project_name as string,
    title: r.title as string,
    sectionName: r.section_name as string,
    sectionVersion: r.section_version as number,
    loadingCondition: r.loading_condition as string,
    face: r.face as QueueRun["face"],
    status,
    fsBishop: num(r.fs_bishop),
    fsFellenius: num(r.fs_fellenius),
    requiredFs: Number(r.required_fs),
    authorName: r.author_name as string,
    since: status === "submitted" ? iso(r.submitted_at) : status === "draft" ? null : iso(r.reviewed_at),
    createdAt: iso(r.created_at)!,
    revisesReturnedRunId: (r.revises_returned as number | null) ?? null,
    belowRequired: r.below_required_reason !== null && r.below_required_reason !== undefined,
  };
}

/** Projects where the person is a reviewer: the only ones whose runs they may decide on. */
function reviewerProjectIds(db: Knex, userId: number) {
  return db("project_members").where({ user_id: userId, role: "reviewer" }).select("project_id");
}

/**
 * Runs awaiting review across the person's reviewer projects, oldest submission first (never
 * their own), and the runs they returned whose revision has been submitted since.
 */
export async function fetchReviewerQueue(userId: number, db: Knex = getDb()): Promise<ReviewerQueue> {
  const awaiting = (
    await queueRunQuery(db, userId)
      .where("r.status", "submitted")
      .whereIn("r.project_id", reviewerProjectIds(db, userId))
      .whereNot("r.created_by", userId)
      .orderBy("r.submitted_at", "asc")
      .orderBy("r.id", "asc")
  ).map(toQueueRun);

  const revisions = (
    await queueRunQuery(db, userId)
      .where("prev.status", "returned")
      .where("prev.reviewed_by", userId)
      .whereNot("r.status", "draft")
      .orderBy("r.submitted_at", "desc")
      .limit(20)
  ).map(toQueueRun);
  const returnedIds = revisions.map((r) => r.revisesReturnedRunId!);
  const returnedRows = returnedIds.length
    ? (await queueRunQuery(db, userId).whereIn("r.id", returnedIds)).map(toQueueRun)
    : [];
  const byId = new Map(returnedRows.map((r) => [r.id, r]));
  return {
    awaiting,
    revised: revisions
      .filter((r) => byId.has(r.revisesReturnedRunId!))
      .map((revision) => ({ returned: byId.get(revision.revisesReturnedRunId!)!, revision })),
  };
}

/** A returned run still waits for its author while no revision of it has been submitted. */
function unrevised(db: Knex) {
  return db("runs as rv").whereRaw("rv.revises_run_id = r.id").whereNot("rv.status", "draft").select(db.raw("1"));
}

/** The author's drafts, returned runs still to revise, and sign-offs of the last 30 days. */
export async function fetchAuthorWork(userId: number, db: Knex = getDb()): Promise<AuthorWork> {
  const mine = () => queueRunQuery(db, userId).where("r.created_by", userId);
  const [drafts, returned, signedOff] = await Promise.all([
    mine().where("r.status", "draft").orderBy("r.created_at", "desc").limit(20),
    mine().where("r.status", "returned").whereNotExists(unrevised(db)).orderBy("r.reviewed_at", "asc"),
    mine()
      .where("r.status", "approved")
      .where("r.reviewed_at", ">=", db.raw("now() - interval 30 day"))
      .orderBy("r.reviewed_at", "desc")
      .limit(10),
  ]);
  return { drafts: drafts.map(toQueueRun), returned: returned.map(toQueueRun), signedOff: signedOff.map(toQueueRun) };
}

/** The two numbers the navigation shows on every page: one small query each. */
export async function fetchWorkCounts(userId: number, db: Knex = getDb()): Promise<WorkCounts> {
  const [toReview, returned] = await Promise.all([
    db("runs as r")
      .where("r.status", "submitted")
      .whereIn("r.project_id", reviewerProjectIds(db, userId))
      .whereNot("r.created_by", userId)
      .count({ n: "*" })
      .first(),
    db("runs as r")
      .where({ "r.status": "returned", "r.created_by": userId })
      .whereNotExists(unrevised(db))
      .count({ n: "*" })
      .first(),
  ]);
  return { toReview: Number(toReview?.n ?? 0), returned: Number(returned?.n ?? 0) };
}
