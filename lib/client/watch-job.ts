/**
 * Following a queue job from a page: polls GET /api/projects/:id/jobs/:jobId about once a second
 * until the job ends. A server that does not answer (restarting) is tried again; the job goes on.
 */
import type { JobView } from "@/lib/jobs/types";
import { ApiClientError, fetchJson } from "./fetch-json";

const POLL_MS = 1_000;

export async function watchJob(
  projectId: number,
  jobId: number,
  o: { signal?: AbortSignal; onView?: (job: JobView | null) => void } = {},
): Promise<JobView | null> {
  let misses = 0;
  for (;;) {
    if (o.signal?.aborted) return null;
    try {
      const { job } = await fetchJson<{ job: JobView }>(`/api/projects/${projectId}/jobs/${jobId}`, {
        signal: o.signal,
      });
      misses = 0;
      if (o.signal?.aborted) return null;
      o.onView?.(job);
      if (job.state === "done" || job.state === "failed" || job.state === "cancelled") return job;
    } catch (err) {
      if (o.signal?.aborted) return null;
      if (err instanceof ApiClientError && err.status < 500) throw err;
      misses++;
      // null tells the page the server did not answer this time.
      o.onView?.(null);
    }
    await new Promise((r) => setTimeout(r, Math.min(POLL_MS * Math.max(1, misses), 5_000)));
  }
}
