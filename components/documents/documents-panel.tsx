"use client";

import useSWR from "swr";
import { useCallback, useMemo, useState } from "react";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import type { DocumentSummary } from "@/lib/storage/document-summary";
import { FormBanner } from "@/components/ui/form-message";
import { DocumentDropArea } from "./document-drop-area";
import { DocumentTable } from "./document-table";
import { documentsUrl } from "./upload-document";

export interface DocumentsPanelProps {
  projectId: number;
  /** Attach uploads to this section and list only its documents. */
  sectionId?: number;
  /** Attach uploads to this material and list only its documents. */
  materialId?: number;
  canUpload: boolean;
  currentUserId: number;
  isAdmin: boolean;
  /** The list as the page loaded it, shown before the first fetch. */
  initialDocuments?: DocumentSummary[];
}

/**
 * Source documents beside a section, a material or the whole project: upload by dropping
 * files, download again, delete your own (administrators may delete any).
 */
export function DocumentsPanel({
  projectId,
  sectionId,
  materialId,
  canUpload,
  currentUserId,
  isAdmin,
  initialDocuments,
}: DocumentsPanelProps) {
  const target = useMemo(() => ({ projectId, sectionId, materialId }), [projectId, sectionId, materialId]);
  const url = documentsUrl(target);
  const { data, error, mutate } = useSWR<{ documents: DocumentSummary[] }>(url, {
    fallbackData: initialDocuments ? { documents: initialDocuments } : undefined,
  });
  const [deleteError, setDeleteError] = useState<string | null>(null);
  const [deletingId, setDeletingId] = useState<number | null>(null);
  const documents = data?.documents ?? [];
  const refresh = useCallback(() => void mutate(), [mutate]);

  async function remove(document: DocumentSummary) {
    if (!window.confirm(`Delete '${document.originalName}'? The file is removed for everyone on the project.`)) return;
    setDeleteError(null);
    setDeletingId(document.id);
    try {
      await fetchJson(`/api/projects/${projectId}/documents/${document.id}`, { method: "DELETE" });
      await mutate();
    } catch (err) {
      setDeleteError(err instanceof ApiClientError ? err.message : "Could not reach the server.");
    } finally {
      setDeletingId(null);
    }
  }

  return (
    <section className="panel space-y-4 p-4" aria-labelledby="documents-heading" data-testid="documents-panel">
      <h2 id="documents-heading" className="font-semibold">
        Source documents
      </h2>
      {canUpload ? <DocumentDropArea target={target} onStored={refresh} /> : null}
      {error ? (
        <FormBanner kind="error">
          {error instanceof ApiClientError ? error.message : "Could not load the documents."}
        </FormBanner>
      ) : null}
      {deleteError ? <FormBanner kind="error">{deleteError}</FormBanner> : null}
      {!data && !error ? (
        <p className="text-sm text-ink-soft">Loading documents…</p>
      ) : documents.length === 0 ? (
        <p className="text-sm text-ink-soft" data-testid="documents-empty">
          No documents yet.{canUpload ? " Add the lab sheets, survey files and photographs this work rests on." : ""}
        </p>
      ) : (
        <DocumentTable
          projectId={projectId}
          documents={documents}
          showAttachment={sectionId === undefined && materialId === undefined}
          canDelete={(d) => isAdmin || d.uploadedBy === currentUserId}
          onDelete={remove}
          deletingId={deletingId}
        />
      )}
    </section>
  );
}
