import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { fetchConditionSettings } from "@/db/queries/loading-conditions";

type Ctx = { params: Promise<{ projectId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ conditions: await fetchConditionSettings(projectId) });
});
