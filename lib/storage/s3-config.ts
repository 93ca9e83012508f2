import { z } from "zod";

/**
 * Where uploaded source documents live. The defaults match the local fake that
 * scripts/s3-fake.ts starts on loopback, so development needs no extra settings;
 * a real deployment points S3_ENDPOINT (or no endpoint, for AWS itself) elsewhere.
 */
const s3Schema = z.object({
  S3_ENDPOINT: z.string().url().default("http://127.0.0.1:4569"),
  // S3 bucket names: 3–63 characters, lower-case letters, digits, dots and hyphens.
  S3_BUCKET: z
    .string()
    .regex(
      /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/,
      "must be a valid bucket name (3–63 lower-case letters, digits, '.' or '-')",
    )
    .default("scarpline-documents"),
  S3_ACCESS_KEY_ID: z.string().min(1).default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().min(1).default("S3RVER"),
  S3_REGION: z.string().min(1).default("us-east-1"),
  // Path-style URLs (endpoint/bucket/key): local fakes do not resolve bucket sub-domains.
  S3_FORCE_PATH_STYLE: z
    .enum(["true", "false", "1", "0"])
    .default("true")
    .transform((v) => v === "true" || v === "1"),
});

export type S3Settings = z.infer<typeof s3Schema>;

/** Reads the object-storage settings, failing early with the variable's name. */
export function readS3Settings(source: Record<string, string | undefined> = process.env): S3Settings {
  const parsed = s3Schema.safeParse(source);
  if (!parsed.success) {
    const detail = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Invalid object-storage settings: ${detail}`);
  }
  return parsed.data;
}
