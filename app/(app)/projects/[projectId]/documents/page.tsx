import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { toDocumentSummary } from "@/lib/storage/document-summary";
import { fetchDocumentsOfProject } from "@/db/queries/documents";
import { PageTitle } from "@/components/ui/page-title";
import { DocumentsPanel } from "@/components/documents/documents-panel";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Documents" };

/** Every source document of the project; files dropped here belong to the project as a whole. */
export default async function ProjectDocumentsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  const { project, role } = access;
  const documents = await fetchDocumentsOfProject(project.id);
  return (
    <>
      <PageTitle
        title="Documents"
        kicker={
          <Link href={`/projects/${project.id}`} className="hover:text-ink">
            {project.name}
          </Link>
        }
      />
      <p className="-mt-3 mb-6 max-w-3xl text-sm text-ink-soft">
        Lab sheets, survey files and photographs behind this project&apos;s sections and materials. Files added on this
        page belong to the project as a whole.
      </p>
      <DocumentsPanel
        projectId={project.id}
        canUpload={can(role, "document.upload")}
        currentUserId={user.id}
        isAdmin={role === "admin"}
        initialDocuments={documents.map(toDocumentSummary)}
      />
    </>
  );
}
