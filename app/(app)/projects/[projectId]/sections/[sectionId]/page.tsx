import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { materialPalette } from "@/lib/sections/material-palette";
import { PageTitle } from "@/components/ui/page-title";
import { SectionWorkspace } from "@/components/section-workspace/section-workspace";
import { DocumentsPanel } from "@/components/documents/documents-panel";
import type { SectionDocument } from "@/lib/stability";
import { pageId } from "@/lib/api/ids";
import { fetchLastRunSetup } from "@/db/queries/last-run-setup";
import { runSetupSchema } from "@/lib/analysis/run-setup";

export const metadata: Metadata = { title: "Section" };

export default async function SectionPage({ params }: { params: Promise<{ projectId: string; sectionId: string }> }) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, pageId(p.projectId));
  if (!access) notFound();
  const section = await fetchSection(access.project.id, pageId(p.sectionId));
  if (!section) notFound();
  const current = await fetchSectionVersion(section.id, section.currentVersion);
  const doc = current!.document as SectionDocument;
  const base = `/projects/${access.project.id}`;
  // Live checking searches as the last run did; a set-up that no longer parses gives way to the automatic one.
  const lastSetup = runSetupSchema.safeParse(await fetchLastRunSetup(access.project.id, section.id));
  return (
    <>
      <PageTitle
        title={section.name}
        kicker={
          <Link href={base} className="hover:text-ink">
            {access.project.name}
          </Link>
        }
      >
        <Link href={`${base}/sections/${section.id}/seepage`} className="btn-quiet">
          Seepage and flow net
        </Link>
        <Link href={`${base}/runs?section=${section.id}`} className="btn-quiet">
          Runs of this section
        </Link>
        {can(access.role, "run.create") ? (
          <Link href={`${base}/sections/${section.id}/runs/new`} className="btn-primary">
            New run
          </Link>
        ) : null}
      </PageTitle>
      {section.description ? <p className="-mt-3 mb-4 max-w-3xl text-sm text-ink-soft">{section.description}</p> : null}
      <SectionWorkspace
        projectId={access.project.id}
        section={section}
        document={doc}
        materials={materialPalette(doc.materials)}
        canEdit={can(access.role, "section.edit")}
        lastRunSetup={lastSetup.success ? lastSetup.data : null}
      />
      <section className="mt-8" aria-labelledby="section-documents">
        <h2 id="section-documents" className="mb-2 text-lg font-semibold">
          Survey files, drawings and photographs
        </h2>
        <DocumentsPanel
          projectId={access.project.id}
          sectionId={section.id}
          canUpload={can(access.role, "document.upload")}
          currentUserId={user.id}
          isAdmin={user.role === "admin"}
        />
      </section>
    </>
  );
}
