import { z } from "zod";

// "false" must read as false, which z.coerce.boolean() would not do.
const flag = z.enum(["true", "false", "1", "0"]).transform((v) => v === "true" || v === "1");

const envSchema = z.object({
  DATABASE_HOST: z.string().default("127.0.0.1"),
  DATABASE_PORT: z.coerce.number().int().positive().default(3307),
  DATABASE_USER: z.string().default("scarpline"),
  DATABASE_PASSWORD: z.string().default("scarpline-dev"),
  DATABASE_NAME: z
    .string()
    .regex(/^scarpline[A-Za-z0-9_]*$/, "must start with 'scarpline'")
    .default("scarpline"),
  APP_URL: z.string().url().default("http://127.0.0.1:3000"),
  // The job queue's Redis (scripts/redis-start.sh); workers on other hosts point here too.
  REDIS_HOST: z.string().min(1).default("127.0.0.1"),
  REDIS_PORT: z.coerce.number().int().positive().max(65535).default(6380),
  REDIS_PASSWORD: z.string().optional(),
  // How long a worker holds a job before others may take it as stalled (ms); tests shorten it.
  JOB_LOCK_MS: z.coerce.number().int().min(1000).max(600_000).default(30_000),
  // Outgoing mail. The defaults reach the local fake that scripts/services-start.sh starts.
  SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().max(65535).default(2525),
  SMTP_SECURE: flag.default(false),
  // The local fake offers no TLS; a real server should leave this false.
  SMTP_IGNORE_TLS: flag.default(true),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3).default("Scarpline notices <notices@scarpline.test>"),
  // Where the local fake keeps the mail it caught, read by the admin mail page.
  SMTP_MAIL_DIR: z.string().min(1).default(".data/mail"),
});

export type ServerEnv = z.infer<typeof envSchema>;

/** Reads the server's settings from the environment, failing early with the variable's name. */
export function readServerEnv(source: NodeJS.ProcessEnv = process.env): ServerEnv {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const detail = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Invalid environment: ${detail}`);
  }
  return parsed.data;
}
