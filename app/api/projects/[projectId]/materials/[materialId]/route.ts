import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { updateMaterialSchema } from "@/lib/materials/schemas";
import { checkMaterialParameters } from "@/lib/materials/parameters";
import { checkSources, mergeSources } from "@/lib/materials/sources";
import { deleteMaterial, fetchMaterial, updateMaterial } from "@/db/queries/materials";
import { fetchLabTestSetKinds, fetchLabTestSetsOfMaterial } from "@/db/queries/lab-tests";

type Ctx = { params: Promise<{ projectId: string; materialId: string }> };

async function ids(params: Ctx["params"]) {
  const p = await params;
  return { projectId: parseId(p.projectId, "The project"), materialId: parseId(p.materialId, "The material") };
}

/** One material with its lab test sets. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, materialId } = await ids(params);
  await requireProjectAccess(user, projectId, "project.view");
  const material = await fetchMaterial(projectId, materialId);
  if (!material) throw notFound("The material");
  return NextResponse.json({ material, labTests: await fetchLabTestSetsOfMaterial(projectId, materialId) });
});

/**
 * Saves new parameters. `sources` names the lab test set a parameter now comes from; a parameter
 * not named keeps its source only while its value is unchanged.
 */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, materialId } = await ids(params);
  await requireProjectAccess(user, projectId, "material.edit");
  const material = await fetchMaterial(projectId, materialId);
  if (!material) throw notFound("The material");
  const input = await parseJson(request, updateMaterialSchema);

  const check = checkMaterialParameters(material.key, input.parameters);
  const given = input.sources ?? {};
  const sets = await fetchLabTestSetKinds(projectId, Object.values(given));
  const sourceErrors = checkSources(materialId, input.parameters, given, new Map(sets.map((s) => [s.id, s])));
  const errors = { ...check.errors, ...sourceErrors };
  if (Object.keys(errors).length > 0) {
    throw new ApiError(
      400,
      "invalid_material",
      "Some parameters or their sources are not valid; nothing was saved.",
      errors,
    );
  }
  await updateMaterial({
    materialId,
    userId: user.id,
    name: input.name ?? material.name,
    color: input.color ?? material.color,
    notes: input.notes ?? material.notes,
    parameters: input.parameters,
    sources: mergeSources(material.parameters, material.sources, input.parameters, given),
  });
  return NextResponse.json({ material: await fetchMaterial(projectId, materialId), warnings: check.warnings });
});

/** Deletes the material and its lab test sets. */
export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { projectId, materialId } = await ids(params);
  await requireProjectAccess(user, projectId, "material.edit");
  if (!(await deleteMaterial(projectId, materialId))) throw notFound("The material");
  return new NextResponse(null, { status: 204 });
});
