/**
 * The local fake SMTP server's store (scripts/smtp-fake.ts): one JSON file per caught message in
 * a folder, written whole and then renamed, so a reader never sees half a message.
 */
import fs from "node:fs/promises";
import path from "node:path";

export interface CaughtMail {
  id: string;
  receivedAt: string;
  /** SMTP envelope: who the server was told to deliver to, which includes Bcc. */
  envelope: { from: string; to: string[] };
  from: string;
  to: string[];
  subject: string;
  date: string | null;
  text: string;
}

export const CAUGHT_MAIL_SUFFIX = ".json";

/** The caught mail, newest first; a folder that does not exist yet holds none. */
export async function listCaughtMail(folder: string, limit = 200): Promise<CaughtMail[]> {
  let names: string[];
  try {
    names = (await fs.readdir(folder)).filter((n) => n.endsWith(CAUGHT_MAIL_SUFFIX));
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw err;
  }
  // File names start with the receipt time, so a reverse sort is newest first.
  names.sort().reverse();
  const out: CaughtMail[] = [];
  for (const name of names.slice(0, limit)) {
    try {
      out.push(JSON.parse(await fs.readFile(path.join(folder, name), "utf8")) as CaughtMail);
    } catch {
      // A file removed between listing and reading is simply not shown.
    }
  }
  return out;
}
