import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { fetchRunsByIds } from "@/db/queries/runs";
import { PageTitle } from "@/components/ui/page-title";
import { RunComparison } from "@/components/runs/compare/run-comparison";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Compare runs" };

export default async function ComparePage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string }>;
  searchParams: Promise<{ ids?: string }>;
}) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  const ids = [
    ...new Set(
      String((await searchParams).ids ?? "")
        .split(",")
        .map(Number)
        .filter((n) => Number.isInteger(n) && n > 0),
    ),
  ];
  const runs = await fetchRunsByIds(access.project.id, ids.slice(0, 4));
  const back = (
    <Link href={`/projects/${access.project.id}/runs`} className="hover:text-ink">
      Runs
    </Link>
  );
  if (runs.length < 2) {
    return (
      <>
        <PageTitle title="Compare runs" kicker={back} />
        <p className="panel p-4 text-sm" data-testid="compare-too-few">
          Pick two to four runs of this project in the runs list to compare them.
        </p>
      </>
    );
  }
  return (
    <>
      <PageTitle title={`Comparing ${runs.length} runs`} kicker={back} />
      <RunComparison runs={runs} />
    </>
  );
}
