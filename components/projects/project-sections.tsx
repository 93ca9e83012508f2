import Link from "next/link";
import type { SectionSummary } from "@/lib/sections/types";
import { formatDate } from "@/lib/format";

export function ProjectSections({ projectId, sections }: { projectId: number; sections: SectionSummary[] }) {
  return (
    <ul className="divide-y divide-rule rounded-lg border border-rule bg-paper-raised" data-testid="section-list">
      {sections.map((s) => (
        <li key={s.id} className="flex items-center justify-between gap-4 px-4 py-3">
          <div>
            <Link href={`/projects/${projectId}/sections/${s.id}`} className="font-medium hover:text-clay-600">
              {s.name}
            </Link>
            <p className="text-xs text-ink-faint">
              v{s.currentVersion} · saved by {s.updatedByName} on {formatDate(s.updatedAt)}
            </p>
          </div>
          <p className="hidden max-w-md truncate text-sm text-ink-soft md:block">{s.description}</p>
        </li>
      ))}
    </ul>
  );
}
