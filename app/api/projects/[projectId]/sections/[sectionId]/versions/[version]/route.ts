import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";

type Ctx = { params: Promise<{ projectId: string; sectionId: string; version: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  const sectionId = parseId(p.sectionId, "The section");
  await requireProjectAccess(user, projectId, "project.view");
  if (!(await fetchSection(projectId, sectionId))) throw notFound("The section");
  const version = await fetchSectionVersion(sectionId, parseId(p.version, "The version"));
  if (!version) throw notFound("The version");
  return NextResponse.json({ version });
});
