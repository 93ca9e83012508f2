import { NextResponse } from "next/server";
import { apiRoute, parseId, parseJson } from "@/lib/api/handler";
import { ApiError, conflict } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { createMaterialSchema } from "@/lib/materials/schemas";
import { checkMaterialParameters } from "@/lib/materials/parameters";
import { IMPENETRABLE_COLOR, pickMaterialColor } from "@/lib/materials/palette";
import {
  DuplicateMaterialKeyError,
  createMaterial,
  fetchMaterial,
  fetchMaterialsOfProject,
} from "@/db/queries/materials";

type Ctx = { params: Promise<{ projectId: string }> };

/** The project's materials library. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  return NextResponse.json({ materials: await fetchMaterialsOfProject(projectId) });
});

/** Adds one material; its parameters must pass the engine's bounds. */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "material.edit");
  const input = await parseJson(request, createMaterialSchema);
  const check = checkMaterialParameters(input.key, input.parameters);
  if (Object.keys(check.errors).length > 0) {
    throw new ApiError(
      400,
      "invalid_material",
      "Some parameters are outside what the analysis accepts; nothing was saved.",
      check.errors,
    );
  }
  const existing = await fetchMaterialsOfProject(projectId);
  if (existing.some((m) => m.key === input.key))
    throw new ApiError(409, "conflict", `The library already has a material '${input.key}'.`, {
      key: ["Choose another key."],
    });
  const color =
    input.color ??
    (input.parameters.model === "impenetrable" ? IMPENETRABLE_COLOR : pickMaterialColor(existing.map((m) => m.color)));
  try {
    const id = await createMaterial(projectId, user.id, {
      key: input.key,
      name: input.name,
      color,
      notes: input.notes,
      parameters: input.parameters,
    });
    return NextResponse.json(
      { material: await fetchMaterial(projectId, id), warnings: check.warnings },
      { status: 201 },
    );
  } catch (err) {
    if (err instanceof DuplicateMaterialKeyError) throw conflict(err.message);
    throw err;
  }
});
