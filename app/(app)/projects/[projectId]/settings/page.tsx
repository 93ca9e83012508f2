import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchConditionSettings } from "@/db/queries/loading-conditions";
import { GUIDANCE_NOTE } from "@/lib/analysis/required-fs";
import { PageTitle } from "@/components/ui/page-title";
import { RequiredFsTable } from "@/components/settings/required-fs-table";
import { ReliabilityTargetForm } from "@/components/settings/reliability-target-form";
import { readReliabilityTarget } from "@/lib/probabilistic/read-target";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Required factors of safety" };

export default async function SettingsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  return (
    <>
      <PageTitle
        title="Required factors of safety"
        kicker={
          <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
            {access.project.name}
          </Link>
        }
      />
      <p
        className="mb-4 max-w-3xl rounded-md border-l-4 border-clay-500 bg-clay-50 px-4 py-2 text-sm text-ink-soft"
        data-testid="guidance-note"
      >
        {GUIDANCE_NOTE} Every run keeps the value it was judged against.
      </p>
      <RequiredFsTable
        projectId={access.project.id}
        initial={await fetchConditionSettings(access.project.id)}
        canEdit={can(access.role, "settings.edit")}
      />
      <ReliabilityTargetForm
        projectId={access.project.id}
        initial={await readReliabilityTarget(access.project.id)}
        canEdit={can(access.role, "settings.edit")}
      />
    </>
  );
}
