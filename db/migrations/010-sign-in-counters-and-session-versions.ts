import type { Knex } from "knex";

/**
 * Sign-in counters keyed by account, by client address and by the pair (lib/auth/throttle.ts), counted
 * before the password is checked; and a session version per user, so a token issued before a sign-out,
 * a password change, a role change or a deactivation stops working (lib/auth/session.ts).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("sign_in_counters", (t) => {
    // "account:<e-mail>", "address:<ip>" or "pair:<ip> <e-mail>"; 254 + 45 + a few characters.
    t.string("counter_key", 320).primary();
    t.integer("failures").unsigned().notNullable().defaultTo(0);
    t.timestamp("last_failure_at").notNullable().defaultTo(knex.fn.now());
    // The next time a password may be checked for this key once it is on the slow path (UTC).
    t.specificType("next_check_at", "DATETIME(3)").nullable();
  });
  await knex.schema.dropTableIfExists("sign_in_failures");
  await knex.schema.alterTable("users", (t) => {
    t.integer("session_version").unsigned().notNullable().defaultTo(1);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("session_version");
  });
  await knex.schema.createTable("sign_in_failures", (t) => {
    t.string("email", 254).primary();
    t.integer("failures").unsigned().notNullable().defaultTo(0);
    t.timestamp("last_failure_at").notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.dropTableIfExists("sign_in_counters");
}
