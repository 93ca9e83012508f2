import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { createLabTestSchema } from "@/lib/materials/schemas";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import { problemsToFields } from "@/lib/materials/problem-keys";
import { fetchMaterial } from "@/db/queries/materials";
import {
  createLabTestSet,
  fetchLabTestSet,
  fetchLabTestSetsOfMaterial,
  fetchLabTestSetsOfProject,
} from "@/db/queries/lab-tests";

type Ctx = { params: Promise<{ projectId: string }> };

/** The project's lab test sets; `?materialId=` keeps those of one material. */
export const GET = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  const materialParam = new URL(request.url).searchParams.get("materialId");
  const labTests =
    materialParam === null
      ? await fetchLabTestSetsOfProject(projectId)
      : await fetchLabTestSetsOfMaterial(projectId, parseId(materialParam, "The material"));
  return NextResponse.json({ labTests });
});

/**
 * Stores a set of test results with what lib/lab derives from them. Every bad row answers 400,
 * with `fields` keyed "row 3, column normalStress" and a message naming each row; nothing is stored.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "material.edit");
  const input = await parseJson(request, createLabTestSchema);
  if (input.materialId !== null && !(await fetchMaterial(projectId, input.materialId))) {
    throw new ApiError(400, "invalid_input", "The material was not found in this project.", {
      materialId: ["No such material in this project."],
    });
  }
  const outcome = checkAndDeriveLabTest(input.kind, input.data);
  if (!outcome.ok) {
    const n = outcome.problems.length;
    const list = outcome.problems.map((p) => p.message).join("; ");
    throw new ApiError(
      400,
      "invalid_lab_data",
      `${n} problem${n === 1 ? "" : "s"} in the test results, nothing was saved: ${list}.`,
      problemsToFields(outcome.problems),
    );
  }
  const id = await createLabTestSet({
    projectId,
    materialId: input.materialId,
    name: input.name,
    record: outcome.record,
    userId: user.id,
  });
  return NextResponse.json(
    { labTest: await fetchLabTestSet(projectId, id), warnings: outcome.warnings },
    { status: 201 },
  );
});
