import type { Knex } from "knex";

/**
 * A run whose factor of safety is below the required value may still be signed off, but only on
 * purpose: the reviewer's reason is kept with the run (for example "accepted as the record of a
 * failing case, redesign follows"), and every view says "signed off — below the required FS".
 * Null for runs signed off at or above the required FS, and for runs not signed off.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("runs", (t) => {
    t.text("below_required_reason").nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("runs", (t) => {
    t.dropColumn("below_required_reason");
  });
}
