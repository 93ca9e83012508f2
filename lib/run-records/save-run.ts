/**
 * The one way a run is kept, for the runs route and the designer's "open as a run": the server
 * searches the stored section version itself (computeRunRecord), stores its own result, and
 * answers with how the preview compared. Route handlers only authenticate and parse.
 */
import { ApiError, notFound } from "../api/errors";
import { loadingCondition } from "../analysis/required-fs";
import type { RunSetup } from "../analysis/run-setup";
import { ENGINE_VERSION, type GridSearchSuccess, type SectionDocument } from "../stability";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import {
  createRun,
  createSectionWithRun,
  fetchRunProjectId,
  RevisedRunNotFoundError,
  type NewRun,
} from "@/db/queries/runs";
import { comparePreview, type PreviewCheck } from "./compare-preview";
import type { StoredSearchResult } from "./result-schema";
import { computeRunRecord, type RunRecord } from "./run-record";

export interface KeptRun {
  id: number;
  previewCheck: PreviewCheck;
}

interface RunMeta {
  projectId: number;
  userId: number;
  title: string;
  setup: RunSetup;
  revisesRunId?: number | null;
}

const revisedNotFound = (id: number) =>
  new ApiError(404, "not_found", `Run ${id}, which this run says it revises, was not found in this project.`, {
    revisesRunId: ["Choose a run of this project."],
  });

/** The row of a run from its record: the one place the record's fields meet the table's. */
function runRow(record: RunRecord, meta: RunMeta): Omit<NewRun, "sectionId" | "sectionVersionId"> {
  const condition = loadingCondition(meta.setup.condition);
  return {
    projectId: meta.projectId,
    title: meta.title,
    loadingCondition: condition.key,
    waterCondition: record.waterCondition,
    loadCase: condition.engineCase,
    face: meta.setup.face,
    methods: meta.setup.methods,
    requiredFs: meta.setup.requiredFs,
    fsBishop: record.fsBishop,
    fsFellenius: record.fsFellenius,
    engineVersion: ENGINE_VERSION,
    document: record.document,
    result: record.result,
    sliceTables: record.sliceTables,
    userId: meta.userId,
    revisesRunId: meta.revisesRunId ?? null,
  };
}

async function checkRevises(projectId: number, revisesRunId: number | null | undefined): Promise<void> {
  if (!revisesRunId) return;
  if ((await fetchRunProjectId(revisesRunId)) !== projectId) throw revisedNotFound(revisesRunId);
}

/** Keeps a run of a stored section version; `preview` is what the browser computed, if it sent it. */
export async function keepRun(
  input: RunMeta & { sectionId: number; sectionVersion: number; preview?: StoredSearchResult },
): Promise<KeptRun> {
  const section = await fetchSection(input.projectId, input.sectionId);
  if (!section) throw notFound("The section");
  const version = await fetchSectionVersion(section.id, input.sectionVersion);
  if (!version) throw notFound("The section version");
  await checkRevises(input.projectId, input.revisesRunId);
  const record = await computeRunRecord(version.document as SectionDocument, input.setup, (server) =>
    comparePreview(server, input.preview),
  );
  try {
    const id = await createRun({ ...runRow(record, input), sectionId: section.id, sectionVersionId: version.id });
    return { id, previewCheck: record.result.previewCheck };
  } catch (err) {
    if (err instanceof RevisedRunNotFoundError) throw revisedNotFound(err.runId);
    throw err;
  }
}

/** Keeps a new section (its version 1) and a run on it together, or neither. */
export async function keepRunOnNewSection(
  input: RunMeta & {
    section: { name: string; description: string; document: SectionDocument; summary: string };
    compare: (server: GridSearchSuccess) => PreviewCheck;
  },
): Promise<KeptRun & { sectionId: number }> {
  const record = await computeRunRecord(input.section.document, input.setup, input.compare);
  const { sectionId, runId } = await createSectionWithRun(input.section, runRow(record, input));
  return { id: runId, sectionId, previewCheck: record.result.previewCheck };
}
