import type { Knex } from "knex";

/**
 * Sections can be archived: hidden from the project's working list, kept with every version and
 * every run on them. A section that runs use is never deleted (its runs would go with it through
 * the foreign key's cascade), so the database refuses that delete below the application.
 *
 * `origin_key` names what generated a section (a design study's sweep point), so opening that
 * point again finds the section made the first time instead of making another.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("sections", (t) => {
    t.timestamp("archived_at").nullable();
    t.integer("archived_by").unsigned().nullable().references("users.id");
    t.string("origin_key", 160).nullable();
    t.unique(["project_id", "origin_key"]);
  });
  await knex.raw(`
    CREATE TRIGGER sections_guard_delete BEFORE DELETE ON sections FOR EACH ROW
    BEGIN
      IF EXISTS (SELECT 1 FROM runs WHERE section_id = OLD.id) THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'section_in_use: runs use this section; archive it instead';
      END IF;
    END`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP TRIGGER IF EXISTS sections_guard_delete");
  await knex.schema.alterTable("sections", (t) => {
    t.dropUnique(["project_id", "origin_key"]);
    t.dropForeign(["archived_by"]);
    t.dropColumn("archived_at");
    t.dropColumn("archived_by");
    t.dropColumn("origin_key");
  });
}
