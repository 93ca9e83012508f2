import type { Knex } from "knex";

/**
 * One-time password-reset links an administrator mails to a person (lib/auth/password-reset.ts), and
 * when each person last signed in (shown on the people screen).
 *
 * Only the SHA-256 of a link's token is kept, so a copy of the table cannot be replayed as links; a
 * link is used once (`used_at`) and expires (`expires_at`, UTC).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("password_reset_tokens", (t) => {
    t.increments("id");
    t.integer("user_id").unsigned().notNullable().references("users.id").onDelete("CASCADE");
    // Hex SHA-256 of the token the mail carries.
    t.specificType("token_hash", "CHAR(64)").notNullable().unique();
    t.specificType("expires_at", "DATETIME").notNullable();
    t.specificType("used_at", "DATETIME").nullable();
    t.integer("created_by").unsigned().nullable().references("users.id").onDelete("SET NULL");
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
    t.index(["user_id", "used_at"]);
  });
  await knex.schema.alterTable("users", (t) => {
    t.specificType("last_sign_in_at", "DATETIME").nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("last_sign_in_at");
  });
  await knex.schema.dropTableIfExists("password_reset_tokens");
}
