import "server-only";
import { fetchMemberRole, fetchProjectById } from "@/db/queries/projects";
import { ApiError, notFound, forbidden } from "@/lib/api/errors";
import { can, effectiveProjectRole, type Action, type Role } from "@/lib/permissions";
import type { SessionUser } from "@/lib/auth/session";

export interface ProjectAccess {
  project: NonNullable<Awaited<ReturnType<typeof fetchProjectById>>>;
  role: Role;
}

/**
 * Loads a project the user may see and checks one action on it.
 * A project the user may not see answers 404, so its existence is not disclosed; a visible
 * project where the role falls short answers 403.
 */
export async function requireProjectAccess(
  user: SessionUser,
  projectId: number,
  action: Action,
): Promise<ProjectAccess> {
  const project = await fetchProjectById(projectId);
  if (!project || project.organisationId !== user.organisationId) throw notFound("The project");
  const role = effectiveProjectRole(user.role, await fetchMemberRole(projectId, user.id));
  if (!role) throw notFound("The project");
  if (!can(role, action)) throw forbidden(describe(action));
  return { project, role };
}

/** The same check for pages: null when the project is not visible; a database failure is thrown, not a 404. */
export async function findProjectAccess(user: SessionUser, projectId: number): Promise<ProjectAccess | null> {
  try {
    return await requireProjectAccess(user, projectId, "project.view");
  } catch (err) {
    if (err instanceof ApiError) return null;
    throw err;
  }
}

function describe(action: Action): string {
  const words: Partial<Record<Action, string>> = {
    "members.manage": "manage project members",
    "section.edit": "edit sections",
    "material.edit": "edit materials",
    "run.create": "run analyses",
    "run.submit": "submit runs for review",
    "run.review": "review runs",
    "settings.edit": "change project settings",
  };
  return words[action] ?? action.replace(".", " ");
}
