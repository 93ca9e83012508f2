import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { defaultParamsFor, embankmentParamsSchema } from "@/lib/design";
import { createDesignStudy, fetchDesignStudiesOfProject } from "@/db/queries/design-studies";
import { fetchDesignContext } from "@/lib/design/design-context";
import { checkAgainstLibrary } from "@/lib/design/study-access";

type Ctx = { params: Promise<{ projectId: string }> };

const createStudySchema = z.object({
  name: z
    .string({ error: "Name the study." })
    .trim()
    .min(3, "At least 3 characters.")
    .max(200, "At most 200 characters."),
  /** Omitted: the demo embankment's dimensions with the project's own materials. */
  parameters: embankmentParamsSchema.optional(),
});

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ studies: await fetchDesignStudiesOfProject(projectId) });
});

/** Starts a design study. */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "design.sweep");
  const input = await parseJson(request, createStudySchema);
  const context = await fetchDesignContext(projectId);
  const parameters = input.parameters ?? defaultParamsFor(context.library);
  checkAgainstLibrary(parameters, context.materials);
  const id = await createDesignStudy({ projectId, name: input.name, parameters, userId: user.id });
  return NextResponse.json({ study: { id } }, { status: 201 });
});
