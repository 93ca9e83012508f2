import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { fetchRun } from "@/db/queries/runs";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  const run = await fetchRun(projectId, parseId(p.runId, "The run"));
  if (!run) throw notFound("The run");
  return NextResponse.json({ run });
});
