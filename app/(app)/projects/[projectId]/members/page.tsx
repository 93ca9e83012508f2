import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { requirePagePermission } from "@/lib/auth/page-access";
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
  requirePagePermission(access.role, "members.manage");
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
