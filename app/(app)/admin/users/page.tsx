import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { fetchUsersOfOrganisation } from "@/db/queries/users";
import { PageTitle } from "@/components/ui/page-title";
import { UsersManager } from "@/components/admin/users-manager";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const user = await requirePageUser();
  if (!can(user.role, "users.manage")) {
    return (
      <div className="panel p-6" data-testid="forbidden">
        <h1 className="text-lg font-semibold">Administrators only</h1>
        <p className="mt-1 text-sm text-ink-soft">Ask your administrator to add people to the team.</p>
      </div>
    );
  }
  return (
    <>
      <PageTitle title="People" kicker="Administration" />
      <UsersManager initialUsers={await fetchUsersOfOrganisation(user.organisationId)} />
    </>
  );
}
