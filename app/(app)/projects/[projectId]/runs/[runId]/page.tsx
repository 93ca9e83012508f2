import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { loadReviewState } from "@/lib/review/review-state";
import { fetchRun } from "@/db/queries/runs";
import { PageTitle } from "@/components/ui/page-title";
import { ReviewWorkspace } from "@/components/review/review-workspace";
import { RevisionChain } from "@/components/review/revision-chain";
import { AuditTrail } from "@/components/review/audit-trail";
import { PreviewNotice } from "@/components/runs/kept/preview-notice";
import { readPreviewCheck } from "@/lib/runs/record/compare-preview";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Run" };

export default async function RunPage({ params }: { params: Promise<{ projectId: string; runId: string }> }) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, pageId(p.projectId));
  if (!access) notFound();
  const run = await fetchRun(access.project.id, pageId(p.runId));
  if (!run) notFound();
  const review = await loadReviewState(run, { userId: user.id, role: access.role });
  return (
    <>
      <PageTitle
        title={run.title}
        kicker={
          <>
            <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
              {access.project.name}
            </Link>{" "}
            /{" "}
            <Link href={`/projects/${access.project.id}/runs`} className="hover:text-ink">
              Runs
            </Link>
          </>
        }
      />
      <div className="space-y-4">
        <PreviewNotice check={readPreviewCheck(run.result)} />
        <ReviewWorkspace run={run} review={review} mode="run" canRevise={can(access.role, "run.create")} />
        <RevisionChain projectId={run.projectId} chain={review.chain} currentId={run.id} />
        <AuditTrail events={review.events} />
      </div>
    </>
  );
}
