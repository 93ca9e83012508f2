import type { Knex } from "knex";

/**
 * Probabilistic runs (docs/probabilistic.md, docs/jobs.md). A kept run may have probabilistic
 * results: each is written by the queue job that computed it, in the transaction that ends the job,
 * with the settings it was computed from frozen beside it. A project sets the reliability index β
 * it aims for, as it sets its required factors of safety, with the reason for departing from the
 * default; no row means the default (lib/probabilistic/targets.ts).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("probabilistic_results", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.integer("run_id").unsigned().notNullable().references("runs.id").onDelete("CASCADE");
    // One result per job: a retried job that somehow commits twice cannot keep two.
    t.integer("job_id").unsigned().notNullable().unique().references("jobs.id").onDelete("CASCADE");
    t.specificType("settings", "LONGTEXT").notNullable();
    t.specificType("result", "LONGTEXT").notNullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(["run_id", "id"]);
  });
  await knex.schema.createTable("project_reliability_targets", (t) => {
    t.integer("project_id").unsigned().notNullable().primary().references("projects.id").onDelete("CASCADE");
    t.decimal("target_beta", 4, 2).notNullable();
    t.string("reason", 500).notNullable();
    t.integer("updated_by").unsigned().notNullable().references("users.id");
    t.timestamp("updated_at").notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("project_reliability_targets");
  await knex.schema.dropTableIfExists("probabilistic_results");
}
