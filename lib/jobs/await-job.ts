/**
 * Waiting, inside a request, for a queue job that should end within seconds (a browser sweep's
 * check). The work runs on the workers; the request only reads the job's row.
 */
import { fetchJob, requestCancel } from "@/db/queries/jobs";
import type { JobRecord } from "./types";

const POLL_MS = 200;

/** The job once it ends; null when it has not ended within `timeoutMs` (it goes on regardless). */
export async function awaitJob(
  job: { id: number; projectId: number },
  o: { timeoutMs: number; signal?: AbortSignal },
): Promise<JobRecord | null> {
  const deadline = Date.now() + o.timeoutMs;
  for (;;) {
    const record = await fetchJob(job.id);
    if (!record) return null;
    if (record.state === "done" || record.state === "failed" || record.state === "cancelled") return record;
    if (o.signal?.aborted) {
      // Nobody waits for the answer any more: nothing is to be kept.
      await requestCancel(job.projectId, job.id);
      return null;
    }
    if (Date.now() > deadline) return null;
    await new Promise((r) => setTimeout(r, POLL_MS));
  }
}
