import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { fetchRequiredFsMap } from "@/db/queries/loading-conditions";
import { PageTitle } from "@/components/ui/page-title";
import { Caution } from "@/components/ui/caution";
import { RunSetupForm } from "@/components/run-setup/run-setup-form";
import type { SectionDocument } from "@/lib/stability";

export const metadata: Metadata = { title: "New run" };

export default async function NewRunPage({ params }: { params: Promise<{ projectId: string; sectionId: string }> }) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, Number(p.projectId));
  if (!access) notFound();
  const section = await fetchSection(access.project.id, Number(p.sectionId));
  if (!section) notFound();
  if (!can(access.role, "run.create")) {
    return <div className="panel p-6" data-testid="forbidden">Engineers and designers run analyses; your role on this project is {access.role}.</div>;
  }
  const version = await fetchSectionVersion(section.id, section.currentVersion);
  const requiredFs = await fetchRequiredFsMap(access.project.id);
  return (
    <>
      <PageTitle
        title="New run"
        kicker={
          <>
            <Link href={`/projects/${access.project.id}`} className="hover:text-ink">{access.project.name}</Link> /{" "}
            <Link href={`/projects/${access.project.id}/sections/${section.id}`} className="hover:text-ink">{section.name} v{section.currentVersion}</Link>
          </>
        }
      />
      <RunSetupForm
        projectId={access.project.id}
        section={{ id: section.id, name: section.name, version: section.currentVersion }}
        document={version!.document as SectionDocument}
        requiredFs={requiredFs}
      />
      <div className="mt-6"><Caution compact /></div>
    </>
  );
}
