import { z } from "zod";

const envSchema = z.object({
  DATABASE_HOST: z.string().default("127.0.0.1"),
  DATABASE_PORT: z.coerce.number().int().positive().default(3307),
  DATABASE_USER: z.string().default("scarpline"),
  DATABASE_PASSWORD: z.string().default("scarpline-dev"),
  DATABASE_NAME: z.string().regex(/^scarpline[A-Za-z0-9_]*$/, "must start with 'scarpline'").default("scarpline"),
  APP_URL: z.string().url().default("http://127.0.0.1:3000"),
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
