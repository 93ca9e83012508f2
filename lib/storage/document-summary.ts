import type { DocumentRecord } from "@/lib/documents/types";

/** A document as the API shows it: everything but where its bytes are kept. */
export type DocumentSummary = Omit<DocumentRecord, "storageKey">;

export function toDocumentSummary(record: DocumentRecord): DocumentSummary {
  const { storageKey: _hidden, ...summary } = record;
  return summary;
}
