import type { ProjectRole } from "@/lib/permissions";

// A project and its members as the pages read them (db/queries/projects.ts fills them from rows).

export interface ProjectSummary {
  id: number;
  organisationId: number;
  name: string;
  description: string;
  createdAt: string;
  memberRole: ProjectRole | null;
  memberCount: number;
}

export interface ProjectMember {
  userId: number;
  name: string;
  email: string;
  role: ProjectRole;
  addedAt: string;
}
