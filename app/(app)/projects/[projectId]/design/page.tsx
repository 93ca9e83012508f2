import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchDesignStudiesOfProject } from "@/db/queries/design-studies";
import { PageTitle } from "@/components/ui/page-title";
import { EmptyState } from "@/components/ui/empty-state";
import { NewStudyForm } from "@/components/design/new-study-form";
import { pageId } from "@/lib/api/ids";
import { formatDate } from "@/lib/format";

export const metadata: Metadata = { title: "Slope design" };

export default async function DesignStudiesPage({ params }: { params: Promise<{ projectId: string }> }) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  const { project, role } = access;
  const studies = await fetchDesignStudiesOfProject(project.id);
  const canSweep = can(role, "design.sweep");
  return (
    <>
      <PageTitle
        title="Slope design"
        kicker={
          <Link href={`/projects/${project.id}`} className="hover:text-ink">
            {project.name}
          </Link>
        }
      />
      <p className="-mt-3 mb-6 max-w-3xl text-sm text-ink-soft">
        Describe an embankment by its dimensions and let the app try face slopes: each study generates the section with
        its phreatic line, sweeps the H:V ratios of both faces under their load cases, and names the steepest pair that
        meets every required factor of safety.
      </p>
      {canSweep ? (
        <div className="mb-6">
          <NewStudyForm projectId={project.id} />
        </div>
      ) : null}
      {studies.length === 0 ? (
        <EmptyState title="No design studies yet">
          {canSweep
            ? "Start one above: it opens with the demo embankment's dimensions and this project's materials."
            : "Designers and engineers start design studies; they appear here."}
        </EmptyState>
      ) : (
        <ul className="panel divide-y divide-rule" data-testid="study-list">
          {studies.map((s) => (
            <li key={s.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3">
              <Link href={`/projects/${project.id}/design/${s.id}`} className="font-medium hover:underline">
                {s.name}
              </Link>
              <span className="text-xs text-ink-soft">
                {s.hasSweep ? "swept" : "not swept yet"} · {s.createdByName} · updated {formatDate(s.updatedAt)}
              </span>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
