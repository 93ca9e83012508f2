import { describe, expect, test } from "vitest";
import { signedIn, type AppClient } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup, searchFor } from "../support/runs";
import { poolLevels, type StoredSection } from "@/lib/sections/water-conditions";
import { DEMO_POOL } from "@/db/seeds/demo-section";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { pdfText } from "../support/pdf-text";

async function keepRun(client: AppClient, title: string, setup: RunSetup) {
  const demo = await demoProject(client);
  const doc = demo.document as StoredSection;
  const result = searchFor(doc, setup);
  const res = await client.request(`/api/projects/${demo.projectId}/runs`, {
    method: "POST",
    json: { sectionId: demo.sectionId, sectionVersion: demo.version, title, setup, result },
  });
  return { demo, res };
}

describe("water conditions", () => {
  test("the demo section is stored with the set of waters a dam file carries", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const doc = (await demoProject(engineer)).document as StoredSection;
    expect(doc.waterConditions?.map((c) => c.kind)).toEqual([
      "steady",
      "steady",
      "construction",
      "drawdown",
      "drawdown",
    ]);
  });

  test("a section keeps its edited conditions; a bad one is refused whole with its place named", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const doc = structuredClone(demo.document) as StoredSection;
    doc.waterConditions![1].name = "Steady seepage, flood pool 17.0 m (checked)";
    const put = (document: unknown, baseVersion: number) =>
      engineer.request(`/api/projects/${demo.projectId}/sections/${demo.sectionId}`, {
        method: "PUT",
        json: { baseVersion, document },
      });
    const ok = await put(doc, demo.version);
    expect(ok.status).toBe(200);
    const saved = await demoProject(engineer);
    expect(saved.version).toBe(demo.version + 1);
    expect((saved.document as StoredSection).waterConditions![1].name).toMatch(/\(checked\)$/);

    const bad = structuredClone(saved.document) as StoredSection;
    bad.waterConditions![2].water = bad.waterConditions![0].water;
    const refused = await put(bad, saved.version);
    expect(refused.status).toBe(400);
    const body = await refused.json();
    expect(Object.keys(body.error.fields)).toContain("document.waterConditions[2].water.phreatic");
    expect((await demoProject(engineer)).version).toBe(saved.version);
  });

  test("an end-of-construction run of the upstream face records its water and analyses no reservoir", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const probe = await demoProject(engineer);
    const setup = quickSetup(probe.document, "upstream", { condition: "end-of-construction", requiredFs: 1.3 });
    const { demo, res } = await keepRun(engineer, "Upstream, end of construction", setup);
    expect(res.status).toBe(201);
    const id = (await res.json()).run.id;
    const run = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${id}`)).json()).run;
    expect(run.waterCondition.id).toBe("end-of-construction");
    expect(run.waterCondition.name).toMatch(/^End of construction, no reservoir/);
    expect(poolLevels(run.document, run.document.water)).toEqual({ left: null, right: null });

    const pdf = await engineer.request(`/api/projects/${demo.projectId}/runs/${id}/report`);
    expect(pdf.status).toBe(200);
    expect(await pdfText(await pdf.arrayBuffer())).toContain(`Water condition ${run.waterCondition.name}`);
  });

  test("a drawdown run names its water, and its PDF labels the lowered pool and the line before drawdown", async () => {
    const designer = await signedIn("designer@scarpline.test");
    const probe = await demoProject(designer);
    const setup = quickSetup(probe.document, "upstream", { waterCondition: "drawdown-storage" });
    const { demo, res } = await keepRun(designer, "Upstream, drawdown from storage", setup);
    expect(res.status).toBe(201);
    const id = (await res.json()).run.id;
    const run = (await (await designer.request(`/api/projects/${demo.projectId}/runs/${id}`)).json()).run;
    expect(run.waterCondition.id).toBe("drawdown-storage");
    const text = await pdfText(
      await (await designer.request(`/api/projects/${demo.projectId}/runs/${id}/report`)).arrayBuffer(),
    );
    expect(text).toContain(`pool after drawdown ${DEMO_POOL.drawdownTo.toFixed(1)} m`);
    expect(text).toContain(`before drawdown ${DEMO_POOL.normal.toFixed(1)} m (not analysed)`);
  });

  test("a set-up naming a water the section version does not have is refused and nothing is kept", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const probe = await demoProject(engineer);
    const setup = quickSetup(probe.document, "downstream");
    const result = searchFor(probe.document, setup);
    const res = await engineer.request(`/api/projects/${probe.projectId}/runs`, {
      method: "POST",
      json: {
        sectionId: probe.sectionId,
        sectionVersion: probe.version,
        title: "Unknown water",
        setup: { ...setup, waterCondition: "no-such-water" },
        result,
      },
    });
    expect(res.status).toBe(400);
    expect((await res.json()).error.code).toBe("unknown_water_condition");
  });
});
