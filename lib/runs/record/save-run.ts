/**
 * The one way a run is kept, for the runs route and the designer's "open as a run": the server
 * searches the stored section version itself (computeRunRecord), stores its own result, and
 * answers with how the preview compared. Route handlers only authenticate and parse.
 */
import { notFound } from "@/lib/api/errors";
import { runSetupSchema } from "@/lib/analysis/run-setup";
import type { GridSearchSuccess, SectionDocument } from "@/lib/stability";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { createRun, createSectionWithRun, fetchRunProjectId, RevisedRunNotFoundError } from "@/db/queries/runs";
import { startJob } from "@/lib/jobs/start-job";
import { runSearchKind, runSearchSubject } from "@/lib/jobs/run-search-job";
import type { JobView } from "@/lib/jobs/types";
import { QUEUE_SEARCH_CIRCLES, searchCircleCount } from "./limits";
import { revisedNotFound, runRow, type RunMeta } from "./run-row";
import { comparePreview, type PreviewCheck } from "./compare-preview";
import type { StoredSearchResult } from "./result-schema";
import { computeRunRecord } from "./run-record";
import { sectionForSeepageRun } from "./seepage-section";

export interface KeptRun {
  id: number;
  previewCheck: PreviewCheck;
}

async function checkRevises(projectId: number, revisesRunId: number | null | undefined): Promise<void> {
  if (!revisesRunId) return;
  if ((await fetchRunProjectId(revisesRunId)) !== projectId) throw revisedNotFound(revisesRunId);
}

/** A run whose search is large: it is searched and kept by a queue worker (lib/jobs/run-search-job.ts). */
export interface QueuedRun {
  job: JobView;
}

/**
 * Keeps a run of a stored section version; `preview` is what the browser computed, if it sent it.
 * A set-up past QUEUE_SEARCH_CIRCLES goes to the job queue instead of this request.
 */
export async function keepRun(
  input: RunMeta & { sectionId: number; sectionVersion: number; preview?: StoredSearchResult },
): Promise<KeptRun | QueuedRun> {
  const section = await fetchSection(input.projectId, input.sectionId);
  if (!section) throw notFound("The section");
  const version = await fetchSectionVersion(section.id, input.sectionVersion);
  if (!version) throw notFound("The section version");
  await checkRevises(input.projectId, input.revisesRunId);
  const setup = runSetupSchema.parse(input.setup);
  const document = await sectionForSeepageRun(input.projectId, section.id, version.document as SectionDocument, setup);
  if (searchCircleCount(setup.grid, setup.radii) > QUEUE_SEARCH_CIRCLES) {
    const job = await startJob(runSearchKind, {
      projectId: input.projectId,
      subject: runSearchSubject(section.id),
      userId: input.userId,
      input: {
        sectionId: section.id,
        sectionVersionId: version.id,
        document,
        setup,
        title: input.title,
        revisesRunId: input.revisesRunId ?? null,
        preview: input.preview ?? null,
      },
    });
    return { job };
  }
  const record = await computeRunRecord(document, input.setup, (server) => comparePreview(server, input.preview));
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
