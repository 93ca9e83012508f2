import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { fetchRequiredFsMap } from "@/db/queries/loading-conditions";
import { PageTitle } from "@/components/ui/page-title";
import { RunSetupForm } from "@/components/runs/setup/run-setup-form";
import type { SectionDocument } from "@/lib/stability";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { fetchRun } from "@/db/queries/runs";
import { pageId, toId } from "@/lib/api/ids";
import { loadSeepageInputsByCondition } from "@/lib/seepage-stability/load-inputs";

export const metadata: Metadata = { title: "New run" };

export default async function NewRunPage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string; sectionId: string }>;
  searchParams: Promise<{ from?: string }>;
}) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, pageId(p.projectId));
  if (!access) notFound();
  const section = await fetchSection(access.project.id, pageId(p.sectionId));
  if (!section) notFound();
  if (!can(access.role, "run.create")) {
    return (
      <div className="panel p-6" data-testid="forbidden">
        Engineers and designers run analyses; your role on this project is {access.role}.
      </div>
    );
  }
  const version = await fetchSectionVersion(section.id, section.currentVersion);
  const requiredFs = await fetchRequiredFsMap(access.project.id);
  const document = version!.document as SectionDocument;
  const seepageInputs = await loadSeepageInputsByCondition(access.project.id, section.id, document);
  // "Revise as a new run" starts from the earlier run's settings, on the section as it is now.
  const from = toId((await searchParams).from);
  const earlier = from ? await fetchRun(access.project.id, from) : null;
  const initial =
    earlier && earlier.sectionId === section.id ? (earlier.result as { setup?: RunSetup }).setup : undefined;
  return (
    <>
      <PageTitle
        title={initial ? `New run revising “${earlier!.title}”` : "New run"}
        kicker={
          <>
            <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
              {access.project.name}
            </Link>{" "}
            /{" "}
            <Link href={`/projects/${access.project.id}/sections/${section.id}`} className="hover:text-ink">
              {section.name} v{section.currentVersion}
            </Link>
          </>
        }
      />
      <RunSetupForm
        projectId={access.project.id}
        section={{ id: section.id, name: section.name, version: section.currentVersion }}
        document={document}
        seepageInputs={seepageInputs}
        requiredFs={requiredFs}
        initial={initial}
        revisesRunId={earlier && initial ? earlier.id : undefined}
      />
    </>
  );
}
