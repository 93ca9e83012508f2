import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { conflict } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { refusalError, requireRunAccess } from "@/lib/review/run-access";
import { checkChecklistEdit } from "@/lib/review/rules";
import { CHECKLIST_ITEMS } from "@/lib/review/checklist";
import { checklistSchema } from "@/lib/review/validations";
import { RunStateError, saveChecklist } from "@/db/queries/review";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

const STATE_WORDS = { ok: "confirmed", concern: "flagged a concern on", open: "reopened" } as const;

/** Saves checklist items: {items: [{key, state: "open" | "ok" | "concern", note}]}. */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run, actor, facts } = await requireRunAccess(user, await params);
  const verdict = checkChecklistEdit(actor, facts);
  if (!verdict.ok) throw refusalError(verdict);
  const input = await parseJson(request, checklistSchema);
  const summary = input.items
    .map(
      (i) =>
        `${STATE_WORDS[i.state]} “${CHECKLIST_ITEMS.find((c) => c.key === i.key)!.label}”${i.note ? ` (${i.note})` : ""}`,
    )
    .join("; ");
  try {
    await saveChecklist(run.id, user.id, input.items, `Checklist: ${summary}.`);
  } catch (err) {
    if (err instanceof RunStateError) throw conflict(err.message);
    throw err;
  }
  return NextResponse.json({ ok: true });
});
