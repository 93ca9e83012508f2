import path from "node:path";
import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { readServerEnv } from "@/lib/env";
import { listCaughtMail } from "@/lib/mail/caught-mail";
import { PageTitle } from "@/components/ui/page-title";
import { MailLog } from "@/components/review/mail-log";

export const metadata: Metadata = { title: "Mail log" };
export const dynamic = "force-dynamic";

/** What the local fake SMTP server caught: the notices as their recipients would read them. */
export default async function MailLogPage() {
  const user = await requirePageUser();
  if (!can(user.role, "mail.view")) {
    return (
      <div className="panel p-6" data-testid="forbidden">
        <h1 className="text-lg font-semibold">Administrators only</h1>
        <p className="mt-1 text-sm text-ink-soft">
          The mail log shows every notice the app sent; ask your administrator.
        </p>
      </div>
    );
  }
  const folder = path.resolve(process.cwd(), readServerEnv().SMTP_MAIL_DIR);
  const messages = await listCaughtMail(folder);
  return (
    <>
      <PageTitle title="Mail log" kicker="Administration" />
      <p className="mb-4 text-sm text-ink-soft">
        Mail caught by the local test mail server (scripts/smtp-fake.ts), newest first. Nothing here was delivered to
        anyone.
      </p>
      <MailLog messages={messages} />
    </>
  );
}
