import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireRunAccess } from "@/lib/review/run-access";
import { requireProjectAccess } from "@/lib/projects/access";
import { probabilisticRequestSchema } from "@/lib/probabilistic/request";
import { queueProbabilistic, readProbabilisticPanel } from "@/lib/probabilistic/panel";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

/** The run's probabilistic panel: defaults per material, the latest job, the latest result, the project's β target. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run } = await requireRunAccess(user, await params);
  return NextResponse.json(await readProbabilisticPanel(run));
});

/** Queues a probabilistic run of the kept run; 202 with the job, which the page polls. */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const p = await params;
  // The permission first: a role that may not start runs hears so whether or not the run exists.
  await requireProjectAccess(user, parseId(p.projectId, "The project"), "run.create");
  const { run } = await requireRunAccess(user, p);
  const input = await parseJson(request, probabilisticRequestSchema);
  const job = await queueProbabilistic(run, input, user.id);
  return NextResponse.json({ job }, { status: 202 });
});
