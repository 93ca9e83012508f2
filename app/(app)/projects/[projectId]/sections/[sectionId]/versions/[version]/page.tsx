import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { materialPalette } from "@/lib/sections/material-palette";
import { PageTitle } from "@/components/ui/page-title";
import { ReadOnlySection } from "@/components/section-workspace/read-only-section";
import type { SectionDocument } from "@/lib/stability";
import { pageId } from "@/lib/api/ids";
import { formatDateTime } from "@/lib/format";

export const metadata: Metadata = { title: "Section version" };

export default async function SectionVersionPage({
  params,
}: {
  params: Promise<{ projectId: string; sectionId: string; version: string }>;
}) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, pageId(p.projectId));
  if (!access) notFound();
  const section = await fetchSection(access.project.id, pageId(p.sectionId));
  if (!section) notFound();
  const version = await fetchSectionVersion(section.id, pageId(p.version));
  if (!version) notFound();
  const doc = version.document as SectionDocument;
  return (
    <>
      <PageTitle
        title={`${section.name}, version ${version.version}`}
        kicker={
          <Link href={`/projects/${access.project.id}/sections/${section.id}`} className="hover:text-ink">
            Back to the current version (v{section.currentVersion})
          </Link>
        }
      />
      <p className="-mt-3 mb-4 text-sm text-ink-soft" data-testid="version-meta">
        Read-only. Saved by {version.createdByName} on {formatDateTime(version.createdAt)}: {version.summary}
      </p>
      <ReadOnlySection document={doc} materials={materialPalette(doc.materials)} />
    </>
  );
}
