import type { Knex } from "knex";
import { getDb } from "../index";

export interface FailureRecord {
  failures: number;
  lastFailureAt: Date;
}

export async function fetchSignInFailures(email: string, db: Knex = getDb()): Promise<FailureRecord | null> {
  const row = await db("sign_in_failures").where({ email }).first();
  return row ? { failures: row.failures, lastFailureAt: new Date(row.last_failure_at) } : null;
}

/** Counts one more failure; an upsert so concurrent attempts cannot lose a count. */
export async function recordSignInFailure(email: string, db: Knex = getDb()): Promise<void> {
  await db.raw(
    "INSERT INTO sign_in_failures (email, failures, last_failure_at) VALUES (?, 1, UTC_TIMESTAMP()) " +
      "ON DUPLICATE KEY UPDATE failures = failures + 1, last_failure_at = UTC_TIMESTAMP()",
    [email],
  );
}

export async function clearSignInFailures(email: string, db: Knex = getDb()): Promise<void> {
  await db("sign_in_failures").where({ email }).delete();
}
