import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { conflict, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { fetchSection, fetchSectionVersion, saveSectionVersion, StaleVersionError } from "@/db/queries/sections";

type Ctx = { params: Promise<{ projectId: string; sectionId: string; version: string }> };

/** Restoring copies an old version forward as the newest; nothing is overwritten. */
export const POST = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  const sectionId = parseId(p.sectionId, "The section");
  await requireProjectAccess(user, projectId, "section.edit");
  const section = await fetchSection(projectId, sectionId);
  if (!section) throw notFound("The section");
  const old = await fetchSectionVersion(sectionId, parseId(p.version, "The version"));
  if (!old) throw notFound("The version");
  // A save landing between the read above and this write makes the restore stale: 409, nothing written.
  const version = await saveSectionVersion({
    sectionId,
    baseVersion: section.currentVersion,
    document: old.document,
    summary: `Restored version ${old.version}`,
    userId: user.id,
  }).catch((err: unknown) => {
    if (err instanceof StaleVersionError) throw conflict(`${err.message} Reload it, then restore again.`);
    throw err;
  });
  return NextResponse.json({ section: { id: sectionId, version } }, { status: 201 });
});
