import { NextResponse } from "next/server";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { ApiError } from "@/lib/api/errors";
import { storedSweepSchema, type StoredSweep } from "@/lib/design";
import { checkBrowserSweep } from "@/lib/design/keep-sweep";
import { awaitJob } from "@/lib/jobs/await-job";
import { queueDesignSweep } from "@/lib/jobs/queue-design-sweep";
import { requireStudy } from "@/lib/design/study-access";

type Ctx = { params: Promise<{ projectId: string; studyId: string }> };

/** How long the request waits for the queue's run of the sweep before answering 202 with the job. */
const WAIT_MS = 60_000;

/**
 * Keeps a sweep computed in the browser as a preview: a queue worker runs the same sweep and the
 * study keeps its points; `preview` in the answer says where the browser's differed. Should the
 * queue be slow or down, the answer is 202 with the job, which keeps its points when it ends.
 */
export const PUT = apiRoute(async (request: Request, { params }: Ctx) => {
  const { study, projectId, userId } = await requireStudy(params, "design.sweep");
  const sent = await parseJson(request, storedSweepSchema);
  const job = await queueDesignSweep({
    study,
    projectId,
    userId,
    settings: sent.settings,
    ranInBrowser: { elapsedMs: sent.elapsedMs, workers: sent.workers, finishedAt: sent.finishedAt },
  });
  const ended = await awaitJob({ id: job.id, projectId }, { timeoutMs: WAIT_MS, signal: request.signal });
  if (!ended) return NextResponse.json({ job }, { status: 202 });
  if (ended.state === "cancelled")
    throw new ApiError(409, "cancelled", "The check of the sweep was cancelled; nothing was kept.");
  if (ended.state === "failed")
    throw new ApiError(500, "job_failed", ended.error ?? "The server's run of the sweep failed.");
  const kept = checkBrowserSweep(sent, ended.result as StoredSweep);
  return NextResponse.json({ saved: kept.sweep.points.length, sweep: kept.sweep, preview: kept.check });
});
