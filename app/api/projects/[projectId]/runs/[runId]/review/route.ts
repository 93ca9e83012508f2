import { NextResponse } from "next/server";
import { apiRoute } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { requireRunAccess } from "@/lib/review/run-access";
import { loadReviewState } from "@/lib/review/review-state";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

/**
 * The run's review: status record, checklist with hints, comments, audit trail, revisions, and what the caller may do.
 */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run, actor } = await requireRunAccess(user, await params);
  return NextResponse.json({ status: run.status, review: await loadReviewState(run, actor) });
});
