import type { Knex } from "knex";

export const ROLES = ["admin", "engineer", "reviewer", "designer"] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("organisations", (t) => {
    t.increments("id");
    t.string("name", 200).notNullable();
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("users", (t) => {
    t.increments("id");
    t.integer("organisation_id").unsigned().notNullable().references("organisations.id");
    t.string("email", 254).notNullable().unique();
    t.string("name", 200).notNullable();
    t.string("password_hash", 100).notNullable();
    t.enu("role", [...ROLES]).notNullable();
    t.boolean("active").notNullable().defaultTo(true);
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at").notNullable().defaultTo(knex.fn.now());
  });

  // Keyed by the e-mail typed, not by user, so throttling says nothing about who exists.
  await knex.schema.createTable("sign_in_failures", (t) => {
    t.string("email", 254).primary();
    t.integer("failures").unsigned().notNullable().defaultTo(0);
    t.timestamp("last_failure_at").notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("projects", (t) => {
    t.increments("id");
    t.integer("organisation_id").unsigned().notNullable().references("organisations.id");
    t.string("name", 200).notNullable();
    t.text("description").notNullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at").notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("project_members", (t) => {
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.integer("user_id").unsigned().notNullable().references("users.id").onDelete("CASCADE");
    t.enu("role", ["engineer", "reviewer", "designer"]).notNullable();
    t.timestamp("added_at").notNullable().defaultTo(knex.fn.now());
    t.primary(["project_id", "user_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("project_members");
  await knex.schema.dropTableIfExists("projects");
  await knex.schema.dropTableIfExists("sign_in_failures");
  await knex.schema.dropTableIfExists("users");
  await knex.schema.dropTableIfExists("organisations");
}
