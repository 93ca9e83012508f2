"use client";

import Link from "next/link";
import type { SectionVersionMeta } from "@/lib/sections/types";
import { formatDateTime } from "@/lib/format";

export interface VersionListProps {
  projectId: number;
  sectionId: number;
  versions: SectionVersionMeta[];
  current: number;
  canRestore: boolean;
  onRestore: (version: number) => void;
}

/** Every saved version, newest first: who, when, what changed; open any read-only, restore any. */
export function VersionList({ projectId, sectionId, versions, current, canRestore, onRestore }: VersionListProps) {
  return (
    <section className="panel p-3" aria-label="Versions" data-testid="version-list">
      <h2 className="mb-2 text-sm font-semibold">Versions</h2>
      <ol className="space-y-2 text-sm">
        {versions.map((v) => (
          <li key={v.version} className="border-t border-rule pt-2 first:border-0 first:pt-0">
            <div className="flex items-baseline justify-between gap-2">
              <span className="font-medium">
                v{v.version}
                {v.version === current ? <span className="ml-1 text-xs text-moss-700">current</span> : null}
              </span>
              <span className="text-xs text-ink-faint">{formatDateTime(v.createdAt)}</span>
            </div>
            <p className="text-ink-soft">{v.summary}</p>
            <p className="text-xs text-ink-faint">{v.createdByName}</p>
            {v.version !== current ? (
              <div className="mt-1 flex gap-3 text-xs">
                <Link
                  className="text-clay-600 hover:underline"
                  href={`/projects/${projectId}/sections/${sectionId}/versions/${v.version}`}
                >
                  Open read-only
                </Link>
                {canRestore ? (
                  <button type="button" className="text-clay-600 hover:underline" onClick={() => onRestore(v.version)}>
                    Restore
                  </button>
                ) : null}
              </div>
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}
