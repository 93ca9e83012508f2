import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { conflict } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { requireValidSection } from "@/lib/sections/check-document";
import { createSectionSchema } from "@/lib/validations/section";
import { createSection, DuplicateSectionNameError, fetchSectionsOfProject } from "@/db/queries/sections";

type Ctx = { params: Promise<{ projectId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ sections: await fetchSectionsOfProject(projectId) });
});

export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "section.edit");
  const input = await parseJson(request, createSectionSchema);
  const { document, warnings } = requireValidSection(input.document);
  // The unique key decides, under the column's collation: "máin" and "main" are one name to it.
  const id = await createSection({
    projectId,
    name: input.name,
    description: input.description,
    document,
    summary: input.summary || "First version",
    userId: user.id,
  }).catch((err: unknown) => {
    if (err instanceof DuplicateSectionNameError) throw conflict(`${err.message} Choose another name.`);
    throw err;
  });
  return NextResponse.json({ section: { id, version: 1 }, warnings }, { status: 201 });
});
