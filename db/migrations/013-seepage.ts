import type { Knex } from "knex";

const KINDS_BEFORE = ["direct-shear", "triaxial-cu", "undrained", "compaction", "atterberg"];
const KINDS_AFTER = [...KINDS_BEFORE, "permeability"];

const enumOf = (kinds: string[]) => `ENUM(${kinds.map((k) => `'${k}'`).join(", ")})`;

/**
 * Seepage in the app (docs/seepage.md): permeability test sets in the materials library, and the
 * seepage settings of a section per water condition (drains, element size, crest length, head
 * drops), which the engine's section document does not carry. One row per section and water
 * condition; `settings` is the JSON the seepage view saves (lib/seepage-view/settings.ts).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE lab_test_sets MODIFY kind ${enumOf(KINDS_AFTER)} NOT NULL`);
  await knex.schema.createTable("section_seepage", (t) => {
    t.increments("id");
    t.integer("section_id").unsigned().notNullable().references("sections.id").onDelete("CASCADE");
    t.string("water_condition_id", 40).notNullable();
    t.specificType("settings", "LONGTEXT").notNullable();
    t.integer("updated_by").unsigned().notNullable().references("users.id");
    t.timestamp("updated_at").notNullable().defaultTo(knex.fn.now());
    t.unique(["section_id", "water_condition_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("section_seepage");
  await knex("lab_test_sets").where({ kind: "permeability" }).delete();
  await knex.raw(`ALTER TABLE lab_test_sets MODIFY kind ${enumOf(KINDS_BEFORE)} NOT NULL`);
}
