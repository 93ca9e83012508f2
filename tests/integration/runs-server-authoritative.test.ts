/**
 * Issue 12 item 1 (forged results), item 8 (revisesRunId) and issue 13 item 4 (kept runs keep
 * their warnings), tried over HTTP against the built app and the real database.
 */
import { describe, expect, test } from "vitest";
import { signedIn, type AppClient } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup, searchFor } from "../support/runs";
import { getDb } from "@/db/index";
import { analyzeCircle, type Radii } from "@/lib/stability";
import { documentForRun, type RunSetup } from "@/lib/analysis/run-setup";
import { searchRecord } from "@/lib/runs/record/search-record";
import { MAX_SEARCH_CIRCLES } from "@/lib/runs/record/limits";
import { describeWarning } from "@/lib/runs/view/warning-text";
import { pdfText } from "../support/pdf-text";

const runCount = async () => Number((await getDb()("runs").count({ n: "*" }).first())?.n);

async function keep(client: AppClient, projectId: number, body: Record<string, unknown>) {
  return client.request(`/api/projects/${projectId}/runs`, { method: "POST", json: body });
}

/** Among the set-up's own grid centres and radii, the circle whose honest Bishop FS is nearest `target`. */
function circleNear(setup: RunSetup, doc: Parameters<typeof documentForRun>[0], target: number) {
  const d = documentForRun(doc, setup);
  const { x1, x2, y1, y2, nx, ny } = setup.grid;
  const radii = setup.radii as Extract<Radii, { tangentY1: number }>;
  let best: { fs: number; circle: { xc: number; yc: number; r: number } } | null = null;
  for (let i = 0; i < nx; i++)
    for (let j = 0; j < ny; j++)
      for (let k = 0; k < radii.n; k++) {
        const xc = x1 + ((x2 - x1) * i) / (nx - 1);
        const yc = y1 + ((y2 - y1) * j) / (ny - 1);
        const t = radii.tangentY1 + ((radii.tangentY2 - radii.tangentY1) * k) / Math.max(1, radii.n - 1);
        const one = analyzeCircle(d, { xc, yc, r: yc - t });
        const fs = one.ok ? one.fs.bishop : null;
        if (fs !== null && (!best || Math.abs(fs - target) < Math.abs(best.fs - target)))
          best = { fs, circle: { xc, yc, r: yc - t } };
      }
  if (!best) throw new Error("no valid circle on the grid");
  const one = analyzeCircle(d, best.circle);
  if (!one.ok || !one.entry || !one.exit || !one.direction) throw new Error("circle failed");
  return { fs: best.fs, circle: best.circle, entry: one.entry, exit: one.exit, direction: one.direction };
}

describe("the server keeps its own search (issue 12 item 1)", () => {
  test("the forged run as made: a circle of honest FS 2.26 claimed critical is kept at the true minimum", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream");
    const honest = searchFor(demo.document, setup);
    const trueMin = honest.results.bishop!.fs;
    // The attack: a genuine circle of the same grid whose own FS is about 2.26 sent as the critical one.
    const forgedCircle = circleNear(setup, demo.document, 2.26);
    expect(forgedCircle.fs).toBeGreaterThan(trueMin + 0.5);
    const forged = structuredClone(honest);
    forged.results.bishop = forgedCircle;
    forged.lowest.bishop = [forgedCircle];
    forged.warnings = [];
    const before = await runCount();

    const res = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Downstream, forged",
      setup,
      result: forged,
    });
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(await runCount()).toBe(before + 1);
    // The answer says the preview differed, with the sent and the server's FS.
    expect(body.preview.status).toBe("differed");
    const fsLine = body.preview.differences.find((d: { field: string }) => d.field === "results.bishop.fs");
    expect(Number(fsLine.sent)).toBeCloseTo(forgedCircle.fs, 9);
    expect(Number(fsLine.server)).toBeCloseTo(trueMin, 9);

    // What is kept is the server's minimum, circle, lowest circles, warnings and slices.
    const stored = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${body.run.id}`)).json()).run;
    expect(stored.fsBishop).toBeCloseTo(trueMin, 4);
    expect(stored.result.results.bishop.circle).toEqual(honest.results.bishop!.circle);
    expect(stored.result.lowest.bishop.length).toBe(honest.lowest.bishop!.length);
    expect(stored.result.warnings.length).toBeGreaterThan(0);
    const again = analyzeCircle(stored.document, stored.result.results.bishop.circle);
    expect(again.ok && again.fs.bishop).toBeCloseTo(trueMin, 9);

    // The run page says so to whoever opens it.
    const page = await (await engineer.request(`/projects/${demo.projectId}/runs/${body.run.id}`)).text();
    expect(page).toContain('data-testid="preview-notice"');
    expect(page).toMatch(/differed from the server(&#x27;|')s own search/);
  });

  test("an honest preview matches exactly, and a save without one is searched all the same", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream");
    const preview = searchRecord(documentForRun(demo.document, setup));
    if (!preview.ok) throw new Error("search failed");
    const matched = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Downstream, honest",
      setup,
      result: preview.result,
    });
    expect(matched.status).toBe(201);
    expect((await matched.json()).preview).toEqual({ status: "matched", source: "browser", differences: [], more: 0 });
    const bare = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Downstream, no preview",
      setup,
    });
    expect(bare.status).toBe(201);
    const body = await bare.json();
    expect(body.preview.status).toBe("absent");
    const stored = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${body.run.id}`)).json()).run;
    expect(stored.fsBishop).toBeCloseTo(preview.result.results.bishop!.fs, 4);
  });

  test("a set-up over 250,000 circles is refused with 400 naming the limit, and nothing is written", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const base = quickSetup(demo.document, "downstream");
    const setup = { ...base, grid: { ...base.grid, nx: 100, ny: 100 }, radii: { ...base.radii, n: 26 } };
    expect(setup.grid.nx * setup.grid.ny * setup.radii.n).toBeGreaterThan(MAX_SEARCH_CIRCLES);
    const before = await runCount();
    const res = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Too large",
      setup,
    });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(error.fields["setup.radii.n"][0]).toMatch(/260,000 circles; a kept run may try at most 250,000/);
    expect(await runCount()).toBe(before);
  });
});

describe("kept runs keep their warnings (issue 13 item 4)", () => {
  for (const face of ["downstream", "upstream"] as const) {
    test(`the ${face} run's warnings, counts and least mα equal the browser preview's`, async () => {
      const engineer = await signedIn("engineer@scarpline.test");
      const demo = await demoProject(engineer);
      const setup = quickSetup(demo.document, face);
      // What the browser's worker computes and shows before the run is kept.
      const preview = searchRecord(documentForRun(demo.document, setup));
      if (!preview.ok) throw new Error("search failed");
      // The check means something only if the preview has warnings to lose (negative N′, radius limit, …).
      expect(preview.result.warnings.length).toBeGreaterThan(0);
      const res = await keep(engineer, demo.projectId, {
        sectionId: demo.sectionId,
        sectionVersion: demo.version,
        title: `Warnings, ${face}`,
        setup,
        result: preview.result,
      });
      expect(res.status).toBe(201);
      const { run } = await res.json();
      const stored = (await (await engineer.request(`/api/projects/${demo.projectId}/runs/${run.id}`)).json()).run;
      expect(stored.result.warnings).toEqual(preview.result.warnings);
      expect(stored.result.circles.rejected).toEqual(preview.result.circles.rejected);
      expect(stored.sliceTables.bishop.minMAlpha).toBe(preview.critical.bishop!.minMAlpha);
      // One count per warning: at most one negative-N′ line per method.
      const negative = stored.result.warnings.filter((w: { code: string }) => w.code === "negative-normal");
      expect(negative.length).toBeLessThanOrEqual(2);
      expect(new Set(negative.map((w: { message: string }) => w.message.split(":")[0])).size).toBe(negative.length);
      // The calculation report states them too, instead of "no warning".
      const pdf = await engineer.request(`/api/projects/${demo.projectId}/runs/${run.id}/report`);
      const text = await pdfText(await pdf.arrayBuffer());
      expect(text).not.toContain("raised no warning");
      expect(text).toContain(describeWarning(stored.result.warnings[0]).headline);
    });
  }
});

describe("revisesRunId (issue 12 item 8)", () => {
  test("an unknown revisesRunId is 404 and nothing is written", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const before = await runCount();
    const res = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Revises nothing",
      setup: quickSetup(demo.document, "downstream"),
      revisesRunId: 987654,
    });
    expect(res.status).toBe(404);
    expect((await res.json()).error.message).toMatch(/Run 987654, which this run says it revises, was not found/);
    expect(await runCount()).toBe(before);
  });

  test("a run may not revise a run of another project", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const setup = quickSetup(demo.document, "downstream");
    const first = await keep(engineer, demo.projectId, {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "A draft of the demo project",
      setup,
    });
    const draftId = (await first.json()).run.id as number;

    const admin = await signedIn("admin@scarpline.test");
    const { project } = await (
      await admin.request("/api/projects", {
        method: "POST",
        json: { name: "Spillway training wall", description: "" },
      })
    ).json();
    const users = (await (await admin.request("/api/users")).json()).users as { id: number; email: string }[];
    const engineerId = users.find((u) => u.email === "engineer@scarpline.test")!.id;
    await admin.request(`/api/projects/${project.id}/members`, {
      method: "POST",
      json: { userId: engineerId, role: "engineer" },
    });
    const created = await engineer.request(`/api/projects/${project.id}/sections`, {
      method: "POST",
      json: { name: "Wall section", document: demo.document },
    });
    expect(created.status).toBe(201);
    const sectionId = (await created.json()).section.id as number;
    const before = await runCount();
    const cross = await keep(engineer, project.id, {
      sectionId,
      sectionVersion: 1,
      title: "Claims to revise the other project's draft",
      setup,
      revisesRunId: draftId,
    });
    expect(cross.status).toBe(404);
    expect(await runCount()).toBe(before);
    // The draft it named can still be deleted.
    const del = await engineer.request(`/api/projects/${demo.projectId}/runs/${draftId}`, { method: "DELETE" });
    expect(del.status).toBeLessThan(300);
  });
});
