import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchMaterial } from "@/db/queries/materials";
import { fetchLabTestSetsOfMaterial } from "@/db/queries/lab-tests";
import { PageTitle } from "@/components/ui/page-title";
import { Caution } from "@/components/ui/caution";
import { MaterialWorkbench } from "@/components/materials/material-workbench";
import { DocumentsPanel } from "@/components/documents/documents-panel";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Material" };

export default async function MaterialPage({ params }: { params: Promise<{ projectId: string; materialId: string }> }) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, pageId(p.projectId));
  if (!access) notFound();
  const materialId = pageId(p.materialId);
  const [material, labTests] = await Promise.all([
    fetchMaterial(access.project.id, materialId),
    fetchLabTestSetsOfMaterial(access.project.id, materialId),
  ]);
  if (!material) notFound();
  return (
    <>
      <PageTitle
        title={material.name}
        kicker={
          <>
            <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
              {access.project.name}
            </Link>
            {" / "}
            <Link href={`/projects/${access.project.id}/materials`} className="hover:text-ink">
              Materials
            </Link>
          </>
        }
      >
        <span className="font-mono text-sm text-ink-faint">{material.key}</span>
      </PageTitle>
      <div className="mb-6">
        <Caution compact />
      </div>
      <MaterialWorkbench
        projectId={access.project.id}
        canEdit={can(access.role, "material.edit")}
        initial={{ material, labTests }}
      />
      <section className="mt-8" aria-labelledby="material-documents">
        <h2 id="material-documents" className="mb-2 text-lg font-semibold">
          Lab sheets and other sources
        </h2>
        <DocumentsPanel
          projectId={access.project.id}
          materialId={material.id}
          canUpload={can(access.role, "document.upload")}
          currentUserId={user.id}
          isAdmin={user.role === "admin"}
        />
      </section>
    </>
  );
}
