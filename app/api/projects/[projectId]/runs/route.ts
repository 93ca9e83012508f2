import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { createRunSchema } from "@/lib/validations/run";
import { keepRun } from "@/lib/runs/record/save-run";
import { fetchRunsOfProject } from "@/db/queries/runs";

type Ctx = { params: Promise<{ projectId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ runs: await fetchRunsOfProject(projectId) });
});

/**
 * Keeps a run. The server searches the stored section version with the set-up itself and stores
 * its own result; the browser's result is a preview, and `preview` in the answer says whether it
 * matched (lib/runs/record/save-run.ts). A set-up past QUEUE_SEARCH_CIRCLES answers 202 with a job.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "run.create");
  const input = await parseJson(request, createRunSchema);
  const kept = await keepRun({
    projectId,
    userId: user.id,
    sectionId: input.sectionId,
    sectionVersion: input.sectionVersion,
    title: input.title,
    setup: input.setup,
    preview: input.result,
    revisesRunId: input.revisesRunId ?? null,
  });
  // A large search runs on the job queue: 202 with the job, which keeps the run when it ends.
  if ("job" in kept) return NextResponse.json({ job: kept.job }, { status: 202 });
  return NextResponse.json({ run: { id: kept.id }, preview: kept.previewCheck }, { status: 201 });
});
