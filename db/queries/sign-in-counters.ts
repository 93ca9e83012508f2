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

/**
 * Books the next password check of a key, `spacingMs` after the last one booked, and returns how long to
 * wait for it (ms). A booking further ahead than `maxWaitMs` is not made: null, and the queue stays as it was.
 */
export async function bookCheckSlot(
  key: string,
  spacingMs: number,
  maxWaitMs: number,
  db: Knex = getDb(),
): Promise<number | null> {
  return db.transaction(async (trx) => {
    const slot = "GREATEST(COALESCE(next_check_at, UTC_TIMESTAMP(3)), UTC_TIMESTAMP(3))";
    const row = await trx("sign_in_counters")
      .where({ counter_key: key })
      .forUpdate()
      .first(trx.raw(`TIMESTAMPDIFF(MICROSECOND, UTC_TIMESTAMP(3), ${slot}) AS ahead`));
    const waitMs = Math.max(0, Number(row?.ahead ?? 0) / 1000);
    if (waitMs > maxWaitMs) return null;
    await trx.raw(
      `UPDATE sign_in_counters SET next_check_at = ${slot} + INTERVAL ? MICROSECOND WHERE counter_key = ?`,
      [spacingMs * 1000, key],
    );
    return waitMs;
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
