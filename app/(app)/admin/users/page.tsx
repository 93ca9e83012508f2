import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { requirePagePermission } from "@/lib/auth/page-access";
import { fetchUsersOfOrganisation } from "@/db/queries/users";
import { PageTitle } from "@/components/ui/page-title";
import { UsersManager } from "@/components/admin/users-manager";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const user = await requirePageUser();
  requirePagePermission(user.role, "users.manage");
  return (
    <>
      <PageTitle title="People" kicker="Administration" />
      <UsersManager initialUsers={await fetchUsersOfOrganisation(user.organisationId)} currentUserId={user.id} />
    </>
  );
}
