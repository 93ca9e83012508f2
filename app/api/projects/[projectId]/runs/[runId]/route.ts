import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { conflict } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { refusalError, requireRunAccess } from "@/lib/review/run-access";
import { checkDraftChange } from "@/lib/review/rules";
import { renameRunSchema } from "@/lib/review/validations";
import { deleteDraftRun, fetchRevisionIds, renameDraftRun } from "@/db/queries/runs";
import { isFrozenRunError } from "@/db/queries/review";
import { stagedView } from "@/lib/runs/view/staged-view";
import type { SectionDocument } from "@/lib/stability";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run } = await requireRunAccess(user, await params);
  // A staged drawdown's factor of safety at each stage, beside the final one in fsBishop/fsFellenius.
  const staged = stagedView(
    run.result as Parameters<typeof stagedView>[0],
    run.document as SectionDocument,
    run.engineVersion,
  );
  return NextResponse.json({ run, staged });
});

/** Renames a draft. Anything that left draft is frozen: 409 for everyone. */
export const PATCH = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run, actor, facts } = await requireRunAccess(user, await params);
  const verdict = checkDraftChange(actor, facts, "rename");
  if (!verdict.ok) throw refusalError(verdict);
  const input = await parseJson(request, renameRunSchema);
  try {
    await renameDraftRun(run.id, input.title, user.id);
  } catch (err) {
    if (isFrozenRunError(err)) throw conflict("The run left draft meanwhile and can no longer be renamed.");
    throw err;
  }
  return NextResponse.json({ run: { id: run.id, title: input.title } });
});

/** Deletes a draft by its author; a run that a later run revises stays, to keep the chain whole. */
export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run, actor, facts } = await requireRunAccess(user, await params);
  const verdict = checkDraftChange(actor, facts, "delete");
  if (!verdict.ok) throw refusalError(verdict);
  const revisions = await fetchRevisionIds(run.id);
  if (revisions.length > 0)
    throw conflict(`Run ${revisions.join(", ")} revises this draft, so it is kept as part of that history.`);
  try {
    if (!(await deleteDraftRun(run.id))) throw conflict("The run left draft meanwhile and can no longer be deleted.");
  } catch (err) {
    if (isFrozenRunError(err)) throw conflict("The run left draft meanwhile and can no longer be deleted.");
    throw err;
  }
  return new Response(null, { status: 204 });
});
