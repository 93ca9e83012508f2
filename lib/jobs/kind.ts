/**
 * The interface every job kind implements (docs/jobs.md). A kind says how to check its frozen
 * input, how much work an input is (so the web app refuses too much before anything is queued),
 * how to run it (reporting progress, stopping when cancelled) and what to write beside the job's
 * own result, inside the one transaction that ends the job.
 */
import type { ZodType } from "zod";
import type { Knex } from "@/db/index";
import type { Action } from "@/lib/permissions";
import type { JobRecord } from "./types";

/** What a running job may ask of its worker. */
export interface JobContext {
  jobId: number;
  /** 1 on the first try; a retry after a worker died counts up. */
  attempt: number;
  progress(done: number, total: number): void;
  /** True once someone asked to cancel; checked between units of work. */
  cancelled(): boolean;
}

/** Returned by `run` when it stopped because the job was cancelled. */
export const CANCELLED = Symbol("cancelled");

export interface JobKind<I = unknown, R = unknown> {
  kind: string;
  /** What a member must be allowed to do on the project to start or cancel a job of this kind. */
  action: Action;
  /** Checks the frozen input when the job is made and again when a worker takes it. */
  input: ZodType<I>;
  /** How much work the input is, in the kind's own unit (sweep jobs, samples × searches, circles). */
  units(input: I): number;
  /** The most units one job may hold; more is refused with a 400 before anything is queued. */
  maxUnits: number;
  unitName: string;
  run(input: I, ctx: JobContext): Promise<R | typeof CANCELLED>;
  /**
   * Writes what the result changes beyond the job row (a study's kept sweep, a run), with `trx`,
   * the transaction that also marks the job done: both land or neither does. What it returns, if
   * anything, is kept as the job's result instead of `run`'s (a run's id rather than the whole run).
   */
  commit?(trx: Knex, job: JobRecord, input: I, result: R): Promise<unknown>;
}
