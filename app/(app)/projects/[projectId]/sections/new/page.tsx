import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { PageTitle } from "@/components/ui/page-title";
import { NewSectionForm } from "@/components/section-workspace/new-section-form";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "New section" };

export default async function NewSectionPage({ params }: { params: Promise<{ projectId: string }> }) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  if (!can(access.role, "section.edit"))
    return (
      <div className="panel p-6" data-testid="forbidden">
        Engineers and designers add sections.
      </div>
    );
  return (
    <>
      <PageTitle
        title="New section"
        kicker={
          <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
            {access.project.name}
          </Link>
        }
      />
      <NewSectionForm projectId={access.project.id} />
    </>
  );
}
