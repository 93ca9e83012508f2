import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchDesignStudy } from "@/db/queries/design-studies";
import { fetchDesignContext } from "@/lib/design/design-context";
import { PageTitle } from "@/components/ui/page-title";
import { DesignStudio } from "@/components/design/design-studio";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Design study" };

export default async function DesignStudyPage({ params }: { params: Promise<{ projectId: string; studyId: string }> }) {
  const user = await requirePageUser();
  const p = await params;
  const access = await findProjectAccess(user, pageId(p.projectId));
  if (!access) notFound();
  const studyId = pageId(p.studyId);
  const [study, context] = await Promise.all([
    fetchDesignStudy(access.project.id, studyId),
    fetchDesignContext(access.project.id),
  ]);
  if (!study) notFound();
  return (
    <>
      <PageTitle
        title={study.name}
        kicker={
          <>
            <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
              {access.project.name}
            </Link>{" "}
            /{" "}
            <Link href={`/projects/${access.project.id}/design`} className="hover:text-ink">
              Slope design
            </Link>
          </>
        }
      />
      <DesignStudio
        projectId={access.project.id}
        studyId={study.id}
        parameters={study.parameters}
        sweep={study.sweep}
        materials={context.materials}
        library={context.library}
        required={context.required}
        compaction={context.compaction}
        canEdit={can(access.role, "design.sweep")}
      />
    </>
  );
}
