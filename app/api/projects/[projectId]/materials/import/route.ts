import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError, conflict } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { importMaterialsSchema } from "@/lib/materials/schemas";
import { checkMaterialsImport, csvProblemsToTable } from "@/lib/materials/import-check";
import { problemsToFields } from "@/lib/materials/problem-keys";
import { IMPENETRABLE_COLOR, pickMaterialColors } from "@/lib/materials/palette";
import { DuplicateMaterialKeyError, createMaterials, fetchMaterialsOfProject } from "@/db/queries/materials";
import { countOf } from "@/lib/format";

type Ctx = { params: Promise<{ projectId: string }> };

/**
 * Adds every material of a materials CSV, or none: any problem answers 400 with `fields` keyed
 * "row 3, column c" and nothing is saved.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "material.edit");
  const { csv } = await parseJson(request, importMaterialsSchema);
  const existing = await fetchMaterialsOfProject(projectId);
  const check = checkMaterialsImport(
    csv,
    existing.map((m) => m.key),
  );
  if (!check.ok) {
    const n = check.problems.length;
    throw new ApiError(
      400,
      "invalid_csv",
      `The file has ${countOf(n, "problem")}; nothing was saved.`,
      problemsToFields(csvProblemsToTable(check.problems)),
    );
  }
  const colors = pickMaterialColors(
    existing.map((m) => m.color),
    check.materials.length,
  );
  try {
    await createMaterials(
      projectId,
      user.id,
      check.materials.map((m, i) => ({
        key: m.key,
        name: m.name,
        color: m.color ?? (m.parameters.model === "impenetrable" ? IMPENETRABLE_COLOR : colors[i]),
        notes: `Imported from CSV row ${m.row}.`,
        parameters: m.parameters,
      })),
    );
  } catch (err) {
    if (err instanceof DuplicateMaterialKeyError)
      throw conflict(`${err.message} Someone added it meanwhile; nothing was saved.`);
    throw err;
  }
  const keys = new Set(check.materials.map((m) => m.key));
  const materials = (await fetchMaterialsOfProject(projectId)).filter((m) => keys.has(m.key));
  return NextResponse.json({ materials, warnings: check.warnings }, { status: 201 });
});
