import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { fetchProjectsForUser } from "@/db/queries/projects";
import { can } from "@/lib/permissions";
import { PageTitle } from "@/components/ui/page-title";
import { ProjectList } from "@/components/projects/project-list";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const user = await requirePageUser();
  const projects = await fetchProjectsForUser(user);
  return (
    <>
      <PageTitle title="Projects" kicker="Your work" />
      <ProjectList initialProjects={projects} canCreate={can(user.role, "projects.create")} />
    </>
  );
}
