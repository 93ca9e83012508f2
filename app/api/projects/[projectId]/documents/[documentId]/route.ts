import { apiRoute, parseId } from "@/lib/api/handler";
import { ApiError, forbidden, notFound } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { requireProjectAccess } from "@/lib/projects/access";
import { attachmentDisposition } from "@/lib/storage/content-disposition";
import { getObjectStream } from "@/lib/storage/object-store";
import { removeDocument } from "@/lib/storage/store-document";
import { fetchDocument } from "@/db/queries/documents";

type Ctx = { params: Promise<{ projectId: string; documentId: string }> };

async function loadDocument(params: Ctx["params"]) {
  const user = await requireUser();
  const p = await params;
  const projectId = parseId(p.projectId, "The project");
  const documentId = parseId(p.documentId, "The document");
  const { role } = await requireProjectAccess(user, projectId, "project.view");
  const document = await fetchDocument(projectId, documentId);
  if (!document) throw notFound("The document");
  return { user, role, document };
}

/** Streams the file back as a download under its original name; any project member may. */
export const GET = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { document } = await loadDocument(params);
  const stored = await getObjectStream(document.storageKey).catch((err: unknown) => {
    console.error(`[documents] reading ${document.storageKey} failed`, err);
    throw new ApiError(
      503,
      "storage_unavailable",
      `The document store did not answer; '${document.originalName}' cannot be downloaded now.`,
    );
  });
  if (!stored)
    throw new ApiError(
      410,
      "file_missing",
      `The stored file of '${document.originalName}' is missing; upload it again.`,
    );
  return new Response(stored.body, {
    headers: {
      "content-type": document.contentType,
      "content-length": String(stored.contentLength ?? document.sizeBytes),
      "content-disposition": attachmentDisposition(document.originalName),
      // Served as a download only: the browser must not guess another type and render it.
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
});

/** Deletes the document (object and row); only its uploader or an administrator may. */
export const DELETE = apiRoute(async (_request: Request, { params }: Ctx) => {
  const { user, role, document } = await loadDocument(params);
  if (document.uploadedBy !== user.id && role !== "admin") throw forbidden("delete a document someone else uploaded");
  await removeDocument(document);
  return new Response(null, { status: 204 });
});
