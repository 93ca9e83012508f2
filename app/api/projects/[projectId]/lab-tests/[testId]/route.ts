import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { deleteLabTestSet, fetchLabTestSet } from "@/db/queries/lab-tests";

type Ctx = { params: Promise<{ projectId: string; testId: string }> };

async function ids(params: Ctx["params"]) {
  const p = await params;
  return { projectId: parseId(p.projectId, "The project"), testId: parseId(p.testId, "The lab test set") };
}

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, testId } = await ids(params);
  await requireProjectAccess(user, projectId, "project.view");
  const labTest = await fetchLabTestSet(projectId, testId);
  if (!labTest) throw notFound("The lab test set");
  return NextResponse.json({ labTest });
});

/** Deletes the set; parameters that named it as their source keep their values but lose the source. */
export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, testId } = await ids(params);
  await requireProjectAccess(user, projectId, "material.edit");
  if (!(await deleteLabTestSet(projectId, testId))) throw notFound("The lab test set");
  return new NextResponse(null, { status: 204 });
});
