/**
 * A design study's slope sweep as a queue job. The input is frozen when the job is made (the
 * study's parameters, the project's materials and required FS); the result is the kept sweep.
 * Should the study's parameters have changed meanwhile, the sweep stays on the job only: it
 * describes an embankment the study no longer has.
 */
import { isDeepStrictEqual } from "node:util";
import { z } from "zod";
import {
  embankmentParamsSchema,
  planSweep,
  runSweepJob,
  runWholeSweep,
  sweepSettingsSchema,
  type StoredSweep,
  type SweepJob,
} from "@/lib/design";
import { ENGINE_VERSION, type Material } from "@/lib/stability";
import { fetchDesignStudy, saveDesignSweep } from "@/db/queries/design-studies";
import { CANCELLED, type JobKind } from "./kind";

const fs = z.coerce.number().positive();

/**
 * The project's library as engine materials, frozen as the server read them. Not re-checked field
 * by field: the engine checks each generated section itself, and a material it refuses makes an
 * error on the sweep's points (as in the browser), not a job that cannot start.
 */
const frozenMaterial = z.custom<Material>(
  (v) => typeof v === "object" && v !== null && typeof (v as { id?: unknown }).id === "string",
  "each material needs an id",
);

export const designSweepInputSchema = z.object({
  studyId: z.number().int().positive(),
  params: embankmentParamsSchema,
  materials: z.array(frozenMaterial).max(1_000),
  settings: sweepSettingsSchema,
  required: z.object({ "steady-seepage": fs, "drawdown-storage": fs, "drawdown-surcharge": fs }),
  /**
   * Set when the job checks a sweep that ran in a browser: the kept sweep says where and how it
   * ran there, with the server's own points (lib/design/keep-sweep.ts).
   */
  ranInBrowser: z
    .object({
      elapsedMs: z.number().min(0),
      workers: z.number().int().min(1).max(64),
      finishedAt: z.string().max(40),
    })
    .optional(),
});

export type DesignSweepInput = z.infer<typeof designSweepInputSchema>;

/** The recheck of the recommended pair adds one job per case (lib/design/sweep-runner.ts). */
const RECHECK_JOBS = 3;

export const designSweepKind: JobKind<DesignSweepInput, StoredSweep> = {
  kind: "design-sweep",
  action: "design.sweep",
  input: designSweepInputSchema,
  units: (input) => planSweep(input.params, input.settings).length + RECHECK_JOBS,
  // A kept sweep holds at most 500 points (storedSweepSchema).
  maxUnits: 500,
  unitName: "sweep jobs",
  async run(input, ctx) {
    const t0 = Date.now();
    const execute = async (job: SweepJob) => {
      // Let the worker renew its hold on the job and read a cancel between searches.
      await new Promise((r) => setImmediate(r));
      return runSweepJob(input.params, input.materials, job, input.settings);
    };
    const out = await runWholeSweep({
      params: input.params,
      settings: input.settings,
      required: input.required,
      execute,
      concurrency: 1,
      onProgress: (p) => ctx.progress(p.done, p.total),
      isCancelled: () => ctx.cancelled(),
    });
    if (out.cancelled) return CANCELLED;
    if (input.ranInBrowser)
      return {
        settings: input.settings,
        points: out.points,
        ranOn: "browser",
        engineVersion: ENGINE_VERSION,
        ...input.ranInBrowser,
      };
    return {
      settings: input.settings,
      points: out.points,
      ranOn: "server",
      elapsedMs: Date.now() - t0,
      workers: 1,
      engineVersion: ENGINE_VERSION,
      finishedAt: new Date().toISOString(),
    };
  },
  async commit(trx, job, input, sweep) {
    const study = await fetchDesignStudy(job.projectId, input.studyId, trx);
    if (!study || !isDeepStrictEqual(embankmentParamsSchema.parse(study.parameters), input.params)) return;
    await saveDesignSweep({ projectId: job.projectId, studyId: input.studyId, sweep }, trx);
  },
};

export const designStudySubject = (studyId: number) => `design-study:${studyId}`;
