"use client";

import Link from "next/link";
import useSWR from "swr";
import { useState } from "react";
import type { ProjectSummary } from "@/lib/projects/types";
import { EmptyState } from "@/components/ui/empty-state";
import { NewProjectForm } from "./new-project-form";
import { countOf } from "@/lib/format";

export interface ProjectListProps {
  initialProjects: ProjectSummary[];
  canCreate: boolean;
}

export function ProjectList({ initialProjects, canCreate }: ProjectListProps) {
  const { data, mutate } = useSWR<{ projects: ProjectSummary[] }>("/api/projects", {
    fallbackData: { projects: initialProjects },
  });
  const [creating, setCreating] = useState(false);
  const projects = data?.projects ?? [];

  return (
    <div className="space-y-4">
      {canCreate ? (
        creating ? (
          <NewProjectForm
            onDone={() => {
              setCreating(false);
              void mutate();
            }}
            onCancel={() => setCreating(false)}
          />
        ) : (
          <button className="btn-primary" onClick={() => setCreating(true)}>
            New project
          </button>
        )
      ) : null}
      {projects.length === 0 ? (
        <EmptyState title="No projects yet">
          {canCreate
            ? "Create a project, then add the engineers, reviewers and designers who work on it."
            : "You are not a member of any project. Ask your administrator to add you to one."}
        </EmptyState>
      ) : (
        <ul className="grid gap-3 md:grid-cols-2" data-testid="project-list">
          {projects.map((p) => (
            <li key={p.id}>
              <Link href={`/projects/${p.id}`} className="panel block p-4 transition-colors hover:border-clay-500">
                <div className="flex items-baseline justify-between gap-2">
                  <h2 className="font-semibold">{p.name}</h2>
                  {p.memberRole ? (
                    <span className="text-xs uppercase tracking-wide text-ink-faint">{p.memberRole}</span>
                  ) : null}
                </div>
                <p className="mt-1 line-clamp-2 text-sm text-ink-soft">{p.description || "No description."}</p>
                <p className="mt-2 text-xs text-ink-faint">{countOf(p.memberCount, "member")}</p>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
