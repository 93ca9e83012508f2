import { fetchJson } from "@/lib/client/fetch-json";
import type { DocumentKind } from "@/lib/storage/document-kinds";
import type { DocumentSummary } from "@/lib/storage/document-summary";

export interface UploadTarget {
  projectId: number;
  sectionId?: number;
  materialId?: number;
}

/** Sends one file as multipart/form-data; throws ApiClientError with the server's message when refused. */
export async function uploadDocument(
  target: UploadTarget,
  file: File,
  kind: DocumentKind,
  note: string,
): Promise<DocumentSummary> {
  const form = new FormData();
  form.append("file", file, file.name);
  form.append("kind", kind);
  if (target.sectionId !== undefined) form.append("sectionId", String(target.sectionId));
  if (target.materialId !== undefined) form.append("materialId", String(target.materialId));
  if (note.trim()) form.append("note", note.trim());
  const { document } = await fetchJson<{ document: DocumentSummary }>(`/api/projects/${target.projectId}/documents`, {
    method: "POST",
    body: form,
  });
  return document;
}

/** The list URL for a panel: one section's, one material's, or the whole project's documents. */
export function documentsUrl(target: UploadTarget): string {
  const base = `/api/projects/${target.projectId}/documents`;
  if (target.sectionId !== undefined) return `${base}?sectionId=${target.sectionId}`;
  if (target.materialId !== undefined) return `${base}?materialId=${target.materialId}`;
  return base;
}
