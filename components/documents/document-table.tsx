"use client";

import { DOCUMENT_KIND_LABELS, type DocumentKind } from "@/lib/storage/document-kinds";
import type { DocumentSummary } from "@/lib/storage/document-summary";
import { formatBytes } from "@/lib/storage/upload-limits";
import { formatDate } from "@/lib/format";

export interface DocumentTableProps {
  projectId: number;
  documents: DocumentSummary[];
  /** Show what each document is attached to (the project-wide list mixes sections and materials). */
  showAttachment: boolean;
  canDelete: (document: DocumentSummary) => boolean;
  onDelete: (document: DocumentSummary) => void;
  deletingId: number | null;
}

function attachmentOf(d: DocumentSummary): string {
  if (d.sectionName) return `Section: ${d.sectionName}`;
  if (d.materialName) return `Material: ${d.materialName}`;
  return "Project";
}

export function DocumentTable({
  projectId,
  documents,
  showAttachment,
  canDelete,
  onDelete,
  deletingId,
}: DocumentTableProps) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full rounded-lg border border-rule bg-paper-raised text-sm" data-testid="document-table">
        <thead className="bg-paper-sunk text-left text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="px-3 py-2">Name</th>
            <th className="px-3 py-2">Kind</th>
            {showAttachment ? <th className="px-3 py-2">For</th> : null}
            <th className="px-3 py-2 text-right">Size</th>
            <th className="px-3 py-2">Uploaded by</th>
            <th className="px-3 py-2">Date</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {documents.map((d) => (
            <tr key={d.id} className="border-t border-rule align-top" data-testid="document-row">
              <td className="px-3 py-2">
                <a
                  href={`/api/projects/${projectId}/documents/${d.id}`}
                  className="font-medium text-clay-600 hover:underline"
                  download={d.originalName}
                >
                  {d.originalName}
                </a>
                {d.note ? <p className="text-xs text-ink-faint">{d.note}</p> : null}
              </td>
              <td className="px-3 py-2">{DOCUMENT_KIND_LABELS[d.kind as DocumentKind] ?? d.kind}</td>
              {showAttachment ? <td className="px-3 py-2 text-ink-soft">{attachmentOf(d)}</td> : null}
              <td className="px-3 py-2 text-right tabular-nums">{formatBytes(d.sizeBytes)}</td>
              <td className="px-3 py-2">{d.uploadedByName}</td>
              <td className="px-3 py-2 text-ink-soft">{formatDate(d.uploadedAt)}</td>
              <td className="px-3 py-2 text-right">
                {canDelete(d) ? (
                  <button
                    type="button"
                    className="text-xs text-alarm-700 hover:underline disabled:opacity-50"
                    disabled={deletingId === d.id}
                    onClick={() => onDelete(d)}
                  >
                    {deletingId === d.id ? "Deleting…" : "Delete"}
                  </button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
