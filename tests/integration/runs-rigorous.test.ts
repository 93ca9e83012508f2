/**
 * Issue 15, the save path: a run with Spencer, Morgenstern–Price and a drawn slip surface is
 * re-computed by the server, which keeps λ and the surface; a surface the engine refuses is a 400
 * with its reason and place, and nothing is kept. Over HTTP against the built app and real MariaDB.
 */
import { describe, expect, test } from "vitest";
import { signedIn, type AppClient } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup } from "../support/runs";
import { getDb } from "@/db/index";
import type { SectionDocument } from "@/lib/stability";
import { documentForRun, type RunSetup } from "@/lib/analysis/run-setup";
import { searchRecord } from "@/lib/runs/record/search-record";
import { analyzeDrawnSurface } from "@/lib/runs/record/rigorous-part";
import { WEAK_LAYER_NAME, weakLayerSetup } from "@/db/seeds/demo-weak-layer";

const runCount = async () => Number((await getDb()("runs").count({ n: "*" }).first())?.n);

async function seamSection(client: AppClient, projectId: number) {
  const sections = (await (await client.request(`/api/projects/${projectId}/sections`)).json()).sections as {
    id: number;
    name: string;
  }[];
  const found = sections.find((s) => s.name === WEAK_LAYER_NAME);
  if (!found) throw new Error("the seam demo section is missing");
  const body = await (await client.request(`/api/projects/${projectId}/sections/${found.id}`)).json();
  return { sectionId: found.id, version: body.section.currentVersion as number, document: body.document };
}

async function keep(client: AppClient, projectId: number, body: Record<string, unknown>) {
  return client.request(`/api/projects/${projectId}/runs`, { method: "POST", json: body });
}

describe("a kept run with the rigorous methods and a drawn surface (issue 15)", { timeout: 120_000 }, () => {
  test("the server re-computes the drawn surface and keeps λ, the surface and the four methods", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const seam = await seamSection(engineer, demo.projectId);
    const setup = weakLayerSetup();
    const res = await keep(engineer, demo.projectId, {
      sectionId: seam.sectionId,
      sectionVersion: seam.version,
      title: "Seam, four methods",
      setup,
    });
    expect(res.status).toBe(201);
    const id = (await res.json()).run.id;
    const stored = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${id}`)).json()).run;
    expect(stored.methods).toEqual(["bishop", "fellenius", "spencer", "morgenstern-price"]);
    expect(stored.result.setup.surface).toEqual(setup.surface);
    expect(stored.result.setup.interslice).toBe("half-sine");

    // The same engine in this process, on the document the server analysed, gives the same numbers.
    const doc = documentForRun(seam.document as SectionDocument, setup as RunSetup);
    const here = analyzeDrawnSurface(doc, setup.surface!)!;
    const kept = stored.result.rigorous;
    expect(kept.surface.fs.spencer).toBeCloseTo(here.fs.spencer!, 9);
    expect(kept.surface.lambda["morgenstern-price"]).toBeCloseTo(here.lambda["morgenstern-price"]!, 9);
    expect(kept.surface.fs.bishop).toBeNull();
    expect(kept.surface.reasons.bishop.reason).toBe("circular-only");
    expect(kept.surface.rigorous.spencer.thrustLine.length).toBeGreaterThan(5);
    expect(kept.circles.spencer.solution.lambda).not.toBeNull();
    // The surfaces search's surface along the seam, kept with its own solution.
    expect(stored.result.setup.search).toBe("surfaces");
    expect(kept.searched.spencer.surface.length).toBeGreaterThan(2);
    expect(kept.searched.spencer.solution.fs).toBeLessThan(kept.circles.spencer.solution.fs * 0.9);
    // A seam governs: the surface along it is clearly below the critical circle (common practice).
    expect(kept.surface.fs.spencer).toBeLessThan(stored.fsBishop * 0.9);
  });

  test("Spencer on the demo embankment without a surface: within a few per cent of Bishop on its circle", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream", { methods: ["bishop", "spencer"] });
    const res = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Downstream, Spencer beside Bishop",
      setup,
    });
    expect(res.status).toBe(201);
    const id = (await res.json()).run.id;
    const stored = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${id}`)).json()).run;
    const record = searchRecord(documentForRun(demo.document, setup));
    if (!record.ok) throw new Error("search failed");
    const spencer = stored.result.rigorous.circles.spencer.solution.fs;
    expect(spencer).toBeCloseTo(record.result.results.spencer!.fs, 9);
    // Circles of ordinary slopes: Spencer within a few per cent of Bishop's simplified method
    // (Fredlund & Krahn 1977, from memory; Duncan & Wright, Soil Strength and Slope Stability, ch. 7).
    expect(Math.abs(spencer - stored.fsBishop) / stored.fsBishop).toBeLessThan(0.05);
    expect(stored.result.rigorous.surface).toBeNull();
  });

  test("a surface that does not end on the ground is refused with the engine's reason; nothing is kept", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const seam = await seamSection(engineer, demo.projectId);
    const before = await runCount();
    const setup = {
      ...weakLayerSetup(),
      surface: [
        [37, 20],
        [48, 6.2],
        [72, 6.2],
        [78, 6.5],
      ],
    };
    const res = await keep(engineer, demo.projectId, {
      sectionId: seam.sectionId,
      sectionVersion: seam.version,
      title: "Seam, open surface",
      setup,
    });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(error.fields["setup.surface"][0]).toMatch(/ground/i);
    expect(await runCount()).toBe(before);
  });

  test("the rigorous methods alone are refused: the circle search runs on a circular method", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream", { methods: ["spencer"] });
    const res = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Spencer alone",
      setup,
    });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(JSON.stringify(error.fields)).toMatch(/circle search runs on them/);
  });
});
