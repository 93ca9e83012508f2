import type { Knex } from "knex";
import { getDb } from "../index";

export interface RunSummary {
  id: number;
  projectId: number;
  sectionId: number;
  sectionName: string;
  sectionVersion: number;
  title: string;
  status: "draft" | "submitted" | "returned" | "approved";
  loadCase: "steady" | "drawdown" | "undrained";
  face: "upstream" | "downstream";
  methods: string[];
  requiredFs: number;
  fsBishop: number | null;
  fsFellenius: number | null;
  authorId: number;
  authorName: string;
  createdAt: string;
  revisesRunId: number | null;
  loadingCondition: string;
}

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
  };
}

export function runSummaryQuery(db: Knex) {
  return db("runs as r")
    .join("sections as s", "s.id", "r.section_id")
    .join("section_versions as v", "v.id", "r.section_version_id")
    .join("users as u", "u.id", "r.created_by")
    .select(
      "r.id", "r.project_id", "r.section_id", "s.name as section_name", "v.version as section_version", "r.title", "r.status",
      "r.load_case", "r.face", "r.methods", "r.required_fs", "r.fs_bishop", "r.fs_fellenius", "r.created_by",
      "u.name as author_name", "r.created_at", "r.revises_run_id", "r.loading_condition",
    );
}

export async function fetchRunsOfProject(projectId: number, db: Knex = getDb()): Promise<RunSummary[]> {
  const rows = await runSummaryQuery(db).where("r.project_id", projectId).orderBy("r.created_at", "desc").orderBy("r.id", "desc");
  return rows.map(toRunSummary);
}

export interface RunDetail extends RunSummary {
  engineVersion: string;
  document: unknown;
  result: unknown;
  sliceTables: unknown;
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

export async function createRun(run: NewRun, db: Knex = getDb()): Promise<number> {
  return db.transaction(async (trx) => {
    const [id] = await trx("runs").insert({
      project_id: run.projectId,
      section_id: run.sectionId,
      section_version_id: run.sectionVersionId,
      revises_run_id: run.revisesRunId ?? null,
      title: run.title,
      loading_condition: run.loadingCondition,
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
