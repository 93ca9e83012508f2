import "server-only";
import { parseId } from "@/lib/api/handler";
import { ApiError, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import type { Action } from "@/lib/permissions";
import { DesignInputError, generateEmbankment, type EmbankmentParams } from "@/lib/design";
import type { Material } from "@/lib/stability";
import { fetchDesignStudy } from "@/db/queries/design-studies";
import type { DesignStudy } from "./types";

/** Checks the session and the action on the project, then loads the study or answers 404. */
export async function requireStudy(
  params: Promise<{ projectId: string; studyId: string }>,
  action: Action,
): Promise<{ study: DesignStudy; projectId: number; userId: number }> {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  const studyId = parseId(p.studyId, "The design study");
  await requireProjectAccess(user, projectId, action);
  const study = await fetchDesignStudy(projectId, studyId);
  if (!study) throw notFound("The design study");
  return { study, projectId, userId: user.id };
}

/** Generates the embankment once so a missing or unfit material is a 400 naming the field. */
export function checkAgainstLibrary(parameters: EmbankmentParams, materials: readonly Material[]): void {
  try {
    generateEmbankment(parameters, materials);
  } catch (err) {
    if (err instanceof DesignInputError)
      throw new ApiError(400, "invalid_parameters", err.message, { [`parameters.${err.field}`]: [err.message] });
    throw err;
  }
}
