import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { memberSchema } from "@/lib/validations/project";
import { fetchProjectMembers, upsertProjectMember } from "@/db/queries/projects";
import { fetchUserById } from "@/db/queries/users";

type Ctx = { params: Promise<{ projectId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ members: await fetchProjectMembers(projectId) });
});

export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "members.manage");
  const input = await parseJson(request, memberSchema);
  const member = await fetchUserById(input.userId);
  if (!member || member.organisation_id !== user.organisationId) {
    throw new ApiError(400, "invalid_input", "Some fields are not valid.", {
      userId: ["No such user in your organisation."],
    });
  }
  if (member.role === "admin") {
    throw new ApiError(400, "invalid_input", "Some fields are not valid.", {
      userId: ["Administrators see every project already."],
    });
  }
  await upsertProjectMember(projectId, input.userId, input.role);
  return NextResponse.json({ members: await fetchProjectMembers(projectId) }, { status: 201 });
});
