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

export const metadata: Metadata = { title: "Review" };

/** The reviewer's page: the run as in the results view, checklist, pinned comments and the decision. */
export default async function RunReviewPage({ params }: { params: Promise<{ projectId: string; runId: string }> }) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, pageId(p.projectId));
  if (!access) notFound();
  const run = await fetchRun(access.project.id, pageId(p.runId));
  if (!run) notFound();
  const review = await loadReviewState(run, { userId: user.id, role: access.role });
  const base = `/projects/${access.project.id}`;
  return (
    <>
      <PageTitle
        title={`Review: ${run.title}`}
        kicker={
          <>
            <Link href={base} className="hover:text-ink">
              {access.project.name}
            </Link>{" "}
            /{" "}
            <Link href={`${base}/runs`} className="hover:text-ink">
              Runs
            </Link>{" "}
            /{" "}
            <Link href={`${base}/runs/${run.id}`} className="hover:text-ink">
              Run {run.id}
            </Link>
          </>
        }
      />
      {!can(access.role, "run.review") ? (
        <p
          className="mb-4 rounded-md border border-rule bg-paper-raised px-4 py-2 text-sm text-ink-soft"
          data-testid="review-read-only"
        >
          Reviewers fill in the checklist and decide; you can read the review and comment.
        </p>
      ) : null}
      <div className="space-y-4">
        <PreviewNotice check={readPreviewCheck(run.result)} />
        <ReviewWorkspace run={run} review={review} mode="review" canRevise={false} />
        <RevisionChain projectId={run.projectId} chain={review.chain} currentId={run.id} />
        <AuditTrail events={review.events} />
      </div>
    </>
  );
}
