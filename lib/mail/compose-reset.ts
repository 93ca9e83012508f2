/**
 * The words of a password-reset mail, as plain text. Pure: the sender supplies the link and the times.
 */
import { formatDateTime } from "@/lib/format";

export interface ResetMailFacts {
  recipientName: string;
  adminName: string;
  link: string;
  /** ISO 8601 */
  expiresAt: string;
  minutesValid: number;
}

export function composeResetMail(f: ResetMailFacts): { subject: string; text: string } {
  return {
    subject: "Set a new Scarpline password",
    text: [
      `Hello ${f.recipientName},`,
      "",
      `${f.adminName} asked Scarpline to send you a link for setting a new password.`,
      "",
      `Set your new password: ${f.link}`,
      "",
      `The link works once and expires on ${formatDateTime(f.expiresAt)} (${f.minutesValid} minutes after it was ` +
        "sent). After that, ask your administrator for a new one.",
      "Setting a new password signs you out of Scarpline in every browser.",
      "",
      "If you did not expect this mail, tell your administrator and do not open the link.",
      "",
    ].join("\n"),
  };
}
