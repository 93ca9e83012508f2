import type { Knex } from "knex";

/**
 * Design studies: a parametric embankment (its parameters as JSON) and the last slope sweep
 * run on it (JSON), so a sweep is kept and any of its points can be opened as a run later.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("design_studies", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.string("name", 200).notNullable();
    t.specificType("parameters", "LONGTEXT").notNullable();
    // Null until a sweep has run; replaced by the next sweep, and cleared when the parameters change.
    t.specificType("sweep_results", "LONGTEXT").nullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at").notNullable().defaultTo(knex.fn.now());
    t.index(["project_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("design_studies");
}
