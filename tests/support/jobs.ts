/** Polling a queue job over HTTP the way the page does (GET /api/projects/:id/jobs/:jobId). */
import type { JobView } from "@/lib/jobs/types";
import type { AppClient } from "./http";

export const ENDED = ["done", "failed", "cancelled"];

/** Polls until the job ends (or `until` holds); returns the last view and every view seen. */
export async function pollJob(
  client: AppClient,
  projectId: number,
  jobId: number,
  o: { timeoutMs?: number; until?: (job: JobView) => boolean } = {},
): Promise<{ job: JobView; seen: JobView[] }> {
  const seen: JobView[] = [];
  const deadline = Date.now() + (o.timeoutMs ?? 60_000);
  for (;;) {
    const res = await client.request(`/api/projects/${projectId}/jobs/${jobId}`);
    if (res.status !== 200) throw new Error(`job ${jobId}: the app answered ${res.status}: ${await res.text()}`);
    const { job } = (await res.json()) as { job: JobView };
    seen.push(job);
    if (o.until ? o.until(job) : ENDED.includes(job.state)) return { job, seen };
    if (Date.now() > deadline) throw new Error(`job ${jobId} did not get there in time; last: ${JSON.stringify(job)}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}
