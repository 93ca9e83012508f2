// A source document's record (db/queries/documents.ts reads and writes it; lib/storage keeps the bytes).

/** A source document's record; the bytes themselves are in object storage under `storageKey`. */
export interface DocumentRecord {
  id: number;
  projectId: number;
  sectionId: number | null;
  sectionName: string | null;
  materialId: number | null;
  materialName: string | null;
  kind: string;
  originalName: string;
  contentType: string;
  sizeBytes: number;
  storageKey: string;
  sha256: string;
  note: string;
  uploadedBy: number;
  uploadedByName: string;
  uploadedAt: string;
}

export interface DocumentFilter {
  sectionId?: number;
  materialId?: number;
}

export interface NewDocument {
  projectId: number;
  sectionId: number | null;
  materialId: number | null;
  kind: string;
  originalName: string;
  contentType: string;
  sizeBytes: number;
  storageKey: string;
  sha256: string;
  note: string;
  uploadedBy: number;
}
