import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { fetchSection, setSectionArchived } from "@/db/queries/sections";

type Ctx = { params: Promise<{ projectId: string; sectionId: string }> };

const archiveSchema = z.object({
  archived: z.boolean({ error: "Say whether to archive the section (true or false)." }),
});

/** Archives a section or brings it back; its versions and the runs on it are kept either way. */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  const sectionId = parseId(p.sectionId, "The section");
  await requireProjectAccess(user, projectId, "section.edit");
  if (!(await fetchSection(projectId, sectionId))) throw notFound("The section");
  const input = await parseJson(request, archiveSchema);
  await setSectionArchived(sectionId, input.archived ? user.id : null);
  return NextResponse.json({ section: { id: sectionId, archived: input.archived } });
});
