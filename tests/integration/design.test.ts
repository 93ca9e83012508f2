import { beforeAll, describe, expect, test } from "vitest";
import { signedIn, type AppClient } from "../support/http";
import { pollJob } from "../support/jobs";
import { getDb } from "@/db/index";
import { DEMO_PROJECT } from "@/db/seeds/demo";
import { DEMO_MATERIALS } from "@/db/seeds/demo-section";
import { seedDemoDesign } from "@/db/seeds/demo-design";
import {
  DEFAULT_PARAMS,
  DEFAULT_SWEEP,
  readSweep,
  runSweepJob,
  planSweep,
  steepestPassingRatio,
  type StoredSweep,
  type SweepPoint,
} from "@/lib/design";
import { ENGINE_VERSION } from "@/lib/stability";

let designer: AppClient;
let reviewer: AppClient;
let projectId: number;
let base: string;

beforeAll(async () => {
  designer = await signedIn("designer@scarpline.test");
  reviewer = await signedIn("reviewer@scarpline.test");
  const { projects } = await (await designer.request("/api/projects")).json();
  projectId = (projects as { id: number; name: string }[]).find((p) => p.name === DEMO_PROJECT)!.id;
  base = `/api/projects/${projectId}/design`;
});

async function createStudy(name: string): Promise<number> {
  const res = await designer.request(base, { method: "POST", json: { name } });
  expect(res.status).toBe(201);
  return (await res.json()).study.id;
}

/** Queues a server sweep and polls its job until it ends (tests/support/jobs.ts). */
async function sweepOnServer(studyId: number, settings = DEFAULT_SWEEP) {
  const res = await designer.request(`${base}/${studyId}/sweep`, { method: "POST", json: { settings } });
  const body = await res.json();
  expect(res.status, JSON.stringify(body)).toBe(202);
  const { job } = body;
  const polled = await pollJob(designer, projectId, job.id);
  expect(polled.job.state).toBe("done");
  return { ...polled, sweep: polled.job.result as StoredSweep };
}

describe("design studies", () => {
  test("POST starts a study with the demo embankment and the project's materials; GET returns it", async () => {
    const id = await createStudy("Integration study");
    const { study } = await (await designer.request(`${base}/${id}`)).json();
    expect(study.parameters).toEqual(DEFAULT_PARAMS);
    expect(study.sweep).toBeNull();
    const { studies } = await (await designer.request(base)).json();
    expect(studies.map((s: { id: number }) => s.id)).toContain(id);
  });

  test("bad parameters are a 400 naming the field; a reviewer may look but not change or sweep", async () => {
    const id = await createStudy("Validation study");
    const bad = await designer.request(`${base}/${id}`, {
      method: "PATCH",
      json: { parameters: { ...DEFAULT_PARAMS, floodPool: 25 } },
    });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields["parameters.floodPool"][0]).toMatch(/above the crest/);
    const missing = await designer.request(`${base}/${id}`, {
      method: "PATCH",
      json: { parameters: { ...DEFAULT_PARAMS, drainMaterial: "nowhere" } },
    });
    expect(missing.status).toBe(400);
    expect((await missing.json()).error.fields["parameters.drainMaterial"][0]).toMatch(
      /'nowhere' is not in the project's materials library/,
    );

    expect((await reviewer.request(`${base}/${id}`)).status).toBe(200);
    expect(
      (await reviewer.request(`${base}/${id}`, { method: "PATCH", json: { parameters: DEFAULT_PARAMS } })).status,
    ).toBe(403);
    expect(
      (await reviewer.request(`${base}/${id}/sweep`, { method: "POST", json: { settings: DEFAULT_SWEEP } })).status,
    ).toBe(403);
  });

  test("a server sweep runs as a queue job on a worker, reports progress and keeps the result", async () => {
    const id = await createStudy("Server sweep study");
    const { sweep, seen, job: queued } = await sweepOnServer(id);
    // Progress counts the sweep's jobs: 27 planned plus the recheck of the recommended pair under 3 cases.
    expect(seen.some((p) => p.state === "running" && p.done > 0 && p.done < 30)).toBe(true);
    expect(queued).toMatchObject({ done: 30, total: 30, attempts: 1 });
    expect(sweep.ranOn).toBe("server");
    expect(sweep.points.filter((p) => p.phase === "sweep")).toHaveLength(27);

    // The same job run in this process with the engine gives the same FS (deterministic engine).
    const job = planSweep(DEFAULT_PARAMS, DEFAULT_SWEEP).find(
      (j) => j.caseKey === "steady-seepage" && j.downstreamRatio === 2.5,
    )!;
    const local = runSweepJob(DEFAULT_PARAMS, DEMO_MATERIALS, job, DEFAULT_SWEEP);
    expect(sweep.points.find((p) => p.id === job.id)!.fsBishop).toBeCloseTo(local.fsBishop!, 9);

    const { study } = await (await designer.request(`${base}/${id}`)).json();
    expect(study.sweep.points).toHaveLength(sweep.points.length);
  }, 60_000);

  test("PUT results keeps the server's own run of a browser sweep: a doctored or missing FS is replaced", async () => {
    const id = await createStudy("Browser sweep study");
    const settings = { ...DEFAULT_SWEEP, from: 2.5, to: 3.5, step: 0.5 };
    const points: SweepPoint[] = planSweep(DEFAULT_PARAMS, settings).map((job) =>
      runSweepJob(DEFAULT_PARAMS, DEMO_MATERIALS, job, settings),
    );
    const sweep: StoredSweep = {
      settings,
      points,
      ranOn: "browser",
      elapsedMs: 1,
      workers: 1,
      engineVersion: ENGINE_VERSION,
      finishedAt: new Date().toISOString(),
    };
    // What the server computes for the same jobs (the recheck of the recommended pair included).
    const honest = await designer.request(`${base}/${id}/results`, { method: "PUT", json: sweep });
    expect(honest.status).toBe(200);
    const kept = await honest.json();
    const serverPoints = kept.sweep.points as SweepPoint[];
    for (const p of points) expect(serverPoints.find((q) => q.id === p.id)!.fsBishop).toBe(p.fsBishop);

    // The attack: one FS raised by 0.2, another point sent without its FS.
    const doctored = structuredClone(sweep);
    doctored.points[0].fsBishop = doctored.points[0].fsBishop! + 0.2;
    doctored.points[1] = { ...doctored.points[1], fsBishop: null, fsOrdinary: null, circle: null, error: "none" };
    const res = await designer.request(`${base}/${id}/results`, { method: "PUT", json: doctored });
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.preview.status).toBe("differed");
    const fields = body.preview.differences.map((d: { field: string }) => d.field);
    expect(fields).toContain(`points.${points[0].id}.fsBishop`);
    expect(fields).toContain(`points.${points[1].id}.fsBishop`);
    const { study } = await (await designer.request(`${base}/${id}`)).json();
    const storedPoint = (i: number) => study.sweep.points.find((p: SweepPoint) => p.id === points[i].id);
    expect(storedPoint(0).fsBishop).toBe(points[0].fsBishop);
    expect(storedPoint(1).fsBishop).toBe(points[1].fsBishop);
    expect(study.sweep.points).toHaveLength(serverPoints.length);

    // Changing the parameters clears the sweep, which described the old embankment.
    const patched = await designer.request(`${base}/${id}`, {
      method: "PATCH",
      json: { parameters: { ...DEFAULT_PARAMS, crestWidth: 7 } },
    });
    expect(patched.status).toBe(200);
    expect((await patched.json()).study.sweep).toBeNull();
  });

  test("open as a run: a section at the point's ratios with the generated document, and a run re-checked by the server", async () => {
    const id = await createStudy("Open study");
    const { sweep } = await sweepOnServer(id, { ...DEFAULT_SWEEP, from: 3, to: 4, step: 0.5 });
    const reading = readSweep(sweep.points, {
      "steady-seepage": 1.5,
      "drawdown-storage": 1.3,
      "drawdown-surcharge": 1.1,
    });
    const downstream = reading.cases.find((c) => c.caseKey === "steady-seepage")!;
    expect(downstream.steepest).toBe(
      steepestPassingRatio(
        downstream.points.map((p) => ({ ratio: p.ratio, fs: p.fsBishop })),
        1.5,
      ),
    );
    const point = downstream.points[0];

    const res = await designer.request(`${base}/${id}/open`, {
      method: "POST",
      json: { pointId: point.id, target: "run" },
    });
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.location).toBe(`/projects/${projectId}/runs/${body.run.id}`);
    const run = (await (await designer.request(`/api/projects/${projectId}/runs`)).json()).runs.find(
      (r: { id: number }) => r.id === body.run.id,
    );
    expect(run).toMatchObject({ face: "downstream", loadingCondition: "steady-seepage", requiredFs: 1.5 });
    expect(run.fsBishop).toBeCloseTo(point.fsBishop!, 3); // the run list keeps FS to four decimals
    // The kept point was the server's own, so its search of the opened section matches it.
    expect(body.preview).toEqual({ status: "matched", source: "sweep", differences: [], more: 0 });
    expect(run.sectionName).toContain("downstream 3.00:1");

    const editor = await designer.request(`${base}/${id}/open`, {
      method: "POST",
      json: { pointId: point.id, target: "editor" },
    });
    expect(editor.status).toBe(201);
    const { section } = await editor.json();
    const stored = await getDb()("sections").where({ id: section.id }).first();
    expect(stored.name).toMatch(/\(2\)$/); // the first open took the plain name
    // Opening the same point in the editor again opens that section instead of making a third.
    const again = await designer.request(`${base}/${id}/open`, {
      method: "POST",
      json: { pointId: point.id, target: "editor" },
    });
    expect(again.status).toBe(200);
    expect((await again.json()).section).toEqual({ id: section.id, reused: true });
    expect((await getDb()("sections").where("name", "like", `${stored.name.slice(0, -4)}%`)).length).toBe(2);

    const unknown = await designer.request(`${base}/${id}/open`, {
      method: "POST",
      json: { pointId: "sweep:nothing", target: "run" },
    });
    expect(unknown.status).toBe(404);
  }, 60_000);

  test("seedDemoDesign stores one study with the demo dimensions and the library's keys", async () => {
    const db = getDb();
    const userId = (await db("users").where({ email: "designer@scarpline.test" }).first()).id;
    const id = await seedDemoDesign(db, projectId, userId);
    const { study } = await (await designer.request(`${base}/${id}`)).json();
    expect(study.parameters).toEqual(DEFAULT_PARAMS);
  });
});
