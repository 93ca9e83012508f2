import type { Knex } from "knex";

/**
 * A run records which of its section's named water conditions it analysed (key and name as
 * they stood in that section version), so the run page, the runs list, the comparison and the
 * PDF can say which water was used. Runs kept before named conditions leave both empty.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("runs", (t) => {
    t.string("water_condition_id", 40).nullable();
    t.string("water_condition_name", 160).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("runs", (t) => {
    t.dropColumn("water_condition_name");
    t.dropColumn("water_condition_id");
  });
}
