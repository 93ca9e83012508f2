import { beforeAll, describe, expect, test } from "vitest";
import { signedIn, type AppClient } from "../support/http";
import { getDb } from "@/db/index";
import { DEMO_PROJECT } from "@/db/seeds/demo";
import { seedDemoMaterials } from "@/db/seeds/demo-materials";
import { MATERIAL_KEY_HINT } from "@/lib/materials/keys";
import { MATERIAL_COLORS } from "@/lib/materials/palette";

let engineer: AppClient;
let projectId: number;
let base: string;

const count = async (table: string) =>
  Number((await getDb()(table).where({ project_id: projectId }).count({ n: "*" }).first())?.n);

beforeAll(async () => {
  engineer = await signedIn("engineer@scarpline.test");
  const { projects } = await (await engineer.request("/api/projects")).json();
  projectId = (projects as { id: number; name: string }[]).find((p) => p.name === DEMO_PROJECT)!.id;
  base = `/api/projects/${projectId}`;
});

async function createMaterial(key: string, parameters: Record<string, unknown>) {
  const res = await engineer.request(`${base}/materials`, {
    method: "POST",
    json: { key, name: `Test ${key}`, parameters },
  });
  expect(res.status).toBe(201);
  return (await res.json()).material as { id: number; key: string; color: string; sources: Record<string, number> };
}

// Hand calculation of the least-squares line through (100, 90), (200, 181), (300, 270):
// slope = Σ(x − x̄)(y − ȳ)/Σ(x − x̄)² = 18 000/20 000 = 0.9, intercept = ȳ − 0.9·x̄ = 180.333 − 180 = 0.333 kPa,
// so φ' = atan 0.9 = 41.99° and c' = 0.33 kPa.
const SHEAR_BOX = {
  tests: [
    { specimen: "A", normalStress: 100, shearStress: 90 },
    { specimen: "B", normalStress: 200, shearStress: 181 },
    { specimen: "C", normalStress: 300, shearStress: 270 },
  ],
};

describe("materials library", () => {
  test("POST materials adds a material with a palette colour; GET lists it; a bad key or parameter is 400", async () => {
    const m = await createMaterial("test-core", { model: "mohr-coulomb", gamma: 19.5, gammaSat: 20.5, c: 8, phi: 28 });
    expect((MATERIAL_COLORS as readonly string[]).includes(m.color)).toBe(true);
    const list = (await (await engineer.request(`${base}/materials`)).json()).materials as { key: string }[];
    expect(list.map((x) => x.key)).toContain("test-core");

    const badKey = await engineer.request(`${base}/materials`, {
      method: "POST",
      json: { key: "Core Clay", name: "x", parameters: { model: "impenetrable" } },
    });
    expect(badKey.status).toBe(400);
    expect((await badKey.json()).error.fields.key).toEqual([MATERIAL_KEY_HINT]);
    // docs/engine.md §1: φ' must lie in [0°, 60°).
    const badPhi = await engineer.request(`${base}/materials`, {
      method: "POST",
      json: { key: "steep", name: "x", parameters: { model: "mohr-coulomb", gamma: 19, c: 0, phi: 65 } },
    });
    expect(badPhi.status).toBe(400);
    expect((await badPhi.json()).error.fields["parameters.phi"][0]).toMatch(/65/);
    const dup = await engineer.request(`${base}/materials`, {
      method: "POST",
      json: { key: "test-core", name: "again", parameters: { model: "impenetrable" } },
    });
    expect(dup.status).toBe(409);
  });

  test("a direct shear set derives c', φ'; using them records the set as their source", async () => {
    const m = await createMaterial("test-shear", { model: "mohr-coulomb", gamma: 19, c: 5, phi: 30 });
    const res = await engineer.request(`${base}/lab-tests`, {
      method: "POST",
      json: { materialId: m.id, kind: "direct-shear", name: "Box A", data: SHEAR_BOX },
    });
    expect(res.status).toBe(201);
    const { labTest } = await res.json();
    expect(labTest.result.frictionAngle).toBeCloseTo((Math.atan(0.9) * 180) / Math.PI, 6); // hand calculation above
    expect(labTest.result.cohesion).toBeCloseTo(0.3333, 3);
    expect(labTest.result.fit.n).toBe(3);

    const use = await engineer.request(`${base}/materials/${m.id}`, {
      method: "PUT",
      json: {
        parameters: { model: "mohr-coulomb", gamma: 19, c: 0.3, phi: 42 },
        sources: { c: labTest.id, phi: labTest.id },
      },
    });
    expect(use.status).toBe(200);
    const got = await (await engineer.request(`${base}/materials/${m.id}`)).json();
    expect(got.material.sources).toEqual({ c: labTest.id, phi: labTest.id });
    expect(got.material.parameters).toMatchObject({ c: 0.3, phi: 42 });
    expect(got.labTests.map((s: { id: number }) => s.id)).toEqual([labTest.id]);

    // Typing over φ' drops its source; c' keeps its own.
    await engineer.request(`${base}/materials/${m.id}`, {
      method: "PUT",
      json: { parameters: { model: "mohr-coulomb", gamma: 19, c: 0.3, phi: 38 } },
    });
    const edited = await (await engineer.request(`${base}/materials/${m.id}`)).json();
    expect(edited.material.sources).toEqual({ c: labTest.id });

    // A direct shear set cannot be the source of a unit weight.
    const wrong = await engineer.request(`${base}/materials/${m.id}`, {
      method: "PUT",
      json: { parameters: { model: "mohr-coulomb", gamma: 19, c: 0.3, phi: 38 }, sources: { gamma: labTest.id } },
    });
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).error.fields["sources.gamma"]).toEqual([
      expect.stringMatching(/set does not give γ\./),
    ]);

    // Deleting the set keeps the values but removes the source, in one go.
    expect((await engineer.request(`${base}/lab-tests/${labTest.id}`, { method: "DELETE" })).status).toBe(204);
    const after = await (await engineer.request(`${base}/materials/${m.id}`)).json();
    expect(after.material.sources).toEqual({});
    expect(after.material.parameters.c).toBe(0.3);
  });

  test("a bad lab row answers 400 naming the row, and nothing is stored", async () => {
    const before = await count("lab_test_sets");
    const shape = await engineer.request(`${base}/lab-tests`, {
      method: "POST",
      json: {
        kind: "direct-shear",
        name: "Bad box",
        data: {
          tests: [
            { normalStress: 50, shearStress: 30 },
            { normalStress: -100, shearStress: 60 },
            { normalStress: 150, shearStress: 85 },
          ],
        },
      },
    });
    expect(shape.status).toBe(400);
    const body = await shape.json();
    expect(body.error.code).toBe("invalid_lab_data");
    expect(body.error.message).toMatch(/test 2/);
    expect(body.error.fields["row 2, column normalStress"]).toEqual([
      expect.stringMatching(/^test 2: Normal stress σn \(kPa\): Too small: expected number to be >0/),
    ]);

    // Passes the schema but not the physics: σ3 − u must be positive (lib/lab's own check).
    const physics = await engineer.request(`${base}/lab-tests`, {
      method: "POST",
      json: {
        kind: "triaxial-cu",
        name: "Bad CU",
        data: {
          space: "p-q",
          specimens: [
            { cellPressure: 300, deviatorStress: 150, porePressure: 200 },
            { cellPressure: 300, deviatorStress: 200, porePressure: 320 },
          ],
        },
      },
    });
    expect(physics.status).toBe(400);
    const pb = await physics.json();
    expect(pb.error.message).toMatch(/test 2: effective cell pressure/);
    expect(pb.error.fields["row 2, column porePressure"].join(" ")).toMatch(
      /effective cell pressure σ3 − u must be positive/,
    );
    expect(await count("lab_test_sets")).toBe(before);
  });

  test("a bad materials CSV answers 400 with every problem by row and column, and saves nothing", async () => {
    const before = await count("materials");
    const csv = [
      "id,name,model,gamma,gammaSat,c,phi,su,suGradient,suDatum",
      "csv-good,Good row,mohr-coulomb,19,20,5,30,,,",
      "csv-steep,Too steep,mohr-coulomb,19,20,5,75,,,",
      "Bad Key,Not a slug,impenetrable,,,,,,,",
      "csv-soft,Soft clay,undrained,17,,,,abc,,",
    ].join("\n");
    const res = await engineer.request(`${base}/materials/import`, { method: "POST", json: { csv } });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(error.code).toBe("invalid_csv");
    expect(Object.keys(error.fields)).toEqual(
      expect.arrayContaining(["row 3, column phi", "row 4, column id", "row 5, column su"]),
    );
    expect(await count("materials")).toBe(before);

    const ok = await engineer.request(`${base}/materials/import`, {
      method: "POST",
      json: { csv: [csv.split("\n")[0], csv.split("\n")[1], "csv-rock,Rock,impenetrable,,,,,,,"].join("\n") },
    });
    expect(ok.status).toBe(201);
    expect((await ok.json()).materials.map((m: { key: string }) => m.key).sort()).toEqual(["csv-good", "csv-rock"]);
    const exported = await engineer.request(`${base}/materials/export`);
    expect(exported.headers.get("content-type")).toMatch(/text\/csv/);
    expect(await exported.text()).toMatch(/csv-good,Good row,mohr-coulomb,19,20,5,30/);

    const again = await engineer.request(`${base}/materials/import`, {
      method: "POST",
      json: { csv: [csv.split("\n")[0], csv.split("\n")[1]].join("\n") },
    });
    expect(again.status).toBe(400);
    expect((await again.json()).error.fields["row 2, column id"][0]).toMatch(/already has/);
  });

  test("a reviewer may read the library but not change it (403)", async () => {
    const m = await createMaterial("test-review", { model: "impenetrable" });
    const reviewer = await signedIn("reviewer@scarpline.test");
    expect((await reviewer.request(`${base}/materials/${m.id}`)).status).toBe(200);
    const tries = [
      reviewer.request(`${base}/materials`, {
        method: "POST",
        json: { key: "r-new", name: "x", parameters: { model: "impenetrable" } },
      }),
      reviewer.request(`${base}/materials/${m.id}`, {
        method: "PUT",
        json: { parameters: { model: "impenetrable", gamma: 22 } },
      }),
      reviewer.request(`${base}/materials/${m.id}`, { method: "DELETE" }),
      reviewer.request(`${base}/lab-tests`, {
        method: "POST",
        json: { kind: "direct-shear", name: "x", data: SHEAR_BOX },
      }),
      reviewer.request(`${base}/materials/import`, { method: "POST", json: { csv: "id,model\nr-rock,impenetrable" } }),
    ];
    for (const res of await Promise.all(tries)) {
      expect(res.status).toBe(403);
      expect((await res.json()).error.code).toBe("forbidden");
    }
  });

  test("someone who is not a member of the project gets 404", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const { project } = await (
      await admin.request("/api/projects", { method: "POST", json: { name: "Tailings cell 2 berm", description: "" } })
    ).json();
    for (const path of [`/api/projects/${project.id}/materials`, `/api/projects/${project.id}/lab-tests`]) {
      const res = await engineer.request(path);
      expect(res.status).toBe(404);
    }
    const post = await engineer.request(`/api/projects/${project.id}/materials`, {
      method: "POST",
      json: { key: "x", name: "x", parameters: { model: "impenetrable" } },
    });
    expect(post.status).toBe(404);
    expect((await admin.request(`/api/projects/${project.id}/materials`)).status).toBe(200);
  });

  test("deleting a material removes its lab test sets with it", async () => {
    const m = await createMaterial("test-gone", { model: "mohr-coulomb", gamma: 19, c: 5, phi: 30 });
    const set = await engineer.request(`${base}/lab-tests`, {
      method: "POST",
      json: { materialId: m.id, kind: "direct-shear", name: "Box B", data: SHEAR_BOX },
    });
    const { labTest } = await set.json();
    expect((await engineer.request(`${base}/materials/${m.id}`, { method: "DELETE" })).status).toBe(204);
    expect((await engineer.request(`${base}/lab-tests/${labTest.id}`)).status).toBe(404);
    expect((await engineer.request(`${base}/materials/${m.id}`)).status).toBe(404);
  });
});

describe("seedDemoMaterials", () => {
  test("seeds fill, foundation, drain and rock with values traced to their lab sets", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const { project } = await (
      await admin.request("/api/projects", { method: "POST", json: { name: "Seeded library check", description: "" } })
    ).json();
    const adminRow = await getDb()("users").where({ email: "admin@scarpline.test" }).first();
    await getDb().transaction((trx) => seedDemoMaterials(trx, project.id, adminRow.id));

    const got = await (await admin.request(`/api/projects/${project.id}/materials`)).json();
    type Row = {
      key: string;
      id: number;
      parameters: Record<string, number | string | boolean>;
      sources: Record<string, number>;
    };
    const byKey: Record<string, Row> = Object.fromEntries((got.materials as Row[]).map((m) => [m.key, m]));
    expect(Object.keys(byKey).sort()).toEqual(["drain", "fill", "foundation", "rock"]);
    const fill = byKey.fill;
    expect(fill.parameters.c).toBeGreaterThanOrEqual(8);
    expect(fill.parameters.c).toBeLessThanOrEqual(12);
    expect(fill.parameters.phi).toBeGreaterThanOrEqual(24);
    expect(fill.parameters.phi).toBeLessThanOrEqual(28);
    expect(Math.abs((fill.parameters.gamma as number) - 19)).toBeLessThan(0.5);
    expect(Math.abs((fill.parameters.gammaSat as number) - 20)).toBeLessThan(0.5);
    expect(fill.parameters.su).toBe(60);

    const detail = await (await admin.request(`/api/projects/${project.id}/materials/${fill.id}`)).json();
    const kindOf = (id: number) => detail.labTests.find((s: { id: number }) => s.id === id)?.kind;
    expect(kindOf(fill.sources.c)).toBe("direct-shear");
    expect(kindOf(fill.sources.gamma)).toBe("compaction");
    expect(detail.labTests.map((s: { kind: string }) => s.kind).sort()).toEqual([
      "atterberg",
      "compaction",
      "direct-shear",
      "triaxial-cu",
    ]);
    expect(Math.abs((byKey.foundation.parameters.su as number) - 35)).toBeLessThan(3);
    expect(byKey.drain.parameters).toMatchObject({ c: 0, phi: 36, freeDraining: true });
    expect(byKey.rock.parameters.model).toBe("impenetrable");

    // The pages render on the server with the library and the source marks.
    const library = await admin.request(`/projects/${project.id}/materials`);
    expect(library.status).toBe(200);
    const libraryHtml = await library.text();
    expect(libraryHtml).toContain("Materials library");
    expect(libraryHtml).toContain(`from lab test set ${fill.sources.c}`);
    const page = await admin.request(`/projects/${project.id}/materials/${fill.id}`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Compacted clay fill");
    expect(html).toContain("Plasticity chart");
    expect((await admin.request(`/projects/${project.id}/materials/999999`)).status).toBe(404);
  });
});
