import "server-only";
import { createHash, randomUUID } from "node:crypto";
import { deleteDocument, insertDocument } from "@/db/queries/documents";
import type { DocumentRecord } from "@/lib/documents/types";
import { ApiError } from "@/lib/api/errors";
import type { FileTypeSpec } from "./file-types";
import { deleteObject, putObject } from "./object-store";
import type { UploadedFile, UploadFields } from "./upload-form";

export interface StoreDocumentInput {
  projectId: number;
  userId: number;
  file: UploadedFile;
  type: FileTypeSpec;
  fields: UploadFields;
}

const storageDown = (what: string) =>
  new ApiError(503, "storage_unavailable", `The document store did not answer; ${what}. Try again in a moment.`);

/** Object keys carry no user text, so odd file names never reach the store. */
export function newStorageKey(projectId: number): string {
  return `projects/${projectId}/documents/${randomUUID()}`;
}

/**
 * Writes the bytes to object storage, then the row. If the row cannot be written the object
 * is removed again, so a document is either fully stored or not at all. Returns the new id.
 */
export async function storeDocument(input: StoreDocumentInput): Promise<number> {
  const { file, type, fields } = input;
  const storageKey = newStorageKey(input.projectId);
  try {
    await putObject(storageKey, file.bytes, type.contentType);
  } catch (err) {
    console.error("[documents] storing an object failed", err);
    throw storageDown(`'${file.name}' was not stored`);
  }
  try {
    return await insertDocument({
      projectId: input.projectId,
      sectionId: fields.sectionId ?? null,
      materialId: fields.materialId ?? null,
      kind: fields.kind,
      originalName: file.name,
      contentType: type.contentType,
      sizeBytes: file.bytes.byteLength,
      storageKey,
      sha256: createHash("sha256").update(file.bytes).digest("hex"),
      note: fields.note,
      uploadedBy: input.userId,
    });
  } catch (err) {
    await deleteObject(storageKey).catch((cleanupErr: unknown) => {
      console.error(`[documents] could not remove ${storageKey} after a failed insert`, cleanupErr);
    });
    throw err;
  }
}

/**
 * Removes the row, and the stored object only once that has committed: a database failure then leaves
 * both in place (the delete can be retried), and an object store failure leaves an orphan object no row
 * points at, which is logged, rather than a row whose file is gone.
 */
export async function removeDocument(document: DocumentRecord): Promise<void> {
  if (!(await deleteDocument(document.id))) return;
  await deleteObject(document.storageKey).catch((err: unknown) => {
    console.error(`[documents] row ${document.id} deleted; its object ${document.storageKey} remains`, err);
  });
}
