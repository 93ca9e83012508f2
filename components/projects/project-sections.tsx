import Link from "next/link";
import type { SectionSummary } from "@/lib/sections/types";
import { formatDate, countOf } from "@/lib/format";
import { ArchiveSectionButton } from "./archive-section-button";

function SectionRows({
  projectId,
  sections,
  canEdit,
}: {
  projectId: number;
  sections: SectionSummary[];
  canEdit: boolean;
}) {
  return (
    <>
      {sections.map((s) => (
        <li key={s.id} className="flex items-center justify-between gap-4 px-4 py-3" data-testid="section-row">
          <div>
            <Link href={`/projects/${projectId}/sections/${s.id}`} className="font-medium hover:text-clay-600">
              {s.name}
            </Link>
            <p className="text-xs text-ink-soft">
              v{s.currentVersion} · saved by {s.updatedByName} on {formatDate(s.updatedAt)} ·{" "}
              {countOf(s.runCount, "run")}
              {s.archivedAt ? ` · archived ${formatDate(s.archivedAt)}` : ""}
            </p>
          </div>
          <div className="flex items-center gap-3">
            <p className="hidden max-w-md truncate text-sm text-ink-soft md:block">{s.description}</p>
            {canEdit ? (
              <ArchiveSectionButton
                projectId={projectId}
                sectionId={s.id}
                name={s.name}
                archived={s.archivedAt !== null}
              />
            ) : null}
          </div>
        </li>
      ))}
    </>
  );
}

/** The project's sections in use, then the archived ones folded away (kept with their runs). */
export function ProjectSections({
  projectId,
  sections,
  canEdit = false,
}: {
  projectId: number;
  sections: SectionSummary[];
  canEdit?: boolean;
}) {
  const active = sections.filter((s) => s.archivedAt === null);
  const archived = sections.filter((s) => s.archivedAt !== null);
  return (
    <div className="space-y-3">
      {active.length > 0 ? (
        <ul className="divide-y divide-rule rounded-lg border border-rule bg-paper-raised" data-testid="section-list">
          <SectionRows projectId={projectId} sections={active} canEdit={canEdit} />
        </ul>
      ) : (
        <p className="text-sm text-ink-soft">Every section of this project is archived.</p>
      )}
      {archived.length > 0 ? (
        <details data-testid="archived-sections">
          <summary className="cursor-pointer text-sm text-ink-soft">
            Archived sections ({archived.length}), kept with their runs
          </summary>
          <ul className="mt-2 divide-y divide-rule rounded-lg border border-rule bg-paper-sunk">
            <SectionRows projectId={projectId} sections={archived} canEdit={canEdit} />
          </ul>
        </details>
      ) : null}
    </div>
  );
}
