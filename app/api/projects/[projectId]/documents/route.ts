import { NextResponse } from "next/server";
import { apiRoute, parseId } from "@/lib/api/handler";
import { forbidden } from "@/lib/api/errors";
import { requireUser } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { requireProjectAccess } from "@/lib/projects/access";
import { requireAllowedType, requireAttachTargets } from "@/lib/storage/check-upload";
import { toDocumentSummary } from "@/lib/storage/document-summary";
import { readListFilter } from "@/lib/storage/list-filter";
import { storeDocument } from "@/lib/storage/store-document";
import { readUploadForm } from "@/lib/storage/upload-form";
import { fetchDocument, fetchDocumentsOfProject } from "@/db/queries/documents";

type Ctx = { params: Promise<{ projectId: string }> };

/** Lists the project's documents, optionally those of one section (`?sectionId=`) or material (`?materialId=`). */
export const GET = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  await requireProjectAccess(user, projectId, "project.view");
  const documents = await fetchDocumentsOfProject(projectId, readListFilter(request.url));
  return NextResponse.json({ documents: documents.map(toDocumentSummary) });
});

/** Uploads one document (multipart/form-data: file, kind, sectionId?, materialId?, note?). */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const user = await requireUser();
  const projectId = parseId((await params).projectId, "The project");
  const { role } = await requireProjectAccess(user, projectId, "project.view");
  if (!can(role, "document.upload")) throw forbidden("upload documents");
  const { file, fields } = await readUploadForm(request);
  const type = requireAllowedType(file);
  await requireAttachTargets(projectId, fields, file.name);
  const id = await storeDocument({ projectId, userId: user.id, file, type, fields });
  const document = await fetchDocument(projectId, id);
  return NextResponse.json({ document: toDocumentSummary(document!) }, { status: 201 });
});
