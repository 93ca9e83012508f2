import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { readServerEnv } from "@/lib/env";
import { composeResetMail } from "@/lib/mail/compose-reset";
import { mailFrom, mailTransport } from "@/lib/mail/transport";
import type { PublicUser } from "@/lib/users/types";
import { storeResetToken } from "@/db/queries/password-resets";

/** How long a mailed reset link works. */
export const RESET_LINK_MINUTES = 60;

/**
 * Only this digest of a link's token is stored. The token carries 256 random bits, so a fast hash is
 * enough (no salt or slow hash needed, unlike a password) and a stolen table cannot be turned into links.
 */
export const hashResetToken = (token: string): string => createHash("sha256").update(token, "utf8").digest("hex");

/** The link was stored but the mail server refused or could not be reached; nobody holds the link. */
export class ResetMailError extends Error {}

/** Makes a one-time reset link for the person, keeps its hash and mails the link to them. */
export async function mailResetLink(
  person: PublicUser,
  admin: { id: number; name: string },
): Promise<{ expiresAt: string }> {
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + RESET_LINK_MINUTES * 60_000);
  expiresAt.setUTCMilliseconds(0); // DATETIME keeps whole seconds; the mail must say what is stored
  await storeResetToken({ userId: person.id, tokenHash: hashResetToken(token), expiresAt, createdBy: admin.id });
  const base = readServerEnv().APP_URL.replace(/\/+$/, "");
  const mail = composeResetMail({
    recipientName: person.name,
    adminName: admin.name,
    link: `${base}/reset-password/${token}`,
    expiresAt: expiresAt.toISOString(),
    minutesValid: RESET_LINK_MINUTES,
  });
  try {
    await mailTransport().sendMail({
      from: mailFrom(),
      to: { name: person.name, address: person.email },
      subject: mail.subject,
      text: mail.text,
    });
  } catch (err) {
    throw new ResetMailError(err instanceof Error ? err.message : String(err));
  }
  return { expiresAt: expiresAt.toISOString() };
}
