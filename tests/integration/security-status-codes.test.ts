import { describe, expect, test } from "vitest";
import { AppClient, signedIn } from "../support/http";
import { demoProject } from "../support/demo";
import { getDb } from "@/db/index";
import type { SectionDocument } from "@/lib/stability";

async function count(table: string): Promise<number> {
  return Number((await getDb()(table).count({ n: "*" }).first())?.n);
}

describe("4xx where a 500 was answered (issue 12, item 8)", () => {
  test("a name equal to another under the collation ('máin', 'main') is 409, on create and rename", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, document } = await demoProject(engineer);
    const create = (name: string) =>
      engineer.request(`/api/projects/${projectId}/sections`, {
        method: "POST",
        json: { name, description: "", document },
      });
    const main = await create("main");
    expect(main.status).toBe(201);
    const before = await count("sections");
    const accented = await create("máin");
    expect(accented.status).toBe(409);
    expect((await accented.json()).error.message).toMatch(/máin/);
    expect(await count("sections")).toBe(before);

    const other = await create("Spur bank");
    expect(other.status).toBe(201);
    const { section } = await other.json();
    const versionsBefore = await count("section_versions");
    const rename = await engineer.request(`/api/projects/${projectId}/sections/${section.id}`, {
      method: "PUT",
      json: { baseVersion: 1, document, name: "MÁIN" },
    });
    expect(rename.status).toBe(409);
    expect(await count("section_versions")).toBe(versionsBefore);
  });

  test("an automatic change summary over 300 characters is cut to 300, and the save goes through", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, document } = await demoProject(engineer);
    const created = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      json: { name: "Long names", description: "", document },
    });
    const { section } = await created.json();
    const renamed = structuredClone(document) as SectionDocument;
    // Three new materials with long ids: the summary names each ("material '…' added").
    const extra = [1, 2, 3].map((i) => ({ ...renamed.materials[0], id: `${"very-long-material-id-".repeat(6)}${i}` }));
    renamed.materials = [...renamed.materials, ...extra];
    const saved = await engineer.request(`/api/projects/${projectId}/sections/${section.id}`, {
      method: "PUT",
      json: { baseVersion: 1, document: renamed },
    });
    expect(saved.status).toBe(200);
    const { summary } = await saved.json();
    expect([...summary].length).toBeLessThanOrEqual(300);
    expect(summary.endsWith("…")).toBe(true);
  });

  test("a restore racing a save answers 409 to the one that lost, never 500, and writes one version each", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, document } = await demoProject(engineer);
    const created = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      json: { name: "Race bank", description: "", document },
    });
    const { section } = await created.json();
    const url = `/api/projects/${projectId}/sections/${section.id}`;
    let current = 1;
    const seen = new Set<number>();
    for (let round = 0; round < 6; round++) {
      const [restore, save] = await Promise.all([
        engineer.request(`${url}/versions/1/restore`, { method: "POST" }),
        engineer.request(url, { method: "PUT", json: { baseVersion: current, document, summary: `round ${round}` } }),
      ]);
      for (const s of [restore.status, save.status]) seen.add(s);
      expect([201, 409]).toContain(restore.status);
      expect([200, 409]).toContain(save.status);
      current = (await (await engineer.request(url)).json()).section.currentVersion;
    }
    const stored = await getDb()("section_versions").where({ section_id: section.id }).count({ n: "*" }).first();
    expect(Number(stored?.n)).toBe(current);
    expect(seen.has(500)).toBe(false);
  });

  test("ids that are not ids in page URLs answer 404", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, sectionId } = await demoProject(engineer);
    for (const path of [
      `/projects/${projectId}/runs/abc`,
      `/projects/${projectId}/sections/abc`,
      `/projects/${projectId}/sections/${sectionId}/versions/Infinity`,
      `/projects/${projectId}/sections/${sectionId}/versions/1e3`,
      `/projects/${projectId}/materials/-1`,
      `/projects/abc`,
    ]) {
      expect((await engineer.request(path)).status, path).toBe(404);
    }
  });

  test("/api/templates/constructor and other inherited keys are 404; a real template is 200", async () => {
    const client = new AppClient();
    for (const kind of ["constructor", "__proto__", "toString", "hasOwnProperty"]) {
      expect((await client.request(`/api/templates/${kind}`)).status, kind).toBe(404);
    }
    const csv = await client.request("/api/templates/materials");
    expect(csv.status).toBe(200);
    expect(await csv.text()).toMatch(/^id,name,model/);
  });
});
