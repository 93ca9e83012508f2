import path from "node:path";
import { NextResponse } from "next/server";
import { apiRoute } from "@/lib/api/handler";
import { forbidden } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { readServerEnv } from "@/lib/env";
import { listCaughtMail } from "@/lib/mail/caught-mail";

/** The mail the local fake SMTP server caught, newest first; administrators only. */
export const GET = apiRoute(async () => {
  const user = await requireUser();
  if (!can(user.role, "mail.view")) throw forbidden("read the mail log");
  const folder = path.resolve(process.cwd(), readServerEnv().SMTP_MAIL_DIR);
  return NextResponse.json({ messages: await listCaughtMail(folder) });
});
