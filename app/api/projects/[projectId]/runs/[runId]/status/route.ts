import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { conflict } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { refusalError, requireRunAccess } from "@/lib/review/run-access";
import { checkDecision } from "@/lib/review/rules";
import { isBelowRequired } from "@/lib/review/below-required";
import { TRANSITIONS } from "@/lib/review/status";
import { transitionSchema } from "@/lib/review/validations";
import { collectMaterialSources } from "@/lib/review/collect-material-sources";
import { sendTransitionNotices } from "@/lib/mail/send-run-notices";
import { applyTransition, fetchChecklist, isFrozenRunError, RunStateError } from "@/db/queries/review";
import type { SectionDocument } from "@/lib/stability";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

/**
 * Moves a run through review: {action: "submit" | "approve" | "return", note}. The change and its
 * audit line are written first; the e-mail notices follow, and their outcome joins the audit trail.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { access, run, actor, facts } = await requireRunAccess(user, await params);
  const input = await parseJson(request, transitionSchema);
  const checklist = input.action === "approve" ? await fetchChecklist(run.id) : [];
  const below = input.action === "approve" && isBelowRequired(run);
  const belowRequired = below ? { requiredFs: run.requiredFs, reason: input.belowRequiredReason } : null;
  const verdict = checkDecision(input.action, actor, facts, { note: input.note, checklist, belowRequired });
  if (!verdict.ok) throw refusalError(verdict);

  const { from, to } = TRANSITIONS[input.action];
  const materialSources =
    input.action === "submit"
      ? await collectMaterialSources(run.projectId, run.document as SectionDocument)
      : undefined;
  try {
    await applyTransition({
      runId: run.id,
      actorId: user.id,
      from,
      to,
      note: input.note,
      materialSources,
      belowRequiredReason: below ? input.belowRequiredReason : null,
    });
  } catch (err) {
    if (err instanceof RunStateError) throw conflict(err.message);
    if (isFrozenRunError(err)) throw conflict("The run's record is frozen and cannot make that move.");
    throw err;
  }
  await sendTransitionNotices({
    action: input.action,
    run,
    projectName: access.project.name,
    actor: { id: user.id, name: user.name },
    note: input.note,
    belowRequiredReason: below ? input.belowRequiredReason : null,
    at: new Date().toISOString(),
  });
  return NextResponse.json({ run: { id: run.id, status: to } });
});
