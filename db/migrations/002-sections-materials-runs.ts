import type { Knex } from "knex";

export const LAB_TEST_KINDS = ["direct-shear", "triaxial-cu", "undrained", "compaction", "atterberg"] as const;
export const RUN_STATUSES = ["draft", "submitted", "returned", "approved"] as const;
export const LOAD_CASES = ["steady", "drawdown", "undrained"] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("sections", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.string("name", 200).notNullable();
    t.text("description").notNullable();
    t.integer("current_version").unsigned().notNullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at").notNullable().defaultTo(knex.fn.now());
    t.unique(["project_id", "name"]);
  });

  // Every save is a new row; older rows are never changed, so any version can be reopened.
  await knex.schema.createTable("section_versions", (t) => {
    t.increments("id");
    t.integer("section_id").unsigned().notNullable().references("sections.id").onDelete("CASCADE");
    t.integer("version").unsigned().notNullable();
    t.specificType("document", "LONGTEXT").notNullable();
    t.string("summary", 300).notNullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
    t.unique(["section_id", "version"]);
  });

  await knex.schema.createTable("materials", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.string("key", 60).notNullable();
    t.string("name", 200).notNullable();
    t.string("color", 16).notNullable();
    t.specificType("parameters", "LONGTEXT").notNullable();
    // Which lab test set each derived parameter came from, e.g. {"c": 12, "phi": 12}.
    t.specificType("sources", "LONGTEXT").notNullable();
    t.text("notes").notNullable();
    t.integer("updated_by").unsigned().notNullable().references("users.id");
    t.timestamp("updated_at").notNullable().defaultTo(knex.fn.now());
    t.unique(["project_id", "key"]);
  });

  await knex.schema.createTable("lab_test_sets", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.integer("material_id").unsigned().nullable().references("materials.id").onDelete("SET NULL");
    t.enu("kind", [...LAB_TEST_KINDS]).notNullable();
    t.string("name", 200).notNullable();
    t.specificType("data", "LONGTEXT").notNullable();
    t.specificType("result", "LONGTEXT").notNullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("runs", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.integer("section_id").unsigned().notNullable().references("sections.id").onDelete("CASCADE");
    t.integer("section_version_id").unsigned().notNullable().references("section_versions.id");
    t.integer("revises_run_id").unsigned().nullable().references("runs.id");
    t.string("title", 200).notNullable();
    t.enu("status", [...RUN_STATUSES])
      .notNullable()
      .defaultTo("draft");
    t.enu("load_case", [...LOAD_CASES]).notNullable();
    t.enu("face", ["upstream", "downstream"]).notNullable();
    t.string("methods", 60).notNullable();
    t.decimal("required_fs", 5, 3).notNullable();
    t.decimal("fs_bishop", 8, 4).nullable();
    t.decimal("fs_fellenius", 8, 4).nullable();
    t.string("engine_version", 40).notNullable();
    // The exact document analysed (section version + analysis), frozen with the run.
    t.specificType("document", "LONGTEXT").notNullable();
    t.specificType("result", "LONGTEXT").notNullable();
    t.specificType("slice_tables", "LONGTEXT").notNullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
    t.index(["project_id", "load_case"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("runs");
  await knex.schema.dropTableIfExists("lab_test_sets");
  await knex.schema.dropTableIfExists("materials");
  await knex.schema.dropTableIfExists("section_versions");
  await knex.schema.dropTableIfExists("sections");
}
