import type { Knex } from "knex";
import bcrypt from "bcryptjs";
import { buildDemoSection } from "./demo-section";
import { seedDemoMaterials } from "./demo-materials";
import { seedDemoDesign } from "./demo-design";
import { seedZonedDam } from "./demo-zoned-dam";
import { seedWeakLayer } from "./demo-weak-layer";
import { fetchMaterialsOfProject } from "../queries/materials";
import { toEngineMaterial } from "../../lib/materials/engine-material";

/** The demo scenario is invented: no real organisation, place or person. */
export const DEMO_PASSWORD = "scarpline-demo";
export const DEMO_ORGANISATION = "Orrin Basin Water Cooperative";
export const DEMO_PROJECT = "Lower Wendle Reservoir embankment";

export const DEMO_USERS = [
  { email: "admin@scarpline.test", name: "Demo Administrator", role: "admin" },
  { email: "engineer@scarpline.test", name: "Demo Engineer", role: "engineer" },
  { email: "reviewer@scarpline.test", name: "Demo Reviewer", role: "reviewer" },
  { email: "designer@scarpline.test", name: "Demo Designer", role: "designer" },
] as const;

/**
 * Seeds the demo organisation, one user per role and one project with its members.
 * Idempotent: an existing demo organisation is left as it is, so a restart keeps the team's work.
 */
export async function seedDemo(knex: Knex): Promise<{ created: boolean }> {
  const existing = await knex("organisations").where({ name: DEMO_ORGANISATION }).first();
  if (existing) return { created: false };

  await knex.transaction(async (trx) => {
    const [organisationId] = await trx("organisations").insert({ name: DEMO_ORGANISATION });
    const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
    const ids: Record<string, number> = {};
    for (const u of DEMO_USERS) {
      const [id] = await trx("users").insert({
        organisation_id: organisationId,
        email: u.email,
        name: u.name,
        role: u.role,
        password_hash: hash,
      });
      ids[u.role] = id;
    }
    const [projectId] = await trx("projects").insert({
      organisation_id: organisationId,
      name: DEMO_PROJECT,
      description:
        "Check of a 12 m homogeneous clay embankment on a silty clay foundation: downstream face under steady seepage, upstream face under rapid drawdown, both faces at end of construction.",
      created_by: ids.admin,
    });
    // The section takes its materials from the library, so both show the same lab-derived values.
    await seedDemoMaterials(trx, projectId, ids.engineer);
    const library = await fetchMaterialsOfProject(projectId, trx);
    const [sectionId] = await trx("sections").insert({
      project_id: projectId,
      name: "Main embankment, station 0+240",
      description:
        "Maximum section. Foundation taken as much less permeable than the fill for the seepage line; confirm with the site investigation.",
      current_version: 1,
      created_by: ids.engineer,
    });
    await trx("section_versions").insert({
      section_id: sectionId,
      version: 1,
      document: JSON.stringify(buildDemoSection(library.map(toEngineMaterial))),
      summary: "First version from the design drawings",
      created_by: ids.engineer,
    });
    await trx("project_members").insert([
      { project_id: projectId, user_id: ids.engineer, role: "engineer" },
      { project_id: projectId, user_id: ids.reviewer, role: "reviewer" },
      { project_id: projectId, user_id: ids.designer, role: "designer" },
    ]);
    await seedDemoDesign(trx, projectId, ids.designer);
    await seedZonedDam(trx, projectId, ids.engineer);
    await seedWeakLayer(trx, projectId, ids.engineer);
  });
  return { created: true };
}
