import type { Knex } from "knex";
import { getDb } from "../index";

/**
 * Counts one sign-in attempt against each key before its password is checked, and returns each key's
 * count including this attempt. The upsert holds the row lock until commit, so parallel attempts on one
 * key are numbered 1, 2, 3… and none is checked on a stale count. A key whose last failure is older than
 * `windowMinutes` starts again from 1.
 */
export async function countSignInAttempt(
  keys: string[],
  windowMinutes: number,
  db: Knex = getDb(),
): Promise<Record<string, number>> {
  return db.transaction(async (trx) => {
    for (const key of [...keys].sort()) {
      // MariaDB applies the assignments left to right: failures is computed from the old last_failure_at.
      await trx.raw(
        "INSERT INTO sign_in_counters (counter_key, failures, last_failure_at) VALUES (?, 1, UTC_TIMESTAMP()) " +
          "ON DUPLICATE KEY UPDATE failures = IF(last_failure_at < UTC_TIMESTAMP() - INTERVAL ? MINUTE, 1, " +
          "failures + 1), last_failure_at = UTC_TIMESTAMP()",
        [key, windowMinutes],
      );
    }
    const rows: { counter_key: string; failures: number }[] = await trx("sign_in_counters")
      .whereIn("counter_key", keys)
      .select("counter_key", "failures");
    return Object.fromEntries(rows.map((r) => [r.counter_key, r.failures]));
  });
}

/** A right password takes back its own attempt only: failures counted by other attempts stay. */
export async function takeBackSignInAttempt(keys: string[], db: Knex = getDb()): Promise<void> {
  await db("sign_in_counters")
    .whereIn("counter_key", keys)
    .update({ failures: db.raw("GREATEST(CAST(failures AS SIGNED) - 1, 0)") });
}

/** An administrator's unlock: forgets every counter that names the e-mail. */
export async function clearSignInCountersOf(email: string, db: Knex = getDb()): Promise<void> {
  await db("sign_in_counters")
    .where("counter_key", `account:${email}`)
    .orWhere("counter_key", "like", `pair:% ${email.replace(/[\\%_]/g, (c) => `\\${c}`)}`)
    .delete();
}
