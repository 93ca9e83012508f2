import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { forbidden, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { jobKind } from "@/lib/jobs/kinds";
import { readJob } from "@/lib/jobs/read-job";
import { fetchJobOfProject, requestCancel } from "@/db/queries/jobs";

type Ctx = { params: Promise<{ projectId: string; jobId: string }> };

async function access(params: Ctx["params"]) {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  const jobId = parseId(p.jobId, "The job");
  const membership = await requireProjectAccess(user, projectId, "project.view");
  return { projectId, jobId, membership };
}

/** A job's state, progress and (once done) result; pages poll this about once a second. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { projectId, jobId } = await access(params);
  const job = await readJob(projectId, jobId);
  if (!job) throw notFound("The job");
  return NextResponse.json({ job });
});

/** Cancels a job: a waiting one at once, a running one at its worker's next check. */
export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { projectId, jobId, membership } = await access(params);
  const record = await fetchJobOfProject(projectId, jobId);
  if (!record) throw notFound("The job");
  const kind = jobKind(record.kind);
  if (kind && !can(membership.role, kind.action)) throw forbidden("cancel this job");
  await requestCancel(projectId, jobId);
  return NextResponse.json({ job: await readJob(projectId, jobId) });
});
