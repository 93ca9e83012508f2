import type { Knex } from "knex";
import { getDb } from "../index";
import { createSection } from "./sections";

type NewSection = Parameters<typeof createSection>[0];

import type { RunSummary, RunDetail, ChainLink, RunExportRow } from "../../lib/runs/types";
// Re-exported so callers written before the move still compile; new code imports lib/runs/types.
export type { RunSummary, RunDetail, ChainLink, RunExportRow };

const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

export function toRunSummary(r: Record<string, unknown>): RunSummary {
  return {
    id: r.id as number,
    projectId: r.project_id as number,
    sectionId: r.section_id as number,
    sectionName: r.section_name as string,
    sectionVersion: r.section_version as number,
    title: r.title as string,
    status: r.status as RunSummary["status"],
    loadCase: r.load_case as RunSummary["loadCase"],
    face: r.face as RunSummary["face"],
    methods: String(r.methods).split(",").filter(Boolean),
    requiredFs: Number(r.required_fs),
    fsBishop: num(r.fs_bishop),
    fsFellenius: num(r.fs_fellenius),
    authorId: r.created_by as number,
    authorName: r.author_name as string,
    createdAt: new Date(r.created_at as Date).toISOString(),
    revisesRunId: (r.revises_run_id as number) ?? null,
    loadingCondition: r.loading_condition as string,
    waterCondition: r.water_condition_id
      ? { id: r.water_condition_id as string, name: r.water_condition_name as string }
      : null,
    belowRequiredReason: (r.below_required_reason as string | null) ?? null,
  };
}

export function runSummaryQuery(db: Knex) {
  return db("runs as r")
    .join("sections as s", "s.id", "r.section_id")
    .join("section_versions as v", "v.id", "r.section_version_id")
    .join("users as u", "u.id", "r.created_by")
    .select(
      "r.id",
      "r.project_id",
      "r.section_id",
      "s.name as section_name",
      "v.version as section_version",
      "r.title",
      "r.status",
      "r.load_case",
      "r.face",
      "r.methods",
      "r.required_fs",
      "r.fs_bishop",
      "r.fs_fellenius",
      "r.created_by",
      "u.name as author_name",
      "r.created_at",
      "r.revises_run_id",
      "r.loading_condition",
      "r.water_condition_id",
      "r.water_condition_name",
      "r.below_required_reason",
    );
}

export async function fetchRunsOfProject(projectId: number, db: Knex = getDb()): Promise<RunSummary[]> {
  const rows = await runSummaryQuery(db)
    .where("r.project_id", projectId)
    .orderBy("r.created_at", "desc")
    .orderBy("r.id", "desc");
  return rows.map(toRunSummary);
}

export async function fetchRun(projectId: number, runId: number, db: Knex = getDb()): Promise<RunDetail | null> {
  const row = await runSummaryQuery(db)
    .select("r.engine_version", "r.document", "r.result", "r.slice_tables")
    .where({ "r.id": runId, "r.project_id": projectId })
    .first();
  if (!row) return null;
  return {
    ...toRunSummary(row),
    engineVersion: row.engine_version,
    document: JSON.parse(row.document),
    result: JSON.parse(row.result),
    sliceTables: JSON.parse(row.slice_tables),
  };
}

export async function fetchRunsByIds(projectId: number, ids: number[], db: Knex = getDb()): Promise<RunDetail[]> {
  const out: RunDetail[] = [];
  for (const id of ids) {
    const run = await fetchRun(projectId, id, db);
    if (run) out.push(run);
  }
  return out;
}

export interface NewRun {
  projectId: number;
  sectionId: number;
  sectionVersionId: number;
  title: string;
  loadingCondition: string;
  waterCondition?: { id: string; name: string } | null;
  loadCase: "steady" | "drawdown" | "undrained";
  face: "upstream" | "downstream";
  methods: string[];
  requiredFs: number;
  fsBishop: number | null;
  fsFellenius: number | null;
  engineVersion: string;
  document: unknown;
  result: unknown;
  sliceTables: unknown;
  userId: number;
  revisesRunId?: number | null;
}

/** The run a new one claims to revise is not a run of the same project. */
export class RevisedRunNotFoundError extends Error {
  constructor(readonly runId: number) {
    super(`run ${runId} is not a run of this project`);
  }
}

/** The project a run belongs to, or null when there is no such run. */
export async function fetchRunProjectId(runId: number, db: Knex = getDb()): Promise<number | null> {
  const row = await db("runs").where({ id: runId }).first("project_id");
  return row ? (row.project_id as number) : null;
}

/**
 * Inserts a run. The run it revises is locked and must belong to the same project, so it can
 * neither be deleted meanwhile nor come from another project (RevisedRunNotFoundError).
 */
export async function createRun(run: NewRun, db: Knex = getDb()): Promise<number> {
  return db.transaction(async (trx) => {
    if (run.revisesRunId) {
      const revised = await trx("runs").where({ id: run.revisesRunId }).forShare().first("project_id");
      if (!revised || revised.project_id !== run.projectId) throw new RevisedRunNotFoundError(run.revisesRunId);
    }
    const [id] = await trx("runs").insert({
      project_id: run.projectId,
      section_id: run.sectionId,
      section_version_id: run.sectionVersionId,
      revises_run_id: run.revisesRunId ?? null,
      title: run.title,
      loading_condition: run.loadingCondition,
      water_condition_id: run.waterCondition?.id ?? null,
      water_condition_name: run.waterCondition?.name ?? null,
      load_case: run.loadCase,
      face: run.face,
      methods: run.methods.join(","),
      required_fs: run.requiredFs,
      fs_bishop: run.fsBishop,
      fs_fellenius: run.fsFellenius,
      engine_version: run.engineVersion,
      document: JSON.stringify(run.document),
      result: JSON.stringify(run.result),
      slice_tables: JSON.stringify(run.sliceTables),
      created_by: run.userId,
    });
    return id;
  });
}

/** A new section (version 1) and a run on that version, both or neither. */
export async function createSectionWithRun(
  section: Omit<NewSection, "projectId" | "userId">,
  run: Omit<NewRun, "sectionId" | "sectionVersionId">,
  db: Knex = getDb(),
): Promise<{ sectionId: number; runId: number }> {
  return db.transaction(async (trx) => {
    const sectionId = await createSection({ ...section, projectId: run.projectId, userId: run.userId }, trx);
    const version = await trx("section_versions").where({ section_id: sectionId, version: 1 }).first("id");
    const runId = await createRun({ ...run, sectionId, sectionVersionId: version.id as number }, trx);
    return { sectionId, runId };
  });
}

/** A draft's new title, with its audit line. The database refuses it for a run that left draft. */
export async function renameDraftRun(runId: number, title: string, actorId: number, db: Knex = getDb()): Promise<void> {
  await db.transaction(async (trx) => {
    const row = await trx("runs").where({ id: runId }).forUpdate().first("status", "title");
    if (!row || row.status !== "draft") throw new Error("run_frozen: only a draft can be renamed");
    await trx("runs").where({ id: runId, status: "draft" }).update({ title });
    await trx("run_events").insert({
      run_id: runId,
      actor_id: actorId,
      kind: "renamed",
      note: `Renamed from “${row.title}” to “${title}”.`,
    });
  });
}

/** Runs that name this one as the run they revise. */
export async function fetchRevisionIds(runId: number, db: Knex = getDb()): Promise<number[]> {
  const rows = await db("runs").where({ revises_run_id: runId }).orderBy("id").select("id");
  return rows.map((r: { id: number }) => r.id);
}

/** Deletes a draft with its comments and audit lines; the database refuses any other status. */
export async function deleteDraftRun(runId: number, db: Knex = getDb()): Promise<boolean> {
  return db.transaction(async (trx) => {
    const n = await trx("runs").where({ id: runId, status: "draft" }).delete();
    return n > 0;
  });
}

/**
 * The revisions a run belongs to, oldest first: the runs it revises, back to the first, and the
 * runs that revise it, forward along each first revision.
 */
export async function fetchRevisionChain(projectId: number, runId: number, db: Knex = getDb()): Promise<ChainLink[]> {
  const rows = (await db("runs")
    .where({ project_id: projectId })
    .select("id", "title", "status", "created_at", "revises_run_id", "below_required_reason")) as {
    id: number;
    title: string;
    status: RunSummary["status"];
    created_at: Date;
    revises_run_id: number | null;
    below_required_reason: string | null;
  }[];
  const byId = new Map(rows.map((r) => [r.id, r]));
  const link = (r: (typeof rows)[number]): ChainLink => ({
    id: r.id,
    title: r.title,
    status: r.status,
    createdAt: new Date(r.created_at).toISOString(),
    belowRequired: r.below_required_reason !== null,
  });
  const start = byId.get(runId);
  if (!start) return [];
  const back: ChainLink[] = [];
  const seen = new Set<number>([runId]);
  for (let r = start; r.revises_run_id !== null && byId.has(r.revises_run_id) && !seen.has(r.revises_run_id);) {
    r = byId.get(r.revises_run_id)!;
    seen.add(r.id);
    back.unshift(link(r));
  }
  const forward: ChainLink[] = [];
  for (let id: number | undefined = runId; id !== undefined;) {
    const next = rows.filter((r) => r.revises_run_id === id && !seen.has(r.id)).sort((a, b) => a.id - b.id)[0];
    if (!next) break;
    seen.add(next.id);
    forward.push(link(next));
    id = next.id;
  }
  return [...back, link(start), ...forward];
}

/** The project's runs with who signed them off, for the runs CSV. */
export async function fetchRunsForExport(projectId: number, db: Knex = getDb()): Promise<RunExportRow[]> {
  const rows = await runSummaryQuery(db)
    .leftJoin("users as rv", "rv.id", "r.reviewed_by")
    .select("rv.name as reviewed_name", "r.reviewed_at")
    .where("r.project_id", projectId)
    .orderBy("r.id");
  return rows.map((r: Record<string, unknown>) => ({
    ...toRunSummary(r),
    reviewedByName: (r.reviewed_name as string) ?? null,
    reviewedAt: r.reviewed_at ? new Date(r.reviewed_at as Date).toISOString() : null,
  }));
}
