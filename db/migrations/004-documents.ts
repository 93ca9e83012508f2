import type { Knex } from "knex";

export const DOCUMENT_KINDS = ["lab-sheet", "survey", "photo", "other"] as const;

/**
 * Source documents (lab sheets, survey files, photographs) kept beside the section or
 * material they support. The bytes live in object storage under `storage_key`; this row is
 * what makes them visible, so a document exists only when both are written.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("documents", (t) => {
    t.increments("id");
    t.integer("project_id").unsigned().notNullable().references("projects.id").onDelete("CASCADE");
    t.integer("section_id").unsigned().nullable().references("sections.id").onDelete("CASCADE");
    // A material may be replaced while its lab sheets stay relevant to the project.
    t.integer("material_id").unsigned().nullable().references("materials.id").onDelete("SET NULL");
    t.enu("kind", [...DOCUMENT_KINDS]).notNullable();
    t.string("original_name", 255).notNullable();
    t.string("content_type", 100).notNullable();
    t.bigInteger("size_bytes").unsigned().notNullable();
    t.string("storage_key", 200).notNullable().unique();
    t.specificType("sha256", "CHAR(64)").notNullable();
    t.string("note", 500).notNullable().defaultTo("");
    t.integer("uploaded_by").unsigned().notNullable().references("users.id");
    t.timestamp("uploaded_at").notNullable().defaultTo(knex.fn.now());
    t.index(["project_id", "uploaded_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("documents");
}
