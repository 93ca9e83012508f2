import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchMaterialsOfProject } from "@/db/queries/materials";
import { PageTitle } from "@/components/ui/page-title";
import { MaterialsLibrary } from "@/components/materials/materials-library";
import { pageId } from "@/lib/api/ids";

export const metadata: Metadata = { title: "Materials" };

export default async function MaterialsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const user = await requirePageUser();
  const access = await findProjectAccess(user, pageId((await params).projectId));
  if (!access) notFound();
  const materials = await fetchMaterialsOfProject(access.project.id);
  return (
    <>
      <PageTitle
        title="Materials library"
        kicker={
          <Link href={`/projects/${access.project.id}`} className="hover:text-ink">
            {access.project.name}
          </Link>
        }
      />
      <p className="-mt-3 mb-6 max-w-3xl text-sm text-ink-soft">
        The soils and rock of this project, with the unit weights and strengths the analyses use. Units: kN/m³, kPa,
        degrees.
      </p>
      <MaterialsLibrary
        projectId={access.project.id}
        canEdit={can(access.role, "material.edit")}
        initialMaterials={materials}
      />
    </>
  );
}
