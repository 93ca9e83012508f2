import type { Knex } from "knex";

export const CHECK_STATES = ["open", "ok", "concern"] as const;

/**
 * Review and sign-off of runs: who submitted, reviewed and when; the reviewer's checklist;
 * comments pinned to the section or a slice; an append-only audit trail; and each person's
 * choice of e-mail notices.
 *
 * Triggers guard the record below the application: a run's analysis never changes after it is
 * saved, status only moves draft → submitted → approved | returned, a run that left draft keeps
 * its title and material sources, an approved run is not updated at all, and only drafts may be
 * deleted. The application checks the same rules first so people get a clear message.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("runs", (t) => {
    t.integer("submitted_by").unsigned().nullable().references("users.id");
    t.timestamp("submitted_at").nullable();
    t.integer("reviewed_by").unsigned().nullable().references("users.id");
    t.timestamp("reviewed_at").nullable();
    t.text("review_note").nullable();
    // Where each material's strengths came from, copied from the library when the run is submitted.
    t.specificType("material_sources", "LONGTEXT").nullable();
  });

  await knex.schema.createTable("run_events", (t) => {
    t.increments("id");
    t.integer("run_id").unsigned().notNullable().references("runs.id").onDelete("CASCADE");
    t.integer("actor_id").unsigned().nullable().references("users.id");
    t.string("kind", 40).notNullable();
    t.string("from_status", 20).nullable();
    t.string("to_status", 20).nullable();
    t.text("note").notNullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["run_id", "id"]);
  });

  await knex.schema.createTable("run_comments", (t) => {
    t.increments("id");
    t.integer("run_id").unsigned().notNullable().references("runs.id").onDelete("CASCADE");
    t.integer("author_id").unsigned().notNullable().references("users.id");
    t.text("body").notNullable();
    // A place on the section in metres, or a slice of the critical circle (1-based, for a method).
    t.double("pin_x").nullable();
    t.double("pin_y").nullable();
    t.integer("slice_number").unsigned().nullable();
    t.string("slice_method", 20).nullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["run_id", "id"]);
  });

  await knex.schema.createTable("run_checklist_items", (t) => {
    t.integer("run_id").unsigned().notNullable().references("runs.id").onDelete("CASCADE");
    t.string("item_key", 40).notNullable();
    t.enu("state", [...CHECK_STATES]).notNullable();
    t.string("note", 1000).notNullable().defaultTo("");
    t.integer("updated_by").unsigned().notNullable().references("users.id");
    t.timestamp("updated_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.primary(["run_id", "item_key"]);
  });

  await knex.schema.createTable("notification_preferences", (t) => {
    t.integer("user_id").unsigned().notNullable().references("users.id").onDelete("CASCADE");
    t.string("notice_kind", 40).notNullable();
    t.boolean("enabled").notNullable();
    t.primary(["user_id", "notice_kind"]);
  });

  await knex.raw(`
    CREATE TRIGGER runs_guard_update BEFORE UPDATE ON runs FOR EACH ROW
    BEGIN
      IF OLD.status = 'approved' THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run_frozen: a signed-off run cannot be changed';
      END IF;
      IF NOT (OLD.document <=> NEW.document AND OLD.result <=> NEW.result AND OLD.slice_tables <=> NEW.slice_tables
              AND OLD.fs_bishop <=> NEW.fs_bishop AND OLD.fs_fellenius <=> NEW.fs_fellenius AND OLD.required_fs <=> NEW.required_fs
              AND OLD.section_version_id <=> NEW.section_version_id AND OLD.created_by <=> NEW.created_by
              AND OLD.revises_run_id <=> NEW.revises_run_id AND OLD.loading_condition <=> NEW.loading_condition) THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run_frozen: the analysis of a saved run cannot be changed';
      END IF;
      IF OLD.status <> 'draft' AND NOT (OLD.title <=> NEW.title AND OLD.material_sources <=> NEW.material_sources) THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run_frozen: a submitted run keeps its title and sources';
      END IF;
      IF OLD.status <> NEW.status AND NOT ((OLD.status = 'draft' AND NEW.status = 'submitted')
          OR (OLD.status = 'submitted' AND NEW.status IN ('approved', 'returned'))) THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run_frozen: this status change is not allowed';
      END IF;
    END`);
  await knex.raw(`
    CREATE TRIGGER runs_guard_delete BEFORE DELETE ON runs FOR EACH ROW
    BEGIN
      IF OLD.status <> 'draft' THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run_frozen: only a draft run can be deleted';
      END IF;
    END`);
  await knex.raw(`
    CREATE TRIGGER run_events_append_only BEFORE UPDATE ON run_events FOR EACH ROW
    BEGIN
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run_frozen: the audit trail is append-only';
    END`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP TRIGGER IF EXISTS run_events_append_only");
  await knex.raw("DROP TRIGGER IF EXISTS runs_guard_delete");
  await knex.raw("DROP TRIGGER IF EXISTS runs_guard_update");
  await knex.schema.dropTableIfExists("notification_preferences");
  await knex.schema.dropTableIfExists("run_checklist_items");
  await knex.schema.dropTableIfExists("run_comments");
  await knex.schema.dropTableIfExists("run_events");
  await knex.schema.alterTable("runs", (t) => {
    t.dropForeign(["submitted_by"]);
    t.dropForeign(["reviewed_by"]);
    t.dropColumn("submitted_by");
    t.dropColumn("submitted_at");
    t.dropColumn("reviewed_by");
    t.dropColumn("reviewed_at");
    t.dropColumn("review_note");
    t.dropColumn("material_sources");
  });
}
