/**
 * The job queue end to end (issue 17 items 2 and 6): real Redis, real MariaDB, the bundled queue
 * workers and the built app over HTTP. What is checked is the queue's promise, common practice
 * for job queues (BullMQ's documented stalled-job handling): a job's result lands once, on a
 * worker; a cancelled job keeps nothing; a worker killed mid-job leaves nothing half-written and
 * the job is retried; the web app can restart while a job runs; a queue that is down is said so
 * and its jobs start when it returns.
 */
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { openTestDb, type TestDb } from "../support/direct-db";
import { AppClient, signedIn } from "../support/http";
import { pollJob } from "../support/jobs";
import { createDatabase, dropDatabase, startAppServer } from "../support/stack";
import {
  freePort,
  startRedis,
  startWorkerProcess,
  stopProcess,
  stopRedis,
  type TestRedis,
  type TestWorker,
} from "../../scripts/lib/queue-processes";
import { DEMO_PROJECT } from "@/db/seeds/demo";
import { DEFAULT_SWEEP, type StoredSweep } from "@/lib/design";
import type { JobView } from "@/lib/jobs/types";
import { MAX_ACTIVE_PER_PROJECT } from "@/lib/jobs/start-job";
import { QUEUE_DOWN_NOTICE } from "@/lib/jobs/view";
import { QUEUE_SEARCH_CIRCLES } from "@/lib/runs/record/limits";
import { searchRecord } from "@/lib/runs/record/search-record";
import { documentForRun } from "@/lib/analysis/run-setup";
import { demoProject } from "../support/demo";
import { quickSetup } from "../support/runs";

/** 2:1 to 6:1 in steps of 0.125: 33 ratios × 3 cases + 3 rechecks = 102 jobs, several seconds on one worker. */
const LONG_SWEEP = { ...DEFAULT_SWEEP, from: 2, to: 6, step: 0.125 };
const LONG_SWEEP_PLANNED = 99;
const LONG_SWEEP_JOBS = LONG_SWEEP_PLANNED + 3;

/** Every planned point kept once; the recheck's 3 points come only when the sweep recommends a pair. */
function expectWholeSweep(points: StoredSweep["points"]): void {
  expect(points.filter((p) => p.phase === "sweep")).toHaveLength(LONG_SWEEP_PLANNED);
  expect([0, 3]).toContain(points.filter((p) => p.phase === "recheck").length);
}

async function demoProjectId(client: AppClient): Promise<number> {
  const { projects } = await (await client.request("/api/projects")).json();
  return (projects as { id: number; name: string }[]).find((p) => p.name === DEMO_PROJECT)!.id;
}

async function startSweep(client: AppClient, projectId: number, name: string, settings = LONG_SWEEP) {
  const base = `/api/projects/${projectId}/design`;
  const created = await client.request(base, { method: "POST", json: { name } });
  expect(created.status).toBe(201);
  const studyId = (await created.json()).study.id as number;
  const res = await client.request(`${base}/${studyId}/sweep`, { method: "POST", json: { settings } });
  return { studyId, res, base };
}

const running = (min: number) => (j: JobView) => j.state === "running" && j.done >= min;

describe("queue jobs on the test stack's workers", () => {
  let designer: AppClient;
  let projectId: number;
  const spare: TestWorker[] = [];

  beforeAll(async () => {
    designer = await signedIn("designer@scarpline.test");
    projectId = await demoProjectId(designer);
  });
  afterAll(async () => {
    await Promise.all(spare.map((w) => stopProcess(w.process)));
  });

  test("cancelling a running sweep stops it and keeps nothing", async () => {
    const { res, studyId, base } = await startSweep(designer, projectId, "Cancelled sweep");
    expect(res.status).toBe(202);
    const { job } = await res.json();
    await pollJob(designer, projectId, job.id, { until: running(2) });
    const cancel = await designer.request(`/api/projects/${projectId}/jobs/${job.id}`, { method: "DELETE" });
    expect(cancel.status).toBe(200);
    const ended = await pollJob(designer, projectId, job.id);
    expect(ended.job.state).toBe("cancelled");
    expect(ended.job.done).toBeLessThan(LONG_SWEEP_JOBS);
    expect(ended.job.result).toBeNull();
    const { study } = await (await designer.request(`${base}/${studyId}`)).json();
    expect(study.sweep).toBeNull();
  }, 90_000);

  test("a reviewer may watch a job but not cancel it", async () => {
    const { res } = await startSweep(designer, projectId, "Watched sweep", DEFAULT_SWEEP);
    const { job } = await res.json();
    const reviewer = await signedIn("reviewer@scarpline.test");
    expect((await reviewer.request(`/api/projects/${projectId}/jobs/${job.id}`)).status).toBe(200);
    const refused = await reviewer.request(`/api/projects/${projectId}/jobs/${job.id}`, { method: "DELETE" });
    expect(refused.status).toBe(403);
    expect((await pollJob(designer, projectId, job.id)).job.state).toBe("done");
  }, 90_000);

  test("a kept run past the queue threshold is searched on a worker and kept once; a small one stays in the request", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const base = quickSetup(demo.document, "downstream");
    // 60 × 60 centres × 16 radii = 57,600 circles, past the 50,000 that go to the queue.
    const setup = { ...base, grid: { ...base.grid, nx: 60, ny: 60 }, radii: { ...base.radii, n: 16 } };
    expect(setup.grid.nx * setup.grid.ny * setup.radii.n).toBeGreaterThan(QUEUE_SEARCH_CIRCLES);
    const body = { sectionId: demo.sectionId, sectionVersion: demo.version, title: "Large search" };
    const res = await engineer.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: { ...body, setup },
    });
    expect(res.status).toBe(202);
    const { job } = (await res.json()) as { job: JobView };
    expect(job.kind).toBe("run-search");
    const ended = await pollJob(engineer, demo.projectId, job.id, { timeoutMs: 120_000 });
    expect(ended.job.state).toBe("done");
    const { runId } = ended.job.result as { runId: number };
    const { run } = await (await engineer.request(`/api/projects/${demo.projectId}/runs/${runId}`)).json();
    // The engine is deterministic: the worker's kept minimum is the one this process finds.
    const here = searchRecord(documentForRun(demo.document, setup));
    if (!here.ok) throw new Error("search failed here");
    expect(run.result.results.bishop.fs).toBeCloseTo(here.result.results.bishop!.fs, 9);
    expect(run.result.circles.tried).toBe(here.result.circles.tried);

    const small = await engineer.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: { ...body, title: "Small search", setup: base },
    });
    expect(small.status).toBe(201);
  }, 150_000);

  test("a worker killed mid-job (SIGKILL): nothing half-written, the job is retried on another and lands once", async () => {
    const { res, studyId, base } = await startSweep(designer, projectId, "Killed worker sweep");
    const { job } = await res.json();
    const { job: mid } = await pollJob(designer, projectId, job.id, { until: running(3) });
    const db = openTestDb(inject("dbName"));
    try {
      const row = await db("jobs").where({ id: job.id }).first();
      const pid = Number(String(row.worker).split(":").at(-1));
      // Only a worker this test run started is killed.
      expect(inject("workerPids")).toContain(pid);
      process.kill(pid, "SIGKILL");
      // A replacement, as a supervisor would start; the surviving stack worker may take the job first.
      spare.push(await startWorkerProcess(inject("appEnv")));

      const { study: meanwhile } = await (await designer.request(`${base}/${studyId}`)).json();
      expect(meanwhile.sweep).toBeNull();
      const ended = await pollJob(designer, projectId, job.id, { timeoutMs: 90_000 });
      expect(ended.job.state).toBe("done");
      expect(ended.job.attempts).toBe(2);
      expect(ended.seen.some((j) => j.notice !== null || j.attempts === 2)).toBe(true);
      const sweep = ended.job.result as StoredSweep;
      expectWholeSweep(sweep.points);
      const after = await db("jobs").where({ id: job.id }).first();
      expect(after.worker).not.toBe(row.worker);
      expect(mid.done).toBeGreaterThanOrEqual(3);
      const { study } = await (await designer.request(`${base}/${studyId}`)).json();
      expectWholeSweep(study.sweep.points);
      expect(study.sweep).toEqual(sweep);
    } finally {
      await db.destroy();
    }
  }, 150_000);
});

describe("a web app of its own, with its own Redis, worker and database", () => {
  const dbName = `scarpline_test_q${process.pid}_${randomBytes(3).toString("hex")}`;
  let redis: TestRedis;
  let worker: TestWorker;
  let app: ChildProcess;
  let port: number;
  let env: Record<string, string>;
  let db: TestDb;
  let client: AppClient;
  let projectId: number;

  beforeAll(async () => {
    await createDatabase(dbName);
    db = openTestDb(dbName);
    redis = await startRedis(await freePort());
    port = await freePort();
    const url = `http://127.0.0.1:${port}`;
    env = {
      ...inject("appEnv"),
      DATABASE_NAME: dbName,
      REDIS_PORT: String(redis.port),
      NEXTAUTH_URL: url,
      APP_URL: url,
    };
    worker = await startWorkerProcess(env);
    app = await startAppServer(env, port);
    client = new AppClient(url);
    expect((await client.signIn("designer@scarpline.test", "scarpline-demo")).ok).toBe(true);
    projectId = await demoProjectId(client);
  }, 120_000);

  afterAll(async () => {
    if (app) await stopProcess(app);
    if (worker) await stopProcess(worker.process);
    if (redis) await stopRedis(redis);
    await db?.destroy();
    await dropDatabase(dbName);
  });

  test("the web app restarts mid-job: the job keeps running on its worker and the page finds it again", async () => {
    const { res, studyId, base } = await startSweep(client, projectId, "Restart sweep");
    const { job } = await res.json();
    await pollJob(client, projectId, job.id, { until: running(2) });
    await stopProcess(app);
    const before = (await db("jobs").where({ id: job.id }).first()).progress_done;
    // The worker goes on while no web app runs.
    const deadline = Date.now() + 30_000;
    while ((await db("jobs").where({ id: job.id }).first()).progress_done === before && Date.now() < deadline)
      await new Promise((r) => setTimeout(r, 200));
    expect((await db("jobs").where({ id: job.id }).first()).progress_done).toBeGreaterThan(before);
    app = await startAppServer(env, port);
    // A reloaded page asks for the study's latest sweep job, then polls it.
    const latest = await (await client.request(`${base}/${studyId}/sweep`)).json();
    expect(latest.job.id).toBe(job.id);
    const ended = await pollJob(client, projectId, job.id, { timeoutMs: 90_000 });
    expect(ended.job).toMatchObject({ state: "done", attempts: 1, done: LONG_SWEEP_JOBS });
    const { study } = await (await client.request(`${base}/${studyId}`)).json();
    expectWholeSweep(study.sweep.points);
  }, 180_000);

  test("the queue is down: the page says so, too many waiting jobs are refused, and the job starts when it returns", async () => {
    await stopRedis(redis, true);
    const { res, studyId, base } = await startSweep(client, projectId, "Queue down sweep", DEFAULT_SWEEP);
    expect(res.status).toBe(202);
    const { job } = (await res.json()) as { job: JobView };
    expect(job).toMatchObject({ state: "queued", queue: "down", notice: QUEUE_DOWN_NOTICE });
    const row = await db("jobs").where({ id: job.id }).first();
    expect(row.enqueued_at).toBeNull();
    expect(JSON.parse(row.input).settings).toEqual(DEFAULT_SWEEP);
    const polled = await (await client.request(`/api/projects/${projectId}/jobs/${job.id}`)).json();
    expect(polled.job).toMatchObject({ state: "queued", queue: "down", notice: QUEUE_DOWN_NOTICE });

    // Bound: a project with MAX_ACTIVE_PER_PROJECT jobs waiting gets a clear 429, and no row is added.
    const filler = Array.from({ length: MAX_ACTIVE_PER_PROJECT - 1 }, () => ({
      project_id: projectId,
      kind: "design-sweep",
      subject: "filler",
      state: "queued",
      input: row.input,
      created_by: row.created_by,
    }));
    await db("jobs").insert(filler);
    const refused = await startSweep(client, projectId, "One too many", DEFAULT_SWEEP);
    expect(refused.res.status).toBe(429);
    expect((await refused.res.json()).error.message).toContain(`${MAX_ACTIVE_PER_PROJECT} jobs waiting or running`);
    await db("jobs").where({ subject: "filler" }).delete();

    // Redis returns with its data folder; the worker enqueues the kept row and runs it.
    redis = await startRedis(redis.port, redis.folder);
    const ended = await pollJob(client, projectId, job.id, { timeoutMs: 90_000 });
    expect(ended.job).toMatchObject({ state: "done", queue: "up", notice: null });
    const { study } = await (await client.request(`${base}/${studyId}`)).json();
    expect(study.sweep.points.length).toBe(30);
  }, 180_000);
});
