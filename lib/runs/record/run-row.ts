/** What a kept run's row is made of: the one place a run record's fields meet the runs table's. */
import { ApiError } from "@/lib/api/errors";
import { loadingCondition } from "@/lib/analysis/required-fs";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { ENGINE_VERSION } from "@/lib/stability";
import type { NewRun } from "@/db/queries/runs";
import type { RunRecord } from "./run-record";

export interface RunMeta {
  projectId: number;
  userId: number;
  title: string;
  setup: RunSetup;
  revisesRunId?: number | null;
}

export const revisedNotFound = (id: number) =>
  new ApiError(404, "not_found", `Run ${id}, which this run says it revises, was not found in this project.`, {
    revisesRunId: ["Choose a run of this project."],
  });

/** The row of a run from its record: the one place the record's fields meet the table's. */
export function runRow(record: RunRecord, meta: RunMeta): Omit<NewRun, "sectionId" | "sectionVersionId"> {
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
