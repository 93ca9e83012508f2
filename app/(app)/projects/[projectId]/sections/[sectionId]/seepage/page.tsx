import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/lib/auth/session";
import { findProjectAccess } from "@/lib/projects/access";
import { can } from "@/lib/permissions";
import { fetchSection, fetchSectionVersion } from "@/db/queries/sections";
import { fetchMaterialsOfProject } from "@/db/queries/materials";
import { fetchSeepageSettings } from "@/db/queries/section-seepage";
import { waterConditionsOf, withWater, WATER_KIND_LABELS } from "@/lib/sections/water-conditions";
import { conductivitiesOf } from "@/lib/section-seepage/conductivities";
import { PageTitle } from "@/components/ui/page-title";
import { SeepageWorkspace } from "@/components/seepage/seepage-workspace";
import { ConductivityTable } from "@/components/seepage/conductivity-table";
import type { SectionDocument } from "@/lib/stability";

export const metadata: Metadata = { title: "Seepage" };

export default async function SeepagePage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string; sectionId: string }>;
  searchParams: Promise<{ condition?: string }>;
}) {
  const user = await requirePageUser();
  const p = await params;
  const q = await searchParams;
  const access = await findProjectAccess(user, Number(p.projectId));
  if (!access) notFound();
  const section = await fetchSection(access.project.id, Number(p.sectionId));
  if (!section) notFound();
  const current = await fetchSectionVersion(section.id, section.currentVersion);
  const stored = current!.document as SectionDocument;
  const conditions = waterConditionsOf(stored);
  const condition =
    conditions.find((c) => c.id === q.condition) ?? conditions.find((c) => c.kind === "steady") ?? conditions[0];
  const library = await fetchMaterialsOfProject(access.project.id);
  const conductivities = conductivitiesOf(library);
  const settings = await fetchSeepageSettings(section.id, condition.id);
  const base = `/projects/${access.project.id}`;
  const sectionHref = `${base}/sections/${section.id}`;
  const byKey = new Map(library.map((m) => [m.key, m]));
  return (
    <>
      <PageTitle
        title={`Seepage: ${section.name}`}
        kicker={
          <Link href={sectionHref} className="hover:text-ink">
            {access.project.name} · {section.name}
          </Link>
        }
      >
        <Link href={sectionHref} className="btn-quiet">
          Back to the section
        </Link>
      </PageTitle>
      <nav className="mb-4 flex flex-wrap gap-2 text-sm" aria-label="Water conditions">
        {conditions.map((c) => (
          <Link
            key={c.id}
            href={`${sectionHref}/seepage?condition=${encodeURIComponent(c.id)}`}
            aria-current={c.id === condition.id ? "page" : undefined}
            className={`rounded-md border px-2.5 py-1 ${
              c.id === condition.id ? "border-clay-500 bg-clay-50 text-ink" : "border-rule text-ink-soft hover:text-ink"
            }`}
            title={WATER_KIND_LABELS[c.kind]}
          >
            {c.name}
          </Link>
        ))}
      </nav>
      <section className="mb-6 space-y-2" aria-labelledby="conductivities">
        <h2 id="conductivities" className="text-lg font-semibold">
          Conductivities
        </h2>
        <ConductivityTable
          rows={stored.materials.map((m) => {
            const lib = byKey.get(m.id);
            return {
              id: m.id,
              name: m.name,
              impenetrable: m.model === "impenetrable",
              conductivity: conductivities.find((c) => c.key === m.id) ?? null,
              libraryHref: lib ? `${base}/materials/${lib.id}` : null,
            };
          })}
        />
      </section>
      <SeepageWorkspace
        projectId={access.project.id}
        sectionId={section.id}
        section={withWater(stored, condition.water)}
        condition={condition}
        conductivities={conductivities}
        settings={settings}
        canEdit={can(access.role, "section.edit")}
      />
    </>
  );
}
