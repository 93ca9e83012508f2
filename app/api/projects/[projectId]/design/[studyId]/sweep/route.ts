import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { sweepSettingsSchema } from "@/lib/design";
import { designStudySubject } from "@/lib/jobs/design-sweep-job";
import { queueDesignSweep } from "@/lib/jobs/queue-design-sweep";
import { readLatestJob } from "@/lib/jobs/read-job";
import { requireStudy } from "@/lib/design/study-access";

type Ctx = { params: Promise<{ projectId: string; studyId: string }> };

const runSweepSchema = z.object({ settings: sweepSettingsSchema });

/**
 * Queues the study's sweep for a worker (lib/jobs), with the study's parameters and the project's
 * materials frozen in the job. Answers 202 with the job; the page polls /api/projects/:id/jobs/:jobId.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const { study, projectId, userId } = await requireStudy(params, "design.sweep");
  const { settings } = await parseJson(request, runSweepSchema);
  const job = await queueDesignSweep({ study, projectId, userId, settings });
  return NextResponse.json({ job }, { status: 202 });
});

/** The study's latest sweep job (or null), so a page that reloads finds a running sweep again. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { study, projectId } = await requireStudy(params, "project.view");
  return NextResponse.json({ job: await readLatestJob(projectId, designStudySubject(study.id)) });
});
