import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { ApiError, conflict } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { refusalError, requireRunAccess } from "@/lib/review/run-access";
import { checkComment } from "@/lib/review/rules";
import { commentSchema } from "@/lib/review/validations";
import { addRunComment, fetchRunComments, isFrozenRunError, RunStateError } from "@/db/queries/review";
import { countOf } from "@/lib/format";

type Ctx = { params: Promise<{ projectId: string; runId: string }> };

export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run } = await requireRunAccess(user, await params);
  return NextResponse.json({ comments: await fetchRunComments(run.id) });
});

/**
 * A comment, pinned to a place on the section ({pin: {x, y}} in m) or to a slice ({slice: {number, method}}), or to
 * neither.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const { run, actor, facts } = await requireRunAccess(user, await params);
  const verdict = checkComment(actor, facts);
  if (!verdict.ok) throw refusalError(verdict);
  const input = await parseJson(request, commentSchema);
  if (input.slice) {
    const tables = run.sliceTables as Partial<Record<string, { slices: unknown[] }>>;
    const count = tables[input.slice.method]?.slices.length ?? 0;
    if (count === 0)
      throw new ApiError(400, "invalid_input", "This run has no slices for that method.", {
        "slice.method": ["This run has no slices for that method."],
      });
    if (input.slice.number > count) {
      throw new ApiError(
        400,
        "invalid_input",
        `The critical circle has ${countOf(count, "slice")}; slice ${input.slice.number} does not exist.`,
        { "slice.number": [`Use a slice from 1 to ${count}.`] },
      );
    }
  }
  try {
    const id = await addRunComment({
      runId: run.id,
      authorId: user.id,
      body: input.body,
      pin: input.pin,
      slice: input.slice,
    });
    return NextResponse.json({ comment: { id } }, { status: 201 });
  } catch (err) {
    if (err instanceof RunStateError || isFrozenRunError(err))
      throw conflict(err instanceof Error ? err.message : "The run is frozen.");
    throw err;
  }
});
