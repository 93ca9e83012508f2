import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { ROLE_LABELS } from "@/lib/permissions";
import { fetchNoticePreferences } from "@/db/queries/notifications";
import { PageTitle } from "@/components/ui/page-title";
import { PasswordForm } from "@/components/account/password-form";
import { NotificationPrefs } from "@/components/account/notification-prefs";
import { SignOutEverywhere } from "@/components/account/sign-out-everywhere";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const user = await requirePageUser();
  const notices = await fetchNoticePreferences(user.id);
  return (
    <>
      <PageTitle title="Your account" />
      <div className="grid gap-6 md:grid-cols-2">
        <div className="space-y-6 self-start">
          <dl className="panel grid grid-cols-[8rem_1fr] gap-y-2 p-4 text-sm">
            <dt className="text-ink-soft">Name</dt>
            <dd>{user.name}</dd>
            <dt className="text-ink-soft">E-mail</dt>
            <dd>{user.email}</dd>
            <dt className="text-ink-soft">Role</dt>
            <dd data-testid="account-role">{ROLE_LABELS[user.role]}</dd>
          </dl>
          <NotificationPrefs initial={notices} />
        </div>
        <div className="space-y-6 self-start">
          <PasswordForm />
          <SignOutEverywhere />
        </div>
      </div>
    </>
  );
}
