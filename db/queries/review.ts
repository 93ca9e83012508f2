import type { Knex } from "knex";
import { getDb } from "../index";
import type { RunStatus } from "../../lib/review/status";
import type { ChecklistEntry, ChecklistKey, CheckState } from "../../lib/review/checklist";
import type { MaterialSourceRecord } from "../../lib/review/material-sources";
import type { RunEvent, RunComment, ReviewRecord } from "../../lib/review/types";
// Re-exported so callers written before the move still compile; new code imports lib/review/types.
export type { RunEvent, RunComment, ReviewRecord };

/** A change refused because the run is no longer in the state it was read in, or is frozen. */
export class RunStateError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "RunStateError";
  }
}

const iso = (d: unknown) => (d ? new Date(d as Date).toISOString() : null);

/** The database's own guard (migration 006's triggers) raised this error. */
export function isFrozenRunError(err: unknown): boolean {
  return err instanceof Error && /run_frozen:/.test(err.message);
}

export async function fetchReviewRecord(runId: number, db: Knex = getDb()): Promise<ReviewRecord | null> {
  const r = await db("runs as r")
    .leftJoin("users as s", "s.id", "r.submitted_by")
    .leftJoin("users as v", "v.id", "r.reviewed_by")
    .where("r.id", runId)
    .select(
      "r.status",
      "r.created_by",
      "s.name as submitted_name",
      "r.submitted_at",
      "r.reviewed_by",
      "v.name as reviewed_name",
      "r.reviewed_at",
      "r.review_note",
      "r.below_required_reason",
      "r.material_sources",
    )
    .first();
  if (!r) return null;
  return {
    status: r.status,
    authorId: r.created_by,
    submittedByName: r.submitted_name ?? null,
    submittedAt: iso(r.submitted_at),
    reviewedById: r.reviewed_by ?? null,
    reviewedByName: r.reviewed_name ?? null,
    reviewedAt: iso(r.reviewed_at),
    reviewNote: r.review_note ?? null,
    belowRequiredReason: r.below_required_reason ?? null,
    materialSources: r.material_sources ? JSON.parse(r.material_sources) : null,
  };
}

export async function fetchRunEvents(runId: number, db: Knex = getDb()): Promise<RunEvent[]> {
  const rows = await db("run_events as e")
    .leftJoin("users as u", "u.id", "e.actor_id")
    .where("e.run_id", runId)
    .orderBy("e.id")
    .select("e.id", "e.kind", "e.from_status", "e.to_status", "e.note", "u.name as actor_name", "e.created_at");
  return rows.map((r: Record<string, unknown>) => ({
    id: r.id as number,
    kind: r.kind as string,
    fromStatus: (r.from_status as RunStatus) ?? null,
    toStatus: (r.to_status as RunStatus) ?? null,
    note: r.note as string,
    actorName: (r.actor_name as string) ?? null,
    createdAt: iso(r.created_at)!,
  }));
}

export async function recordRunEvent(
  event: {
    runId: number;
    actorId: number | null;
    kind: string;
    note: string;
    fromStatus?: RunStatus;
    toStatus?: RunStatus;
  },
  db: Knex = getDb(),
): Promise<void> {
  await db("run_events").insert({
    run_id: event.runId,
    actor_id: event.actorId,
    kind: event.kind,
    from_status: event.fromStatus ?? null,
    to_status: event.toStatus ?? null,
    note: event.note.slice(0, 60000),
  });
}

export interface TransitionWrite {
  runId: number;
  actorId: number;
  from: RunStatus;
  to: RunStatus;
  note: string;
  /** Frozen with the run when it is submitted. */
  materialSources?: MaterialSourceRecord[];
  /** Signing off below the required FS: the reviewer's reason, kept with the run. */
  belowRequiredReason?: string | null;
}

/**
 * Moves a run from one status to the next with its audit line, in one transaction. The row is
 * locked and its status checked again, so two reviewers deciding at once cannot both win.
 */
export async function applyTransition(w: TransitionWrite, db: Knex = getDb()): Promise<void> {
  await db.transaction(async (trx) => {
    const row = await trx("runs").where({ id: w.runId }).forUpdate().first("status");
    if (!row) throw new RunStateError("The run no longer exists.");
    if (row.status !== w.from)
      throw new RunStateError(`The run is now ${row.status}, not ${w.from}; reload the page to see who changed it.`);
    const now = trx.fn.now();
    const patch: Record<string, unknown> = { status: w.to };
    if (w.to === "submitted") {
      Object.assign(patch, {
        submitted_by: w.actorId,
        submitted_at: now,
        material_sources: JSON.stringify(w.materialSources ?? []),
      });
    } else {
      Object.assign(patch, { reviewed_by: w.actorId, reviewed_at: now, review_note: w.note || null });
      if (w.to === "approved") patch.below_required_reason = w.belowRequiredReason || null;
    }
    await trx("runs").where({ id: w.runId, status: w.from }).update(patch);
    // The audit line keeps the reason too, so the trail alone shows the sign-off was deliberate.
    const note = w.belowRequiredReason
      ? `${w.note ? `${w.note}\n` : ""}Signed off below the required FS. Reason: ${w.belowRequiredReason}`
      : w.note;
    await recordRunEvent(
      { runId: w.runId, actorId: w.actorId, kind: "status", fromStatus: w.from, toStatus: w.to, note },
      trx,
    );
  });
}

function toComment(r: Record<string, unknown>): RunComment {
  const hasPin = r.pin_x !== null && r.pin_y !== null;
  return {
    id: r.id as number,
    authorId: r.author_id as number,
    authorName: r.author_name as string,
    body: r.body as string,
    pin: hasPin ? { x: Number(r.pin_x), y: Number(r.pin_y) } : null,
    slice:
      r.slice_number !== null
        ? { number: r.slice_number as number, method: (r.slice_method as "bishop" | "fellenius") ?? "bishop" }
        : null,
    createdAt: iso(r.created_at)!,
  };
}

export async function fetchRunComments(runId: number, db: Knex = getDb()): Promise<RunComment[]> {
  const rows = await db("run_comments as c")
    .join("users as u", "u.id", "c.author_id")
    .where("c.run_id", runId)
    .orderBy("c.id")
    .select("c.*", "u.name as author_name");
  return rows.map(toComment);
}

export interface NewComment {
  runId: number;
  authorId: number;
  body: string;
  pin: { x: number; y: number } | null;
  slice: { number: number; method: "bishop" | "fellenius" } | null;
}

/** Saves a comment and its audit line together. */
export async function addRunComment(c: NewComment, db: Knex = getDb()): Promise<number> {
  return db.transaction(async (trx) => {
    const row = await trx("runs").where({ id: c.runId }).forUpdate().first("status");
    if (!row) throw new RunStateError("The run no longer exists.");
    if (row.status === "approved") throw new RunStateError("This run is signed off and takes no more comments.");
    const [id] = await trx("run_comments").insert({
      run_id: c.runId,
      author_id: c.authorId,
      body: c.body,
      pin_x: c.pin?.x ?? null,
      pin_y: c.pin?.y ?? null,
      slice_number: c.slice?.number ?? null,
      slice_method: c.slice?.method ?? null,
    });
    const where = c.pin
      ? ` at (${c.pin.x.toFixed(2)}, ${c.pin.y.toFixed(2)}) m`
      : c.slice
        ? ` on slice ${c.slice.number}`
        : "";
    await recordRunEvent(
      { runId: c.runId, actorId: c.authorId, kind: "comment", note: `Comment${where}: ${c.body}` },
      trx,
    );
    return id;
  });
}

export async function fetchChecklist(runId: number, db: Knex = getDb()): Promise<ChecklistEntry[]> {
  const rows = await db("run_checklist_items as i")
    .join("users as u", "u.id", "i.updated_by")
    .where("i.run_id", runId)
    .select("i.*", "u.name as user_name");
  return rows.map((r: Record<string, unknown>) => ({
    key: r.item_key as ChecklistKey,
    state: r.state as CheckState,
    note: r.note as string,
    updatedByName: r.user_name as string,
    updatedAt: iso(r.updated_at)!,
  }));
}

/** Upserts checklist items while the run is still awaiting review, with one audit line. */
export async function saveChecklist(
  runId: number,
  userId: number,
  items: readonly { key: ChecklistKey; state: CheckState; note: string }[],
  summary: string,
  db: Knex = getDb(),
): Promise<void> {
  await db.transaction(async (trx) => {
    const row = await trx("runs").where({ id: runId }).forUpdate().first("status");
    if (!row || row.status !== "submitted")
      throw new RunStateError("The checklist can only change while the run is awaiting review.");
    for (const item of items) {
      await trx("run_checklist_items")
        .insert({
          run_id: runId,
          item_key: item.key,
          state: item.state,
          note: item.note,
          updated_by: userId,
          updated_at: trx.raw("CURRENT_TIMESTAMP(3)"),
        })
        .onConflict(["run_id", "item_key"])
        .merge(["state", "note", "updated_by", "updated_at"]);
    }
    await recordRunEvent({ runId, actorId: userId, kind: "checklist", note: summary }, trx);
  });
}
