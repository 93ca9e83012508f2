import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { readServerEnv } from "@/lib/env";

const g = globalThis as unknown as { scarplineMail?: Transporter };

/**
 * The app's one SMTP transport. Short time-outs: a notice that cannot be sent is recorded in
 * the run's audit trail and must not hold up the status change that caused it.
 */
export function mailTransport(): Transporter {
  if (!g.scarplineMail) {
    const env = readServerEnv();
    g.scarplineMail = nodemailer.createTransport({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE,
      ignoreTLS: env.SMTP_IGNORE_TLS,
      auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined,
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: 10000,
    });
  }
  return g.scarplineMail;
}

export function mailFrom(): string {
  return readServerEnv().MAIL_FROM;
}
