import "server-only";
import type { RunDetail } from "@/lib/runs/types";
import { fetchChecklist, fetchReviewRecord, fetchRunComments } from "@/db/queries/review";
import { collectMaterialSources } from "@/lib/review/collect-material-sources";
import { commentLabel } from "@/lib/review/comment-label";
import type { SectionDocument } from "@/lib/stability";
import type { ReportInput } from "./build-report";
import { fetchLatestProbabilistic } from "@/db/queries/probabilistic";
import { readReliabilityTarget } from "@/lib/probabilistic/read-target";

/** Everything the report of one run shows, read from the database. */
export async function gatherReport(run: RunDetail, projectName: string, generatedBy: string): Promise<ReportInput> {
  const [review, checklist, comments, probabilistic] = await Promise.all([
    fetchReviewRecord(run.id),
    fetchChecklist(run.id),
    fetchRunComments(run.id),
    fetchLatestProbabilistic(run.projectId, run.id),
  ]);
  const frozen = review?.materialSources ?? null;
  return {
    projectName,
    run: {
      ...run,
      document: run.document as SectionDocument,
      result: run.result as ReportInput["run"]["result"],
      sliceTables: run.sliceTables as ReportInput["run"]["sliceTables"],
    },
    review: {
      submittedByName: review?.submittedByName ?? null,
      submittedAt: review?.submittedAt ?? null,
      reviewedByName: review?.reviewedByName ?? null,
      reviewedAt: review?.reviewedAt ?? null,
      reviewNote: review?.reviewNote ?? null,
      belowRequiredReason: review?.belowRequiredReason ?? null,
    },
    checklist,
    comments: comments.map((c, i) => ({
      label: commentLabel(c, i),
      authorName: c.authorName,
      body: c.body,
      createdAt: c.createdAt,
    })),
    materials: frozen ?? (await collectMaterialSources(run.projectId, run.document as SectionDocument)),
    sourcesFrozen: frozen !== null,
    generatedAt: new Date().toISOString(),
    generatedBy,
    ...(probabilistic
      ? { probabilistic: { stored: probabilistic, target: await readReliabilityTarget(run.projectId) } }
      : {}),
  };
}
