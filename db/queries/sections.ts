import type { Knex } from "knex";
import { getDb } from "../index";

export interface SectionSummary {
  id: number;
  projectId: number;
  name: string;
  description: string;
  currentVersion: number;
  updatedAt: string;
  updatedByName: string;
}

export async function fetchSectionsOfProject(projectId: number, db: Knex = getDb()): Promise<SectionSummary[]> {
  const rows = await db("sections as s")
    .join("section_versions as v", function () {
      this.on("v.section_id", "s.id").andOn("v.version", "s.current_version");
    })
    .join("users as u", "u.id", "v.created_by")
    .where("s.project_id", projectId)
    .select("s.id", "s.project_id", "s.name", "s.description", "s.current_version", "v.created_at", "u.name as user_name")
    .orderBy("s.name");
  return rows.map((r: Record<string, unknown>) => ({
    id: r.id as number,
    projectId: r.project_id as number,
    name: r.name as string,
    description: r.description as string,
    currentVersion: r.current_version as number,
    updatedAt: new Date(r.created_at as Date).toISOString(),
    updatedByName: r.user_name as string,
  }));
}
