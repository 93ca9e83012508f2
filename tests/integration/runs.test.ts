import { describe, expect, test } from "vitest";
import { signedIn } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup, searchFor } from "../support/runs";
import { analyzeCircle } from "@/lib/stability";
import { documentForRun } from "@/lib/analysis/run-setup";

describe("runs", () => {
  test("a run is kept with its frozen section, its inputs, and slice tables the server computed", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream");
    const result = searchFor(demo.document, setup);
    const res = await engineer.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: {
        sectionId: demo.sectionId,
        sectionVersion: demo.version,
        title: "Downstream, steady seepage",
        setup,
        result,
      },
    });
    expect(res.status).toBe(201);
    const { run } = await res.json();
    const stored = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${run.id}`)).json()).run;
    expect(stored.status).toBe("draft");
    expect(stored.fsBishop).toBeCloseTo(result.results.bishop!.fs, 4);
    expect(stored.document.analysis.direction).toBe("right");
    expect(stored.document.regions).toEqual(demo.document.regions);
    // The stored slice table re-computes independently to the same FS (the engine is deterministic).
    const again = analyzeCircle(stored.document, result.results.bishop!.circle);
    expect(again.ok && again.fs.bishop).toBeCloseTo(stored.fsBishop, 4);
    expect(stored.sliceTables.bishop.slices.length).toBeGreaterThanOrEqual(40);
    expect(stored.engineVersion).toBe(result.engineVersion);
  });

  test("a result computed with other settings than the ones sent is not kept: the server's search is", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream");
    const result = searchFor(demo.document, { ...setup, slices: 20 });
    const res = await engineer.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: { sectionId: demo.sectionId, sectionVersion: demo.version, title: "Mismatched", setup, result },
    });
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.preview.status).toBe("differed");
    const stored = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${body.run.id}`)).json()).run;
    // The FS column keeps four decimals; the stored result keeps the server's full value.
    expect(stored.result.results.bishop.fs).toBeCloseTo(searchFor(demo.document, setup).results.bishop!.fs, 9);
    expect(stored.document.analysis.slices).toBe(40);
  });

  test("the upstream drawdown case runs and is stored with its pools", async () => {
    const designer = await signedIn("designer@scarpline.test");
    const demo = await demoProject(designer);
    const setup = quickSetup(demo.document, "upstream");
    const result = searchFor(demo.document, setup);
    const res = await designer.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: { sectionId: demo.sectionId, sectionVersion: demo.version, title: "Upstream drawdown", setup, result },
    });
    expect(res.status).toBe(201);
    const stored = (
      await (await designer.request(`/api/projects/${demo.projectId}/runs/${(await res.json()).run.id}`)).json()
    ).run;
    expect(stored.document.analysis.case).toBe("drawdown");
    expect(stored.document.analysis.drawdown).toEqual({ from: 16, to: 8, method: "effective" });
    expect(stored.document.analysis.direction).toBe("left");
    expect(stored.loadingCondition).toBe("drawdown-storage");
  });

  test("a reviewer may not create runs (403); a bad set-up is 400 with its fields", async () => {
    const reviewer = await signedIn("reviewer@scarpline.test");
    const demo = await demoProject(reviewer);
    const setup = quickSetup(demo.document, "downstream");
    const result = searchFor(demo.document, setup);
    const body = { sectionId: demo.sectionId, sectionVersion: demo.version, title: "Not mine to run", setup, result };
    expect(
      (await reviewer.request(`/api/projects/${demo.projectId}/runs`, { method: "POST", json: body })).status,
    ).toBe(403);
    const engineer = await signedIn("engineer@scarpline.test");
    const bad = await engineer.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: { ...body, setup: { ...setup, slices: 3, methods: [] } },
    });
    expect(bad.status).toBe(400);
    const { error } = await bad.json();
    expect(error.code).toBe("invalid_input");
    expect(error.fields["setup.slices"]).toEqual(["At least 10 slices."]);
    expect(error.fields["setup.methods"]).toEqual(["Choose at least one method."]);
  });

  test("a run of a project the user cannot see is 404", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream");
    const result = searchFor(demo.document, setup);
    const { run } = await (
      await engineer.request(`/api/projects/${demo.projectId}/runs`, {
        method: "POST",
        json: { sectionId: demo.sectionId, sectionVersion: demo.version, title: "Visible to members", setup, result },
      })
    ).json();
    const admin = await signedIn("admin@scarpline.test");
    await admin.request("/api/users", {
      method: "POST",
      json: { email: "stranger@scarpline.test", name: "Stran Ger", role: "reviewer", password: "stranger-pass-1" },
    });
    const stranger = await signedIn("stranger@scarpline.test", "stranger-pass-1");
    expect((await stranger.request(`/api/projects/${demo.projectId}/runs/${run.id}`)).status).toBe(404);
    expect((await stranger.request(`/api/projects/${demo.projectId}/runs`)).status).toBe(404);
  });

  test("required FS per loading condition: a reviewer changes one with a reason; an engineer may not", async () => {
    const reviewer = await signedIn("reviewer@scarpline.test");
    const { projectId } = await demoProject(reviewer);
    const noReason = await reviewer.request(`/api/projects/${projectId}/loading-conditions/steady-seepage`, {
      method: "PUT",
      json: { requiredFs: 1.6, reason: "" },
    });
    expect(noReason.status).toBe(400);
    const ok = await reviewer.request(`/api/projects/${projectId}/loading-conditions/steady-seepage`, {
      method: "PUT",
      json: { requiredFs: 1.6, reason: "Owner's standard asks for 1.6 on this dam." },
    });
    expect(ok.status).toBe(200);
    const steady = (await ok.json()).conditions.find((c: { key: string }) => c.key === "steady-seepage");
    expect(steady).toMatchObject({
      requiredFs: 1.6,
      defaultFs: 1.5,
      reason: "Owner's standard asks for 1.6 on this dam.",
    });
    const engineer = await signedIn("engineer@scarpline.test");
    expect(
      (
        await engineer.request(`/api/projects/${projectId}/loading-conditions/steady-seepage`, {
          method: "PUT",
          json: { requiredFs: 1.2, reason: "I would like it lower please." },
        })
      ).status,
    ).toBe(403);
    // Back to the default removes the project's own value.
    await reviewer.request(`/api/projects/${projectId}/loading-conditions/steady-seepage`, {
      method: "PUT",
      json: { requiredFs: 1.5, reason: "Back to the guideline value." },
    });
    const list = (await (await reviewer.request(`/api/projects/${projectId}/loading-conditions`)).json()).conditions;
    expect(list.find((c: { key: string }) => c.key === "steady-seepage").reason).toBeNull();
  });
});

// Keeps the run document builder honest: the document the server rebuilds is the one searched.
test("documentForRun(section, setup) sets the case and direction the engine uses", async () => {
  const engineer = await signedIn("engineer@scarpline.test");
  const demo = await demoProject(engineer);
  const doc = documentForRun(demo.document, quickSetup(demo.document, "upstream"));
  expect(doc.analysis).toMatchObject({ case: "drawdown", direction: "left" });
});
