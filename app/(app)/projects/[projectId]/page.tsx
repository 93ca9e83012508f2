import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchSectionsOfProject } from "@/db/queries/sections";
import { fetchRunsOfProject } from "@/db/queries/runs";
import { PageTitle } from "@/components/ui/page-title";
import { EmptyState } from "@/components/ui/empty-state";
import { ProjectSections } from "@/components/projects/project-sections";
import { ProjectRuns } from "@/components/projects/project-runs";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  const { project, role } = access;
  const [sections, runs] = await Promise.all([fetchSectionsOfProject(project.id), fetchRunsOfProject(project.id)]);
  const canEditSections = can(role, "section.edit");

  return (
    <>
      <PageTitle
        title={project.name}
        kicker={
          <Link href="/projects" className="hover:text-ink">
            Projects
          </Link>
        }
      >
        <Link href={`/projects/${project.id}/materials`} className="btn-quiet">
          Materials
        </Link>
        <Link href={`/projects/${project.id}/design`} className="btn-quiet">
          Slope design
        </Link>
        <Link href={`/projects/${project.id}/documents`} className="btn-quiet">
          Documents
        </Link>
        <Link href={`/projects/${project.id}/settings`} className="btn-quiet">
          Required FS
        </Link>
        {can(role, "members.manage") ? (
          <Link href={`/projects/${project.id}/members`} className="btn-quiet">
            Members
          </Link>
        ) : null}
      </PageTitle>
      <p className="-mt-3 mb-6 max-w-3xl text-sm text-ink-soft">{project.description}</p>

      <section className="mb-8" aria-labelledby="sections-heading">
        <div className="mb-3 flex items-center justify-between">
          <h2 id="sections-heading" className="text-lg font-semibold">
            Sections
          </h2>
          {canEditSections ? (
            <Link href={`/projects/${project.id}/sections/new`} className="btn-primary">
              New section
            </Link>
          ) : null}
        </div>
        {sections.length === 0 ? (
          <EmptyState title="No cross-sections yet">
            {canEditSections
              ? "Draw the embankment's cross-section on the canvas, or import its geometry, phreatic line and materials from CSV files."
              : "An engineer or designer on this project adds the cross-sections to analyse."}
          </EmptyState>
        ) : (
          <ProjectSections projectId={project.id} sections={sections} canEdit={canEditSections} />
        )}
      </section>

      <section aria-labelledby="runs-heading">
        <div className="mb-3 flex items-center justify-between">
          <h2 id="runs-heading" className="text-lg font-semibold">
            Runs
          </h2>
          {runs.length > 0 ? (
            <Link href={`/projects/${project.id}/runs`} className="btn-quiet">
              All runs, filters and compare
            </Link>
          ) : null}
        </div>
        {runs.length === 0 ? (
          <EmptyState title="No analyses run yet">
            {sections.length === 0
              ? "Once a section exists, open it and run a search for the critical slip circle of each face and load case."
              : can(role, "run.create")
                ? "Open a section and set up a run: the load case, the face to check and the grid of trial centres."
                : "Engineers and designers run the analyses; they appear here for review."}
          </EmptyState>
        ) : (
          <ProjectRuns runs={runs} />
        )}
      </section>
    </>
  );
}
