import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { LOADING_CONDITION_KEYS, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import { fetchConditionSettings, saveConditionSetting } from "@/db/queries/loading-conditions";

type Ctx = { params: Promise<{ projectId: string; key: string }> };

const bodySchema = z.object({
  requiredFs: z.number({ error: "Enter a number." }).min(1, "At least 1.0.").max(3, "At most 3.0."),
  reason: z.string().trim().min(10, "Say why the project departs from the default (at least 10 characters).").max(500),
});

/** Sets the project's required FS for one loading condition, with the reason for the change. */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  await requireProjectAccess(user, projectId, "settings.edit");
  if (!(LOADING_CONDITION_KEYS as string[]).includes(p.key)) throw notFound("The loading condition");
  const input = await parseJson(request, bodySchema);
  await saveConditionSetting({
    projectId,
    key: p.key as LoadingConditionKey,
    requiredFs: input.requiredFs,
    reason: input.reason,
    userId: user.id,
  });
  return NextResponse.json({ conditions: await fetchConditionSettings(projectId) });
});
