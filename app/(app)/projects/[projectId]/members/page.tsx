import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchProjectMembers } from "@/db/queries/projects";
import { fetchUsersOfOrganisation } from "@/db/queries/users";
import { PageTitle } from "@/components/ui/page-title";
import { MembersManager } from "@/components/projects/members-manager";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ projectId: string }> }) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  if (!can(access.role, "members.manage")) {
    return (
      <div className="panel p-6" data-testid="forbidden">
        <h1 className="text-lg font-semibold">Administrators only</h1>
        <p className="mt-1 text-sm text-ink-soft">Only an administrator changes who works on a project.</p>
      </div>
    );
  }
  const [members, users] = await Promise.all([
    fetchProjectMembers(access.project.id),
    fetchUsersOfOrganisation(user.organisationId),
  ]);
  return (
    <>
      <PageTitle
        title="Members"
        kicker={
          <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
            {access.project.name}
          </Link>
        }
      />
      <MembersManager
        projectId={access.project.id}
        initialMembers={members}
        candidates={users
          .filter((u) => u.role !== "admin" && u.active)
          .map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role }))}
      />
    </>
  );
}
