import type { Knex } from "knex";

/**
 * Jobs: long work that runs on queue workers (lib/jobs). The row is the truth the UI reads; the
 * queue (BullMQ on Redis) only carries the job's id. `input` is frozen when the job is made, so a
 * result always says what it was computed from, and a job whose queue was down is enqueued later
 * from its row (`enqueued_at` null).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("jobs", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.string("kind", 40).notNullable();
    // What the job belongs to, e.g. "design-study:12", so a page can find its latest job again.
    t.string("subject", 80).notNullable();
    t.string("state", 16).notNullable().defaultTo("queued");
    t.specificType("input", "LONGTEXT").notNullable();
    t.specificType("result", "LONGTEXT").nullable();
    t.string("error", 1000).nullable();
    t.integer("progress_done").unsigned().notNullable().defaultTo(0);
    t.integer("progress_total").unsigned().notNullable().defaultTo(0);
    t.integer("attempts").unsigned().notNullable().defaultTo(0);
    t.boolean("cancel_requested").notNullable().defaultTo(false);
    t.string("worker", 120).nullable();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp("enqueued_at", { precision: 3 }).nullable();
    t.timestamp("started_at", { precision: 3 }).nullable();
    t.timestamp("finished_at", { precision: 3 }).nullable();
    t.timestamp("updated_at", { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(["project_id", "state"]);
    t.index(["subject", "id"]);
    t.index(["state", "enqueued_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("jobs");
}
