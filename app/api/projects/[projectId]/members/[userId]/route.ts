import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { removeProjectMember } from "@/db/queries/projects";

type Ctx = { params: Promise<{ projectId: string; userId: string }> };

export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  await requireProjectAccess(user, projectId, "members.manage");
  if (!(await removeProjectMember(projectId, parseId(p.userId, "The member")))) throw notFound("The member");
  return new NextResponse(null, { status: 204 });
});
