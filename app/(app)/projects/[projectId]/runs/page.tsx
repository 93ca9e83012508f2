import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { fetchRunsOfProject } from "@/db/queries/runs";
import { PageTitle } from "@/components/ui/page-title";
import { EmptyState } from "@/components/ui/empty-state";
import { RunsTable } from "@/components/runs/list/runs-table";
import { pageId, toId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Runs" };

export default async function RunsPage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string }>;
  searchParams: Promise<{ section?: string }>;
}) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  const sectionId = toId((await searchParams).section);
  const runs = (await fetchRunsOfProject(access.project.id)).filter((r) => !sectionId || r.sectionId === sectionId);
  return (
    <>
      <PageTitle
        title={sectionId && runs[0] ? `Runs of ${runs[0].sectionName}` : "Runs"}
        kicker={
          <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
            {access.project.name}
          </Link>
        }
      />
      {runs.length === 0 ? (
        <EmptyState title="No runs yet">Open a section and run a search for the critical circle of a face.</EmptyState>
      ) : (
        <RunsTable projectId={access.project.id} runs={runs} />
      )}
    </>
  );
}
