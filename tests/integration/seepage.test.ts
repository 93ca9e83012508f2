import { beforeAll, describe, expect, test } from "vitest";
import { signedIn, type AppClient } from "../support/http";
import { getDb } from "@/db/index";
import { DEMO_PROJECT } from "@/db/seeds/demo";
import { ZONED_DAM_NAME, ZONED_SEEPAGE_SETTINGS } from "@/db/seeds/demo-zoned-dam";

let engineer: AppClient;
let reviewer: AppClient;
let projectId: number;
let base: string;

beforeAll(async () => {
  engineer = await signedIn("engineer@scarpline.test");
  reviewer = await signedIn("reviewer@scarpline.test");
  const { projects } = await (await engineer.request("/api/projects")).json();
  projectId = (projects as { id: number; name: string }[]).find((p) => p.name === DEMO_PROJECT)!.id;
  base = `/api/projects/${projectId}`;
});

// Craig's Soil Mechanics, Example 2.1 (quoted from memory): falling head, specimen 200 mm long and
// 100 mm across, standpipe 5 mm, head 1.00 m to 0.35 m in 3 h; k = 4.9 × 10⁻⁸ m/s.
const CRAIG_FALLING_HEAD = {
  method: "falling-head",
  length: 200,
  diameter: 100,
  standpipeDiameter: 5,
  readings: [{ specimen: "E2.1", head: 1000, headEnd: 350, time: 10800 }],
};

describe("conductivity in the materials library", () => {
  test("kh and kv/kh are saved with the strengths; a bad k is 400 naming the field, nothing saved", async () => {
    const created = await engineer.request(`${base}/materials`, {
      method: "POST",
      json: {
        key: "seep-silt",
        name: "Test silt",
        parameters: { model: "mohr-coulomb", gamma: 19, c: 2, phi: 30, k: 2e-7, kRatio: 0.25 },
      },
    });
    expect(created.status).toBe(201);
    const { material } = await created.json();
    const got = await (await engineer.request(`${base}/materials/${material.id}`)).json();
    expect(got.material.parameters).toMatchObject({ k: 2e-7, kRatio: 0.25 });

    const bad = await engineer.request(`${base}/materials/${material.id}`, {
      method: "PUT",
      json: { parameters: { model: "mohr-coulomb", gamma: 19, c: 2, phi: 30, k: -1e-7 } },
    });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields)).toContain("parameters.k");
    const after = await (await engineer.request(`${base}/materials/${material.id}`)).json();
    expect(after.material.parameters.k).toBe(2e-7);
  });

  test("a falling-head set gives Craig's k, and kh taken from it keeps the set as its source", async () => {
    const m = (
      await (
        await engineer.request(`${base}/materials`, {
          method: "POST",
          json: {
            key: "seep-clay",
            name: "Test clay",
            parameters: { model: "mohr-coulomb", gamma: 19, c: 5, phi: 25 },
          },
        })
      ).json()
    ).material as { id: number };
    const res = await engineer.request(`${base}/lab-tests`, {
      method: "POST",
      json: { materialId: m.id, kind: "permeability", name: "Craig 2.1", data: CRAIG_FALLING_HEAD },
    });
    expect(res.status).toBe(201);
    const { labTest } = await res.json();
    expect(labTest.result.k).toBeGreaterThan(4.85e-8);
    expect(labTest.result.k).toBeLessThan(4.95e-8);

    const use = await engineer.request(`${base}/materials/${m.id}`, {
      method: "PUT",
      json: {
        parameters: { model: "mohr-coulomb", gamma: 19, c: 5, phi: 25, k: 4.9e-8 },
        sources: { k: labTest.id },
      },
    });
    expect(use.status).toBe(200);
    const got = (await (await engineer.request(`${base}/materials/${m.id}`)).json()).material;
    expect(got.parameters.k).toBe(4.9e-8);
    expect(got.sources).toEqual({ k: labTest.id });
  });

  test("a falling-head set without its standpipe is 400 and nothing is stored", async () => {
    const before = Number(
      (await getDb()("lab_test_sets").where({ project_id: projectId }).count({ n: "*" }).first())?.n,
    );
    const res = await engineer.request(`${base}/lab-tests`, {
      method: "POST",
      json: {
        kind: "permeability",
        name: "No standpipe",
        data: { ...CRAIG_FALLING_HEAD, standpipeDiameter: undefined },
      },
    });
    expect(res.status).toBe(400);
    const after = Number(
      (await getDb()("lab_test_sets").where({ project_id: projectId }).count({ n: "*" }).first())?.n,
    );
    expect(after).toBe(before);
  });
});

describe("seepage settings of a section", () => {
  async function zonedDam(): Promise<number> {
    const { sections } = await (await engineer.request(`${base}/sections`)).json();
    return (sections as { id: number; name: string }[]).find((s) => s.name === ZONED_DAM_NAME)!.id;
  }

  test("the demo zoned dam's settings read back; a drain outside the section is 400 naming the point", async () => {
    const sectionId = await zonedDam();
    const url = `${base}/sections/${sectionId}/seepage/storage-pool`;
    const got = await (await engineer.request(url)).json();
    expect(got.settings).toEqual(ZONED_SEEPAGE_SETTINGS);

    const bad = await engineer.request(url, {
      method: "PUT",
      json: {
        settings: {
          ...ZONED_SEEPAGE_SETTINGS,
          drains: [
            [
              [108, 6],
              [160, 6],
            ],
          ],
        },
      },
    });
    expect(bad.status).toBe(400);
    const body = await bad.json();
    expect(body.error.fields["settings.drains[0][1]"][0]).toMatch(
      /Drain 1, point 2 \(160, 6\) lies outside the section/,
    );
    expect((await (await engineer.request(url)).json()).settings).toEqual(ZONED_SEEPAGE_SETTINGS);

    const chimney = {
      ...ZONED_SEEPAGE_SETTINGS,
      drains: [
        ...ZONED_SEEPAGE_SETTINGS.drains,
        [
          [95, 6],
          [95, 12],
        ],
      ],
    };
    const ok = await engineer.request(url, { method: "PUT", json: { settings: chimney } });
    expect(ok.status).toBe(200);
    expect((await (await engineer.request(url)).json()).settings).toEqual(chimney);
    // Put the demo back for the browser tests that read it.
    await engineer.request(url, { method: "PUT", json: { settings: ZONED_SEEPAGE_SETTINGS } });
  });

  test("a reviewer may read but not change the settings; an unknown water condition is 404", async () => {
    const sectionId = await zonedDam();
    const url = `${base}/sections/${sectionId}/seepage/storage-pool`;
    expect((await reviewer.request(url)).status).toBe(200);
    expect((await reviewer.request(url, { method: "PUT", json: { settings: ZONED_SEEPAGE_SETTINGS } })).status).toBe(
      403,
    );
    expect((await engineer.request(`${base}/sections/${sectionId}/seepage/no-such-water`)).status).toBe(404);
  });
});
