/**
 * The local stand-in for a mail server: an SMTP server (smtp-server) on 127.0.0.1 that delivers
 * nothing and keeps every message it is given, for development and tests only. Run in the
 * foreground with `tsx scripts/smtp-fake.ts`; scripts/services-start.sh backgrounds it and
 * scripts/stop.sh ends it through the pid file. The admin page /admin/mail lists what it caught.
 *
 * Settings (all optional):
 *   SMTP_PORT        port on 127.0.0.1 (2525)
 *   SMTP_MAIL_DIR    where caught messages are kept, one JSON file each (.data/mail)
 *   SMTP_PID_FILE    pid file (.data/smtp-fake.pid)
 *
 * Plain SMTP only: smtp-server's built-in certificate has expired, so STARTTLS and AUTH are
 * switched off and the app sends with ignoreTLS. Idempotent: when the pid file names a live
 * process and the port answers, it says so and exits 0. A port held by another program is
 * reported, not waited on. Prints `smtp-fake ready ...` on stdout once it listens.
 */
import fs from "node:fs";
import path from "node:path";
import { DATA_ROOT, HOST, ROOT, livePid, portAnswers, readPort, serviceLog } from "./lib/loopback-service";
import { randomBytes } from "node:crypto";
import { SMTPServer, type SMTPServerAddress } from "smtp-server";
import { simpleParser, type AddressObject } from "mailparser";
import { CAUGHT_MAIL_SUFFIX, type CaughtMail } from "../lib/mail/caught-mail";

const log = serviceLog("smtp-fake");
/** Larger messages are refused; notices are a few kilobytes. */
const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

interface FakeSettings {
  port: number;
  folder: string;
  pidFile: string;
}

function readSettings(env: NodeJS.ProcessEnv = process.env): FakeSettings {
  const port = readPort(env, "SMTP_PORT", 2525);
  return {
    port,
    folder: path.resolve(ROOT, env.SMTP_MAIL_DIR ?? path.join(DATA_ROOT, "mail")),
    pidFile: path.resolve(env.SMTP_PID_FILE ?? path.join(DATA_ROOT, "smtp-fake.pid")),
  };
}

const addresses = (a: AddressObject | AddressObject[] | undefined): string[] =>
  (Array.isArray(a) ? a : a ? [a] : []).flatMap((o) =>
    o.value.map((v) => (v.name ? `${v.name} <${v.address}>` : (v.address ?? ""))),
  );

const envelopeAddress = (a: SMTPServerAddress | false) => (a ? a.address : "");

/** Writes the message whole under a temporary name, then renames it into place. */
function store(folder: string, mail: CaughtMail): void {
  const name = `${mail.receivedAt.replace(/[:.]/g, "-")}-${mail.id}${CAUGHT_MAIL_SUFFIX}`;
  const tmp = path.join(folder, `.${name}.tmp`);
  fs.writeFileSync(tmp, JSON.stringify(mail, null, 2));
  fs.renameSync(tmp, path.join(folder, name));
}

async function main(): Promise<void> {
  const settings = readSettings();
  const running = livePid(settings.pidFile);
  const answering = await portAnswers(settings.port);
  if (running && answering) {
    log(`already running (pid ${running}) on smtp://${HOST}:${settings.port}`);
    console.log(`smtp-fake ready on smtp://${HOST}:${settings.port} mail=${settings.folder}`);
    return;
  }
  if (answering)
    throw new Error(`port ${settings.port} on ${HOST} is held by another process; set SMTP_PORT to a free port`);
  if (running)
    throw new Error(
      `process ${running} from ${settings.pidFile} is alive but does not answer on port ${settings.port}; stop it first`,
    );
  fs.rmSync(settings.pidFile, { force: true });
  fs.mkdirSync(settings.folder, { recursive: true });
  fs.mkdirSync(path.dirname(settings.pidFile), { recursive: true });

  const server = new SMTPServer({
    disabledCommands: ["STARTTLS", "AUTH"],
    authOptional: true,
    logger: false,
    size: MAX_MESSAGE_BYTES,
    banner: "Scarpline local mail catcher: nothing is delivered",
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail: CaughtMail = {
            id: randomBytes(6).toString("hex"),
            receivedAt: new Date().toISOString(),
            envelope: {
              from: envelopeAddress(session.envelope.mailFrom),
              to: session.envelope.rcptTo.map((r) => r.address),
            },
            from: addresses(parsed.from).join(", "),
            to: addresses(parsed.to),
            subject: parsed.subject ?? "",
            date: parsed.date ? parsed.date.toISOString() : null,
            text: parsed.text ?? "",
          };
          store(settings.folder, mail);
          log(`caught "${mail.subject}" for ${mail.envelope.to.join(", ")}`);
          callback();
        })
        .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(settings.port, HOST, () => resolve());
  });
  server.on("error", (err) => log(`error: ${err.message}`));
  fs.writeFileSync(settings.pidFile, `${process.pid}\n`);

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    log(`${signal}: stopping`);
    if (livePid(settings.pidFile) === process.pid) fs.rmSync(settings.pidFile, { force: true });
    server.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 2000).unref();
  };
  process.on("SIGTERM", () => stop("SIGTERM"));
  process.on("SIGINT", () => stop("SIGINT"));

  log(`messages kept under ${settings.folder}`);
  console.log(`smtp-fake ready on smtp://${HOST}:${settings.port} mail=${settings.folder}`);
}

main().catch((err: unknown) => {
  log(`error: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
