/**
 * The search of a large kept run as a queue job (lib/runs/record/save-run.ts sends set-ups past
 * QUEUE_SEARCH_CIRCLES here). The section version's document and the set-up are frozen in the
 * job; the worker searches on an engine thread (computeRunRecord), and the run row is written in
 * the transaction that ends the job. The job's own result is the new run's id and the preview check.
 */
import { z } from "zod";
import { runSetupSchema } from "@/lib/analysis/run-setup";
import { searchResultSchema } from "@/lib/runs/record/result-schema";
import { comparePreview, type PreviewCheck } from "@/lib/runs/record/compare-preview";
import { computeRunRecord, type RunRecord } from "@/lib/runs/record/run-record";
import { runRow } from "@/lib/runs/record/run-row";
import { searchCircleCount, MAX_SEARCH_CIRCLES } from "@/lib/runs/record/limits";
import { storedSectionSchema } from "@/lib/sections/water-conditions";
import { createRun } from "@/db/queries/runs";
import type { JobKind } from "./kind";

export const runSearchInputSchema = z.object({
  sectionId: z.number().int().positive(),
  sectionVersionId: z.number().int().positive(),
  // With its named water conditions: the set-up picks one of them (lib/analysis/run-setup.ts).
  document: storedSectionSchema,
  setup: runSetupSchema,
  title: z.string().min(1).max(200),
  revisesRunId: z.number().int().positive().nullable(),
  preview: searchResultSchema.nullable(),
});

export type RunSearchInput = z.infer<typeof runSearchInputSchema>;

/** What the job keeps as its own result once the run is written. */
export interface RunSearchResult {
  runId: number;
  previewCheck: PreviewCheck;
}

export const runSearchKind: JobKind<RunSearchInput, RunRecord> = {
  kind: "run-search",
  action: "run.create",
  input: runSearchInputSchema,
  units: (input) => searchCircleCount(input.setup.grid, input.setup.radii),
  maxUnits: MAX_SEARCH_CIRCLES,
  unitName: "trial circles",
  async run(input, ctx) {
    ctx.progress(0, 1);
    const record = await computeRunRecord(input.document, input.setup, (server) =>
      comparePreview(server, input.preview ?? undefined),
    );
    ctx.progress(1, 1);
    return record;
  },
  async commit(trx, job, input, record): Promise<RunSearchResult> {
    const row = runRow(record, { ...input, projectId: job.projectId, userId: job.createdBy });
    const runId = await createRun(
      { ...row, sectionId: input.sectionId, sectionVersionId: input.sectionVersionId },
      trx,
    );
    return { runId, previewCheck: record.result.previewCheck };
  },
};

export const runSearchSubject = (sectionId: number) => `section:${sectionId}`;
