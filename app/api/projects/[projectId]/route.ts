import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";

type Ctx = { params: Promise<{ projectId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { project, role } = await requireProjectAccess(
    user,
    parseId((await params).projectId, "The project"),
    "project.view",
  );
  return NextResponse.json({ project, role });
});
