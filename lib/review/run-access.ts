import "server-only";
import { ApiError, notFound } from "@/lib/api/errors";
import { parseId } from "@/lib/api/handler";
import { requireProjectAccess, type ProjectAccess } from "@/lib/projects/access";
import type { SessionUser } from "@/lib/auth/session";
import { fetchRun } from "@/db/queries/runs";
import type { RunDetail } from "@/lib/runs/types";
import type { Actor, Refusal, RunFacts } from "./rules";

export interface RunAccess {
  access: ProjectAccess;
  run: RunDetail;
  actor: Actor;
  facts: RunFacts;
}

/** The run of a route's params, visible to the user, with the facts the review rules need. */
export async function requireRunAccess(
  user: SessionUser,
  params: { projectId: string; runId: string },
): Promise<RunAccess> {
  const projectId = parseId(params.projectId, "The project");
  const runId = parseId(params.runId, "The run");
  const access = await requireProjectAccess(user, projectId, "project.view");
  const run = await fetchRun(projectId, runId);
  if (!run) throw notFound("The run");
  return {
    access,
    run,
    actor: { userId: user.id, role: access.role },
    facts: { status: run.status, authorId: run.authorId },
  };
}

/** A refusal of the review rules as the API's error answer. */
export function refusalError(r: Refusal): ApiError {
  return new ApiError(r.status, r.code, r.message, r.field ? { [r.field]: [r.message] } : undefined);
}
