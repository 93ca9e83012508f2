import type { AppClient } from "./http";
import type { SectionDocument } from "@/lib/stability";

/** The demo project's id and its demo section, as any member sees them over HTTP. */
export async function demoProject(
  client: AppClient,
): Promise<{ projectId: number; sectionId: number; version: number; document: SectionDocument }> {
  const projects = (await (await client.request("/api/projects")).json()).projects as { id: number; name: string }[];
  const project = projects.find((p) => p.name === "Lower Wendle Reservoir embankment");
  if (!project) throw new Error("demo project not visible");
  const sections = (await (await client.request(`/api/projects/${project.id}/sections`)).json()).sections as {
    id: number;
    name: string;
  }[];
  const section = sections.find((s) => s.name.startsWith("Main embankment"));
  if (!section) throw new Error("demo section missing");
  const body = await (await client.request(`/api/projects/${project.id}/sections/${section.id}`)).json();
  return {
    projectId: project.id,
    sectionId: section.id,
    version: body.section.currentVersion,
    document: body.document,
  };
}
