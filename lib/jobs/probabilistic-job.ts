/**
 * A probabilistic run of a kept run as a queue job (docs/probabilistic.md, docs/jobs.md). The
 * run's frozen document, with the spreads and sampling settings written into it, is the job's
 * input; a worker runs the engine on a thread of its own (./probabilistic-thread.ts), reports
 * progress as samples done, stops when cancelled (keeping nothing), and the result row is written
 * in the transaction that ends the job. Same seed, same numbers: a retry gives what the first try would have.
 */
import { z } from "zod";
import { ApiError } from "@/lib/api/errors";
import { MAX_SAMPLES } from "@/lib/stability";
import { probabilisticRequestSchema } from "@/lib/probabilistic/request";
import { toOutcome } from "@/lib/probabilistic/outcome";
import type { ProbabilisticOutcome } from "@/lib/probabilistic/types";
import { insertProbabilisticResult } from "@/db/queries/probabilistic";
import { CANCELLED, type JobKind } from "./kind";
import { runProbabilisticOffThread } from "./probabilistic-thread";

export const probabilisticInputSchema = z.object({
  runId: z.number().int().positive(),
  request: probabilisticRequestSchema,
  // The engine checks the document itself; a document it refuses fails the job without a retry.
  document: z.looseObject({ materials: z.array(z.looseObject({ id: z.string() })) }),
});

export type ProbabilisticInput = z.infer<typeof probabilisticInputSchema>;

/** What the job keeps as its own result once the result row is written. */
export interface ProbabilisticJobResult {
  resultId: number;
  runId: number;
}

export const probabilisticKind: JobKind<ProbabilisticInput, ProbabilisticOutcome> = {
  kind: "probabilistic",
  action: "run.create",
  input: probabilisticInputSchema,
  units: (input) => input.request.samples,
  // The bound per mode is the request schema's (MAX_SAMPLES); this is the largest of them.
  maxUnits: Math.max(...Object.values(MAX_SAMPLES)),
  unitName: "samples",
  async run(input, ctx) {
    const t0 = Date.now();
    const total = input.request.samples;
    ctx.progress(0, total);
    const result = await runProbabilisticOffThread(input.document, {
      onProgress: (f) => ctx.progress(Math.round(f * total), total),
      cancelled: () => ctx.cancelled(),
    });
    if (!result.ok)
      throw new ApiError(
        400,
        "probabilistic_input",
        `The engine refused the input: ${result.errors.map((e) => `${e.path}: ${e.message}`).join("; ")}`,
      );
    if (result.probabilisticRun.cancelled) return CANCELLED;
    return toOutcome(result, Date.now() - t0);
  },
  async commit(trx, job, input, outcome): Promise<ProbabilisticJobResult> {
    const resultId = await insertProbabilisticResult(
      {
        projectId: job.projectId,
        runId: input.runId,
        jobId: job.id,
        settings: input.request,
        outcome,
        userId: job.createdBy,
      },
      trx,
    );
    return { resultId, runId: input.runId };
  },
};

export const probabilisticSubject = (runId: number) => `run-probabilistic:${runId}`;
