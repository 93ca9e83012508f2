/**
 * Helpers of the people tests: a fresh person made by the demo administrator, and the reset mail the
 * run's own SMTP fake caught (tests/support/stack.ts), with the link it carries.
 */
import { expect } from "vitest";
import { listCaughtMail, type CaughtMail } from "@/lib/mail/caught-mail";
import { signedIn, type AppClient } from "./http";

export const RESET_SUBJECT = "Set a new Scarpline password";

/** Adds a person through the API as the demo administrator; returns their id. */
export async function addPerson(
  email: string,
  opts: { name?: string; role?: string; password?: string } = {},
): Promise<number> {
  const admin = await signedIn("admin@scarpline.test");
  const res = await admin.request("/api/users", {
    method: "POST",
    json: {
      email,
      name: opts.name ?? "People Test Person",
      role: opts.role ?? "engineer",
      password: opts.password ?? "people-pass-1",
    },
  });
  expect(res.status).toBe(201);
  return (await res.json()).user.id;
}

/** The newest caught mails to `email` with the reset subject, newest first. */
export async function resetMailsTo(email: string): Promise<CaughtMail[]> {
  return (await listCaughtMail(process.env.SMTP_MAIL_DIR!)).filter(
    (m) => m.subject === RESET_SUBJECT && m.envelope.to.includes(email),
  );
}

/** Waits until `count` reset mails to `email` have arrived; returns the newest. */
export async function awaitResetMail(email: string, count = 1): Promise<CaughtMail> {
  let mails: CaughtMail[] = [];
  await expect
    .poll(async () => (mails = await resetMailsTo(email)).length, { timeout: 10_000 })
    .toBeGreaterThanOrEqual(count);
  return mails[0];
}

/** The reset link a mail carries: its full address and its token. */
export function resetLinkIn(mail: CaughtMail): { url: string; token: string } {
  const m = /(https?:\/\/\S+\/reset-password\/([A-Za-z0-9_-]+))/.exec(mail.text);
  if (!m) throw new Error(`no reset link in the mail:\n${mail.text}`);
  return { url: m[1], token: m[2] };
}

/** Asks for a reset link for the person as `admin`; returns the HTTP answer. */
export async function requestReset(admin: AppClient, userId: number): Promise<Response> {
  return admin.request(`/api/users/${userId}/password-reset`, { method: "POST" });
}
