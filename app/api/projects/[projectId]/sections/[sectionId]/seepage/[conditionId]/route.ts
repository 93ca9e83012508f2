import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { findWaterCondition } from "@/lib/sections/water-conditions";
import { seepageSettingsInputSchema } from "@/lib/section-seepage/types";
import { checkDrains } from "@/lib/section-seepage/check-drains";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { fetchSeepageSettings, saveSeepageSettings } from "@/db/queries/section-seepage";
import type { SectionDocument } from "@/lib/stability";

type Ctx = { params: Promise<{ projectId: string; sectionId: string; conditionId: string }> };

const bodySchema = z.object({ settings: seepageSettingsInputSchema });

async function load(params: Ctx["params"], permission: "project.view" | "section.edit") {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  const sectionId = parseId(p.sectionId, "The section");
  await requireProjectAccess(user, projectId, permission);
  const section = await fetchSection(projectId, sectionId);
  if (!section) throw notFound("The section");
  const current = await fetchSectionVersion(sectionId, section.currentVersion);
  const document = current!.document as SectionDocument;
  const condition = findWaterCondition(document, p.conditionId);
  if (!condition) throw notFound(`The water condition '${p.conditionId}'`);
  return { user, sectionId, document, condition };
}

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { sectionId, condition } = await load(params, "project.view");
  return NextResponse.json({ settings: await fetchSeepageSettings(sectionId, condition.id) });
});

/** Saves the drains and settings of the seepage view; a drain outside pervious material saves nothing. */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const { user, sectionId, document, condition } = await load(params, "section.edit");
  const { settings } = await parseJson(request, bodySchema);
  const fields = checkDrains(document, settings);
  const count = Object.keys(fields).length;
  if (count > 0)
    throw new ApiError(
      400,
      "invalid_seepage_settings",
      `${count} drain point${count === 1 ? "" : "s"} outside pervious material; nothing was saved.`,
      fields,
    );
  await saveSeepageSettings({ sectionId, waterConditionId: condition.id, settings, userId: user.id });
  return NextResponse.json({ settings });
});
