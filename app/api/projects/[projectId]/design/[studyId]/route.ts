import { NextResponse } from "next/server";
import { z } from "zod";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { embankmentParamsSchema } from "@/lib/design";
import { deleteDesignStudy, fetchDesignStudy, saveDesignParameters } from "@/db/queries/design-studies";
import { fetchDesignContext } from "@/lib/design/design-context";
import { checkAgainstLibrary, requireStudy } from "@/lib/design/study-access";

type Ctx = { params: Promise<{ projectId: string; studyId: string }> };

const updateStudySchema = z.object({
  name: z.string().trim().min(3, "At least 3 characters.").max(200, "At most 200 characters.").optional(),
  parameters: embankmentParamsSchema,
});

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { study } = await requireStudy(params, "project.view");
  return NextResponse.json({ study });
});

/** Saves new parameters; the kept sweep described the old embankment, so it is cleared. */
export const PATCH = apiRoute(async (request: Request, { params }: Ctx) => {
  const { study, projectId } = await requireStudy(params, "design.sweep");
  const input = await parseJson(request, updateStudySchema);
  checkAgainstLibrary(input.parameters, (await fetchDesignContext(projectId)).materials);
  if (!(await saveDesignParameters({ projectId, studyId: study.id, name: input.name, parameters: input.parameters })))
    throw notFound("The design study");
  return NextResponse.json({ study: await fetchDesignStudy(projectId, study.id) });
});

export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { study, projectId } = await requireStudy(params, "design.sweep");
  await deleteDesignStudy(projectId, study.id);
  return new NextResponse(null, { status: 204 });
});
