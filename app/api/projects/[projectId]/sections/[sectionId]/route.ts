import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { conflict, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { requireValidSection } from "@/lib/sections/check-document";
import { summarizeChange } from "@/lib/sections/diff";
import { saveSectionSchema } from "@/lib/validations/section";
import {
  DuplicateSectionNameError,
  countRunsOfSection,
  deleteUnusedSection,
  fetchSection,
  fetchSectionVersion,
  saveSectionVersion,
  StaleVersionError,
} from "@/db/queries/sections";
import type { SectionDocument } from "@/lib/stability";

type Ctx = { params: Promise<{ projectId: string; sectionId: string }> };

async function ids(params: Ctx["params"]) {
  const p = await params;
  return { projectId: parseId(p.projectId, "The project"), sectionId: parseId(p.sectionId, "The section") };
}

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, sectionId } = await ids(params);
  await requireProjectAccess(user, projectId, "project.view");
  const section = await fetchSection(projectId, sectionId);
  if (!section) throw notFound("The section");
  const current = await fetchSectionVersion(sectionId, section.currentVersion);
  return NextResponse.json({ section, document: current!.document });
});

/** Saves a new version; the previous one is kept unchanged. */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, sectionId } = await ids(params);
  await requireProjectAccess(user, projectId, "section.edit");
  const section = await fetchSection(projectId, sectionId);
  if (!section) throw notFound("The section");
  const input = await parseJson(request, saveSectionSchema);
  const { document, warnings } = requireValidSection(input.document);
  const previous = await fetchSectionVersion(sectionId, section.currentVersion);
  const summary = input.summary || summarizeChange(previous!.document as SectionDocument, document);
  try {
    const version = await saveSectionVersion({
      sectionId,
      baseVersion: input.baseVersion,
      document,
      summary,
      userId: user.id,
      name: input.name,
      description: input.description,
    });
    return NextResponse.json({ section: { id: sectionId, version }, summary, warnings });
  } catch (err) {
    if (err instanceof StaleVersionError) throw conflict(`${err.message} Reload it, then apply your change again.`);
    if (err instanceof DuplicateSectionNameError) throw conflict(`${err.message} Choose another name.`);
    throw err;
  }
});

/** Deletes a section no run uses; a section with runs is archived instead, so its runs stay. */
export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, sectionId } = await ids(params);
  await requireProjectAccess(user, projectId, "section.edit");
  if (!(await fetchSection(projectId, sectionId))) throw notFound("The section");
  const runs = await countRunsOfSection(sectionId);
  const refusal = (n: number) =>
    conflict(`${n === 1 ? "1 run uses" : `${n} runs use`} this section, so it cannot be deleted; archive it instead.`);
  if (runs > 0) throw refusal(runs);
  // A run kept between the count and the delete is caught by the database's own guard (migration 010).
  if (!(await deleteUnusedSection(sectionId))) throw refusal(await countRunsOfSection(sectionId));
  return new NextResponse(null, { status: 204 });
});
