import { describe, expect, test } from "vitest";
import { AppClient, signedIn } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup, searchFor } from "../support/runs";
import { getDb } from "@/db/index";
import type { SectionDocument } from "@/lib/stability";

const bank = (): SectionDocument => ({
  version: 1,
  materials: [{ id: "clay", model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 8, phi: 26 }],
  regions: [
    {
      material: "clay",
      points: [
        [0, 0],
        [40, 0],
        [40, 5],
        [25, 5],
        [15, 10],
        [0, 10],
      ],
    },
  ],
});

async function count(table: string): Promise<number> {
  const row = await getDb()(table).count({ n: "*" }).first();
  return Number(row?.n);
}

describe("sections and their versions", () => {
  test("create, save twice, read every version, restore the first", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId } = await demoProject(engineer);
    const created = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      json: { name: "Canal bank km 2.1", description: "Left bank", document: bank() },
    });
    expect(created.status).toBe(201);
    const { section } = await created.json();

    const v2 = bank();
    (v2.materials[0] as { phi: number }).phi = 30;
    const save2 = await engineer.request(`/api/projects/${projectId}/sections/${section.id}`, {
      method: "PUT",
      json: { baseVersion: 1, document: v2 },
    });
    expect(save2.status).toBe(200);
    const s2 = await save2.json();
    expect(s2.section.version).toBe(2);
    // The one-line summary names what changed when the user gives none.
    expect(s2.summary).toMatch(/φ′ 26° → 30°/);

    const v3 = {
      ...v2,
      water: {
        phreatic: [
          [0, 8],
          [40, 3],
        ] as [number, number][],
      },
    };
    const save3 = await engineer.request(`/api/projects/${projectId}/sections/${section.id}`, {
      method: "PUT",
      json: { baseVersion: 2, document: v3, summary: "Added the seepage line" },
    });
    expect((await save3.json()).section.version).toBe(3);

    const detail = await (await engineer.request(`/api/projects/${projectId}/sections/${section.id}`)).json();
    expect(detail.section.versions.map((v: { version: number; summary: string }) => [v.version, v.summary])).toEqual([
      [3, "Added the seepage line"],
      [2, expect.stringContaining("φ′")],
      [1, "First version"],
    ]);
    const first = await (await engineer.request(`/api/projects/${projectId}/sections/${section.id}/versions/1`)).json();
    expect(first.version.document.materials[0].phi).toBe(26);

    const restored = await engineer.request(`/api/projects/${projectId}/sections/${section.id}/versions/1/restore`, {
      method: "POST",
    });
    expect(restored.status).toBe(201);
    const now = await (await engineer.request(`/api/projects/${projectId}/sections/${section.id}`)).json();
    expect(now.section.currentVersion).toBe(4);
    expect(now.document.materials[0].phi).toBe(26);
    expect(now.section.versions[0].summary).toBe("Restored version 1");
  });

  test("a save on top of an older version is refused with 409 and nothing is written", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, sectionId, version, document } = await demoProject(engineer);
    const before = await count("section_versions");
    const res = await engineer.request(`/api/projects/${projectId}/sections/${sectionId}`, {
      method: "PUT",
      json: { baseVersion: version + 5, document },
    });
    expect(res.status).toBe(409);
    expect(await count("section_versions")).toBe(before);
  });

  test("an invalid section gets every problem with its place and nothing is saved", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId } = await demoProject(engineer);
    const bad = bank();
    bad.regions[0].points = [
      [0, 0],
      [10, 10],
      [10, 0],
      [0, 10],
    ]; // edges cross
    (bad.materials[0] as { phi: number }).phi = 75;
    const sectionsBefore = await count("sections");
    const res = await engineer.request(`/api/projects/${projectId}/sections`, {
      method: "POST",
      json: { name: "Broken", description: "", document: bad },
    });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.code).toBe("invalid_section");
    const keys = Object.keys(body.error.fields);
    expect(keys.some((k) => k.startsWith("document.regions[0]"))).toBe(true);
    expect(keys.some((k) => k.startsWith("document.materials[0]"))).toBe(true);
    // The messages number regions and vertices as the side panel does, from 1 (issue 18, item 5).
    const messages = Object.values(body.error.fields as Record<string, string[]>)
      .flat()
      .join(" ");
    expect(messages).toMatch(/Region 1( \([^)]*\))?: the edges between vertices \d–\d and \d–\d cross/);
    expect(messages).not.toMatch(/regions\[\d\]|edges \d–\d and/);
    expect(await count("sections")).toBe(sectionsBefore);
  });

  test("a reviewer may read but not save; a non-member gets 404; no session gets 401", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const { projectId, sectionId, version, document } = await demoProject(engineer);
    const reviewer = await signedIn("reviewer@scarpline.test");
    expect((await reviewer.request(`/api/projects/${projectId}/sections/${sectionId}`)).status).toBe(200);
    expect(
      (
        await reviewer.request(`/api/projects/${projectId}/sections/${sectionId}`, {
          method: "PUT",
          json: { baseVersion: version, document },
        })
      ).status,
    ).toBe(403);

    const admin = await signedIn("admin@scarpline.test");
    await admin.request("/api/users", {
      method: "POST",
      json: { email: "outsider@scarpline.test", name: "Out Sider", role: "engineer", password: "outsider-pass-1" },
    });
    const outsider = await signedIn("outsider@scarpline.test", "outsider-pass-1");
    expect((await outsider.request(`/api/projects/${projectId}/sections/${sectionId}`)).status).toBe(404);
    expect((await new AppClient().request(`/api/projects/${projectId}/sections/${sectionId}`)).status).toBe(401);
  });

  test("the CSV templates download as text/csv", async () => {
    const res = await new AppClient().request("/api/templates/geometry");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    expect((await res.text()).split("\r\n")[0]).toBe("region,material,x,y");
  });
});

describe("archiving sections", () => {
  test("a section with runs is archived, not deleted; its runs stay; an unused one may be deleted", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const reviewer = await signedIn("reviewer@scarpline.test");
    const demo = await demoProject(engineer);
    const base = `/api/projects/${demo.projectId}/sections`;
    // A draft run on the demo section, kept as the run page keeps one.
    const setup = quickSetup(demo.document, "downstream");
    const kept = await engineer.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: {
        sectionId: demo.sectionId,
        sectionVersion: demo.version,
        title: `Archive check ${Date.now()}`,
        setup,
        result: searchFor(demo.document, setup),
      },
    });
    expect(kept.status).toBe(201);
    const runsBefore = await count("runs");

    const refused = await engineer.request(`${base}/${demo.sectionId}`, { method: "DELETE" });
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.message).toMatch(/runs? uses? this section.*archive it instead/);
    expect(await count("runs")).toBe(runsBefore);
    // Below the application, the database refuses the delete too (migration 010's trigger).
    await expect(getDb()("sections").where({ id: demo.sectionId }).delete()).rejects.toThrow(/section_in_use/);

    expect(
      (await reviewer.request(`${base}/${demo.sectionId}/archive`, { method: "POST", json: { archived: true } }))
        .status,
    ).toBe(403);
    const bad = await engineer.request(`${base}/${demo.sectionId}/archive`, {
      method: "POST",
      json: { archived: "yes" },
    });
    expect(bad.status).toBe(400);
    const archived = await engineer.request(`${base}/${demo.sectionId}/archive`, {
      method: "POST",
      json: { archived: true },
    });
    expect(archived.status).toBe(200);
    const listed = (await (await engineer.request(base)).json()).sections as {
      id: number;
      archivedAt: string | null;
    }[];
    expect(listed.find((s) => s.id === demo.sectionId)!.archivedAt).toMatch(/^\d{4}-\d\d-\d\d/);
    expect(await count("runs")).toBe(runsBefore);
    // The archived section still opens, with every version.
    expect((await engineer.request(`${base}/${demo.sectionId}`)).status).toBe(200);
    const restored = await engineer.request(`${base}/${demo.sectionId}/archive`, {
      method: "POST",
      json: { archived: false },
    });
    expect(restored.status).toBe(200);
    const back = (await (await engineer.request(base)).json()).sections as { id: number; archivedAt: string | null }[];
    expect(back.find((s) => s.id === demo.sectionId)!.archivedAt).toBeNull();

    const created = await engineer.request(base, {
      method: "POST",
      json: { name: `Unused bank ${Date.now()}`, description: "", document: bank() },
    });
    const { section } = await created.json();
    expect((await engineer.request(`${base}/${section.id}`, { method: "DELETE" })).status).toBe(204);
    expect(await getDb()("sections").where({ id: section.id }).first()).toBeUndefined();
  });
});
