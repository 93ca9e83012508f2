import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { forbidden } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { createProjectSchema } from "@/lib/validations/project";
import { createProject, fetchProjectsForUser } from "@/db/queries/projects";

export const GET = apiRoute(async () => {
  const user = await requireUser();
  return NextResponse.json({ projects: await fetchProjectsForUser(user) });
});

export const POST = apiRoute(async (request: Request) => {
  const user = await requireUser();
  if (!can(user.role, "projects.create")) throw forbidden("create projects");
  const input = await parseJson(request, createProjectSchema);
  const id = await createProject({ ...input, organisationId: user.organisationId, createdBy: user.id });
  return NextResponse.json({ project: { id, ...input } }, { status: 201 });
});
