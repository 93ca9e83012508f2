import path from "node:path";
import type { Metadata } from "next";
import { requirePageUser } from "@/lib/auth/session";
import { requirePagePermission } from "@/lib/auth/page-access";
import { readServerEnv } from "@/lib/env";
import { listCaughtMail } from "@/lib/mail/caught-mail";
import { PageTitle } from "@/components/ui/page-title";
import { MailLog } from "@/components/review/mail-log";

export const metadata: Metadata = { title: "Mail log" };
export const dynamic = "force-dynamic";

/** What the local fake SMTP server caught: the notices as their recipients would read them. */
export default async function MailLogPage() {
  const user = await requirePageUser();
  requirePagePermission(user.role, "mail.view");
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
