import type { Knex } from "knex";
import { getDb } from "../index";
import type { DocumentRecord, DocumentFilter, NewDocument } from "../../lib/documents/types";
// Re-exported so callers written before the move still compile; new code imports lib/documents/types.
export type { DocumentRecord, DocumentFilter, NewDocument };

function baseQuery(db: Knex) {
  return db("documents as d")
    .join("users as u", "u.id", "d.uploaded_by")
    .leftJoin("sections as s", "s.id", "d.section_id")
    .leftJoin("materials as m", "m.id", "d.material_id")
    .select("d.*", "u.name as uploader_name", "s.name as section_name", "m.name as material_name");
}

function toRecord(r: Record<string, unknown>): DocumentRecord {
  return {
    id: r.id as number,
    projectId: r.project_id as number,
    sectionId: (r.section_id as number | null) ?? null,
    sectionName: (r.section_name as string | null) ?? null,
    materialId: (r.material_id as number | null) ?? null,
    materialName: (r.material_name as string | null) ?? null,
    kind: r.kind as string,
    originalName: r.original_name as string,
    contentType: r.content_type as string,
    // BIGINT arrives as a number or a string depending on the driver's settings.
    sizeBytes: Number(r.size_bytes),
    storageKey: r.storage_key as string,
    sha256: r.sha256 as string,
    note: r.note as string,
    uploadedBy: r.uploaded_by as number,
    uploadedByName: r.uploader_name as string,
    uploadedAt: new Date(r.uploaded_at as Date).toISOString(),
  };
}

/** The project's documents, newest first; narrowed to one section or one material when asked. */
export async function fetchDocumentsOfProject(
  projectId: number,
  filter: DocumentFilter = {},
  db: Knex = getDb(),
): Promise<DocumentRecord[]> {
  const query = baseQuery(db).where("d.project_id", projectId);
  if (filter.sectionId !== undefined) query.andWhere("d.section_id", filter.sectionId);
  if (filter.materialId !== undefined) query.andWhere("d.material_id", filter.materialId);
  const rows = await query.orderBy([
    { column: "d.uploaded_at", order: "desc" },
    { column: "d.id", order: "desc" },
  ]);
  return rows.map(toRecord);
}

/** One document of the project, or null (also when it belongs to another project). */
export async function fetchDocument(
  projectId: number,
  documentId: number,
  db: Knex = getDb(),
): Promise<DocumentRecord | null> {
  const row = await baseQuery(db).where({ "d.id": documentId, "d.project_id": projectId }).first();
  return row ? toRecord(row) : null;
}

export async function insertDocument(input: NewDocument, db: Knex = getDb()): Promise<number> {
  const [id] = await db("documents").insert({
    project_id: input.projectId,
    section_id: input.sectionId,
    material_id: input.materialId,
    kind: input.kind,
    original_name: input.originalName,
    content_type: input.contentType,
    size_bytes: input.sizeBytes,
    storage_key: input.storageKey,
    sha256: input.sha256,
    note: input.note,
    uploaded_by: input.uploadedBy,
  });
  return id;
}

/** Deletes the row; false when it was gone already. The caller removes the stored bytes after this commits. */
export async function deleteDocument(documentId: number, db: Knex = getDb()): Promise<boolean> {
  return (await db("documents").where({ id: documentId }).delete()) > 0;
}

/** Whether the section exists and belongs to the project. */
export async function sectionBelongsToProject(
  projectId: number,
  sectionId: number,
  db: Knex = getDb(),
): Promise<boolean> {
  return Boolean(await db("sections").where({ id: sectionId, project_id: projectId }).first("id"));
}

/** Whether the material exists and belongs to the project. */
export async function materialBelongsToProject(
  projectId: number,
  materialId: number,
  db: Knex = getDb(),
): Promise<boolean> {
  return Boolean(await db("materials").where({ id: materialId, project_id: projectId }).first("id"));
}
