import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { saveReliabilityTarget } from "@/db/queries/probabilistic";
import { readReliabilityTarget } from "@/lib/probabilistic/read-target";
import { DEFAULT_TARGET_BETA } from "@/lib/probabilistic/targets";

type Ctx = { params: Promise<{ projectId: string }> };

const bodySchema = z.object({
  beta: z.number({ error: "Enter a number." }).min(1, "At least 1.0.").max(5, "At most 5.0."),
  reason: z.string().trim().min(10, "Say why the project departs from the default (at least 10 characters).").max(500),
});

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ target: await readReliabilityTarget(projectId) });
});

/** Sets the project's target reliability index, with the reason for it. */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "settings.edit");
  const input = await parseJson(request, bodySchema);
  await saveReliabilityTarget({
    projectId,
    beta: input.beta,
    reason: input.reason,
    userId: user.id,
    isDefault: Math.abs(input.beta - DEFAULT_TARGET_BETA) < 1e-9,
  });
  return NextResponse.json({ target: await readReliabilityTarget(projectId) });
});
