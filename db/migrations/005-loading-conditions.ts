import type { Knex } from "knex";

/**
 * Runs name the loading condition they check (which fixes the required FS by default), and
 * projects may change each condition's required FS with a stated reason.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("runs", (t) => {
    t.string("loading_condition", 40).notNullable().defaultTo("steady-seepage");
  });
  await knex.schema.createTable("project_loading_conditions", (t) => {
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.string("condition_key", 40).notNullable();
    t.decimal("required_fs", 5, 3).notNullable();
    t.string("reason", 500).notNullable();
    t.integer("updated_by").unsigned().notNullable().references("users.id");
    t.timestamp("updated_at").notNullable().defaultTo(knex.fn.now());
    t.primary(["project_id", "condition_key"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("project_loading_conditions");
  await knex.schema.alterTable("runs", (t) => {
    t.dropColumn("loading_condition");
  });
}
