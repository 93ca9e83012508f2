/**
 * Probabilistic runs of a kept run on the job queue (issue 17): real MariaDB, real Redis, the
 * bundled queue workers and the built app over HTTP. Checked against things outside the app:
 * - the engine is deterministic for a seed (docs/probabilistic.md), so the worker's stored figures
 *   must equal, to the bit, what runProbabilistic gives in this process on the same document;
 * - pf = share of samples with FS < 1 and β = (μ − 1)/σ (definitions: Duncan 2000);
 * - queue behaviour is BullMQ's documented one (common practice for job queues): progress while
 *   running, a cancelled job keeps nothing, a finished one writes its result once.
 * Bad input is refused at the edge with the field named, and nothing is queued.
 */
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { AppClient } from "../support/http";
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
import { QUEUE_DOWN_NOTICE } from "@/lib/jobs/view";
import { openTestDb, type TestDb } from "../support/direct-db";
import { signedIn } from "../support/http";
import { pollJob } from "../support/jobs";
import { demoProject } from "../support/demo";
import { quickSetup } from "../support/runs";
import { documentForRun } from "@/lib/analysis/run-setup";
import { runProbabilistic, MAX_SAMPLES } from "@/lib/stability";
import { probabilisticDocument, type ProbabilisticRequest } from "@/lib/probabilistic/request";
import type { JobView } from "@/lib/jobs/types";
import type { ProbabilisticPanelData } from "@/lib/probabilistic/types";
import { pdfText } from "../support/pdf-text";

let engineer: AppClient;
let db: TestDb;
let projectId: number;
let runId: number;
let runDocument: unknown;
const spare: TestWorker[] = [];

beforeAll(async () => {
  engineer = await signedIn("engineer@scarpline.test");
  db = openTestDb(inject("dbName"));
  const demo = await demoProject(engineer);
  projectId = demo.projectId;
  const setup = quickSetup(demo.document, "downstream");
  const res = await engineer.request(`/api/projects/${projectId}/runs`, {
    method: "POST",
    json: { sectionId: demo.sectionId, sectionVersion: demo.version, title: "Downstream, probabilistic", setup },
  });
  expect(res.status).toBe(201);
  runId = (await res.json()).run.id;
  runDocument = documentForRun(demo.document, setup);
});
afterAll(async () => {
  await Promise.all(spare.map((w) => stopProcess(w.process)));
  await db?.destroy();
});

const url = () => `/api/projects/${projectId}/runs/${runId}/probabilistic`;
const panel = async () => (await (await engineer.request(url())).json()) as ProbabilisticPanelData;
const jobRows = async () =>
  (
    await db("jobs")
      .where({ subject: `run-probabilistic:${runId}` })
      .count({ n: "*" })
  )[0].n;

function requestFrom(p: ProbabilisticPanelData, over: Partial<ProbabilisticRequest> = {}): ProbabilisticRequest {
  return {
    samples: 20_000,
    seed: 11,
    sampling: "latin-hypercube",
    mode: "critical-surface",
    materials: Object.fromEntries(p.defaults.filter((d) => d.keys.length > 0).map((d) => [d.materialId, d.vary])),
    ...over,
  };
}

describe("probabilistic runs of a kept run", () => {
  test("defaults come from the lab set that backs the fill's c′ and φ′, typical COVs elsewhere", async () => {
    const p = await panel();
    const fill = p.defaults.find((d) => d.materialId === "fill")!;
    expect(fill.keys).toEqual(["c", "phi", "gamma"]);
    expect(fill.basis.phi).toMatch(/^sd of the fitted φ′ from lab set '.+' \(\d+ tests\)$/);
    expect(fill.vary.phi!.sd).toBeGreaterThan(0);
    expect(fill.basis.gamma).toContain("Duncan (2000)");
    expect(p.target.beta).toBe(3);
    expect(p.stored).toBeNull();
  });

  test("bad input is refused with the field named and nothing is queued", async () => {
    const p = await panel();
    const before = await jobRows();
    const tooMany = await engineer.request(url(), {
      method: "POST",
      json: requestFrom(p, { mode: "full-search", samples: MAX_SAMPLES["full-search"] + 1 }),
    });
    expect(tooMany.status).toBe(400);
    const tooManyBody = await tooMany.json();
    expect(tooManyBody.error.fields.samples[0]).toContain("2,001 samples is more than the 2,000");

    const wide = requestFrom(p);
    wide.materials.fill = { ...wide.materials.fill, phi: { dist: "normal", sd: 30 } };
    const negative = await engineer.request(url(), { method: "POST", json: wide });
    expect(negative.status).toBe(400);
    const body = await negative.json();
    expect(body.error.fields["materials.fill.phi"][0]).toMatch(/'fill' φ′ \(°\) would fall outside 0 … 60/);
    expect(await jobRows()).toBe(before);
  });

  test("a long run shows progress and can be cancelled, keeping nothing", async () => {
    const p = await panel();
    const res = await engineer.request(url(), {
      method: "POST",
      json: requestFrom(p, { mode: "full-search", samples: 2_000 }),
    });
    expect(res.status).toBe(202);
    const { job } = (await res.json()) as { job: JobView };
    expect(job.kind).toBe("probabilistic");
    const moving = await pollJob(engineer, projectId, job.id, {
      timeoutMs: 60_000,
      until: (j) => j.state === "running" && j.done >= 5,
    });
    expect(moving.job.total).toBe(2_000);
    expect((await engineer.request(`/api/projects/${projectId}/jobs/${job.id}`, { method: "DELETE" })).status).toBe(
      200,
    );
    const ended = await pollJob(engineer, projectId, job.id, { timeoutMs: 30_000 });
    expect(ended.job.state).toBe("cancelled");
    expect(await db("probabilistic_results").where({ job_id: job.id }).first()).toBeUndefined();
  }, 90_000);

  test("a worker killed mid-run (SIGKILL): the job is retried on another from its frozen input and lands once", async () => {
    const p = await panel();
    const res = await engineer.request(url(), {
      method: "POST",
      json: requestFrom(p, { mode: "full-search", samples: 1_000, seed: 23 }),
    });
    const { job } = (await res.json()) as { job: JobView };
    await pollJob(engineer, projectId, job.id, {
      timeoutMs: 60_000,
      until: (j) => j.state === "running" && j.done >= 5,
    });
    const row = await db("jobs").where({ id: job.id }).first();
    const pid = Number(String(row.worker).split(":").at(-1));
    // Only a worker this test run started is killed; a replacement starts as a supervisor would start one.
    expect(inject("workerPids")).toContain(pid);
    process.kill(pid, "SIGKILL");
    spare.push(await startWorkerProcess(inject("appEnv")));
    expect(await db("probabilistic_results").where({ job_id: job.id })).toHaveLength(0);
    const ended = await pollJob(engineer, projectId, job.id, { timeoutMs: 120_000 });
    expect(ended.job.state).toBe("done");
    expect(ended.job.attempts).toBe(2);
    const rows = await db("probabilistic_results").where({ job_id: job.id });
    expect(rows).toHaveLength(1);
    expect(JSON.parse(rows[0].result).run.samplesDone).toBe(1_000);
  }, 180_000);

  test("a finished run is stored once, equal to the engine's own figures for the same seed, and reported", async () => {
    const p = await panel();
    const request = requestFrom(p);
    const res = await engineer.request(url(), { method: "POST", json: request });
    expect(res.status).toBe(202);
    const { job } = (await res.json()) as { job: JobView };
    const ended = await pollJob(engineer, projectId, job.id, { timeoutMs: 90_000 });
    expect(ended.job.state).toBe("done");
    const kept = ended.job.result as { resultId: number; runId: number };
    expect(kept.runId).toBe(runId);
    const rows = await db("probabilistic_results").where({ job_id: job.id });
    expect(rows).toHaveLength(1);
    expect(JSON.parse(rows[0].settings)).toEqual(request);

    const here = runProbabilistic(probabilisticDocument(runDocument, request));
    if (!here.ok) throw new Error(JSON.stringify(here.errors));
    const stored = (await panel()).stored!;
    expect(stored.id).toBe(kept.resultId);
    const s = stored.outcome.probabilistic.bishop!;
    const e = here.probabilistic.bishop!;
    expect(s.meanFs).toBe(e.meanFs);
    expect(s.pf).toBe(e.pf);
    expect(s.betaNormal).toBe(e.betaNormal);
    expect(s.betaLognormal).toBe(e.betaLognormal);
    expect(s.betaNormal).toBeCloseTo((s.meanFs! - 1) / s.sdFs!, 12);
    expect(stored.outcome.run.samplesDone).toBe(20_000);

    const pdf = await engineer.request(`/api/projects/${projectId}/runs/${runId}/report`);
    expect(pdf.status).toBe(200);
    const text = await pdfText(new Uint8Array(await pdf.arrayBuffer()));
    expect(text).toContain("Probabilistic analysis");
    expect(text).toContain("20,000 samples, Latin hypercube sampling, seed 11");
    expect(text).toContain(`Bishop, sampled ${s.meanFs!.toFixed(3)} ${s.sdFs!.toFixed(3)}`);
  }, 120_000);

  test("the project's β target is set with a reason, by a reviewer only", async () => {
    const reviewer = await signedIn("reviewer@scarpline.test");
    const target = `/api/projects/${projectId}/reliability-target`;
    const refused = await engineer.request(target, { method: "PUT", json: { beta: 2.5, reason: "Lower consequence" } });
    expect(refused.status).toBe(403);
    const bad = await reviewer.request(target, { method: "PUT", json: { beta: 9, reason: "x" } });
    expect(bad.status).toBe(400);
    const ok = await reviewer.request(target, {
      method: "PUT",
      json: { beta: 2.5, reason: "Low-consequence embankment, agreed with the owner" },
    });
    expect(ok.status).toBe(200);
    expect((await panel()).target).toMatchObject({
      beta: 2.5,
      reason: "Low-consequence embankment, agreed with the owner",
    });
    await reviewer.request(target, { method: "PUT", json: { beta: 3, reason: "Back to the default level" } });
    expect((await panel()).target.reason).toBeNull();
  });
});

describe("a probabilistic run while the queue is down (a web app of its own, with its own Redis)", () => {
  const dbName = `scarpline_test_p${process.pid}_${randomBytes(3).toString("hex")}`;
  let redis: TestRedis;
  let worker: TestWorker;
  let app: ChildProcess;
  let own: TestDb;
  let client: AppClient;

  beforeAll(async () => {
    await createDatabase(dbName);
    own = openTestDb(dbName);
    redis = await startRedis(await freePort());
    const port = await freePort();
    const appUrl = `http://127.0.0.1:${port}`;
    const env = {
      ...inject("appEnv"),
      DATABASE_NAME: dbName,
      REDIS_PORT: String(redis.port),
      NEXTAUTH_URL: appUrl,
      APP_URL: appUrl,
    };
    worker = await startWorkerProcess(env);
    app = await startAppServer(env, port);
    client = new AppClient(appUrl);
    expect((await client.signIn("engineer@scarpline.test", "scarpline-demo")).ok).toBe(true);
  }, 120_000);

  afterAll(async () => {
    if (app) await stopProcess(app);
    if (worker) await stopProcess(worker.process);
    if (redis) await stopRedis(redis);
    await own?.destroy();
    await dropDatabase(dbName);
  }, 180_000);

  test("the page is told so, the job is kept, and it runs when the queue returns", async () => {
    const demo = await demoProject(client);
    const kept = await client.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: {
        sectionId: demo.sectionId,
        sectionVersion: demo.version,
        title: "Queue down",
        setup: quickSetup(demo.document, "downstream"),
      },
    });
    expect(kept.status).toBe(201);
    const id = (await kept.json()).run.id as number;
    const path = `/api/projects/${demo.projectId}/runs/${id}/probabilistic`;
    const p = (await (await client.request(path)).json()) as ProbabilisticPanelData;

    await stopRedis(redis, true);
    const request = requestFrom(p, { samples: 2_000 });
    const res = await client.request(path, { method: "POST", json: request });
    expect(res.status).toBe(202);
    const { job } = (await res.json()) as { job: JobView };
    expect(job).toMatchObject({ state: "queued", queue: "down", notice: QUEUE_DOWN_NOTICE });
    const row = await own("jobs").where({ id: job.id }).first();
    expect(row.enqueued_at).toBeNull();
    expect(JSON.parse(row.input).request).toEqual(request);
    const seen = (await (await client.request(path)).json()) as ProbabilisticPanelData;
    expect(seen.job).toMatchObject({ id: job.id, queue: "down", notice: QUEUE_DOWN_NOTICE });

    redis = await startRedis(redis.port, redis.folder);
    const ended = await pollJob(client, demo.projectId, job.id, { timeoutMs: 90_000 });
    expect(ended.job).toMatchObject({ state: "done", queue: "up", notice: null });
    expect(await own("probabilistic_results").where({ job_id: job.id })).toHaveLength(1);
  }, 180_000);
});
