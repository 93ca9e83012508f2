import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { fetchProjectsForUser } from "@/db/queries/projects";
import { fetchAuthorWork, fetchReviewerQueue } from "@/db/queries/work-queue";
import { can } from "@/lib/permissions";
import { PageTitle } from "@/components/ui/page-title";
import { ProjectList } from "@/components/projects/project-list";
import { AuthorWorkPanel, ReviewerQueuePanel } from "@/components/projects/work-queue";

export const metadata: Metadata = { title: "Projects" };

/** The landing page: the person's work first (review queue, own runs), then their projects. */
export default async function ProjectsPage() {
  const user = await requirePageUser();
  const projects = await fetchProjectsForUser(user);
  const reviews = projects.some((p) => p.memberRole === "reviewer");
  const authors = projects.some((p) => p.memberRole === "engineer" || p.memberRole === "designer");
  const [queue, work] = await Promise.all([
    reviews ? fetchReviewerQueue(user.id) : null,
    authors ? fetchAuthorWork(user.id) : null,
  ]);
  return (
    <>
      <PageTitle title={queue || work ? "Your work" : "Projects"} />
      {queue || work ? (
        <>
          <div className="mb-8 space-y-4" id="work">
            {queue ? <ReviewerQueuePanel queue={queue} now={new Date()} /> : null}
            {work ? <AuthorWorkPanel work={work} /> : null}
          </div>
          <h2 className="mb-3 text-lg font-semibold">Projects</h2>
        </>
      ) : null}
      <ProjectList initialProjects={projects} canCreate={can(user.role, "projects.create")} />
    </>
  );
}
