/**
 * `npm run bench:queue`: throughput of the job queue on this machine. 200 small design sweeps
 * (one ratio per case and the recheck: 6 searches each) go through 1, 2 and 4 queue workers, on
 * a Redis and a database of the benchmark's own; it prints jobs per minute for each. The time runs
 * from the first job handed to the queue until the last job's row says done.
 * BENCH_JOBS and BENCH_WORKERS (e.g. "1,2,4") change the counts.
 */
import { randomBytes } from "node:crypto";
import os from "node:os";
import knex from "knex";
import { knexConfig } from "../db/config";
import { getDb } from "../db/index";
import { seedDemo, DEMO_PROJECT } from "../db/seeds/demo";
import { createJob } from "../db/queries/jobs";
import { createDesignStudy } from "../db/queries/design-studies";
import { fetchDesignContext } from "../lib/design/design-context";
import { DEFAULT_PARAMS, DEFAULT_SWEEP } from "../lib/design";
import { designStudySubject, designSweepKind, type DesignSweepInput } from "../lib/jobs/design-sweep-job";
import { enqueueRow } from "../lib/jobs/reconcile";
import { jobQueue } from "../lib/jobs/queue";
import { freePort, startRedis, startWorkerProcess, stopProcess, stopRedis } from "./lib/queue-processes";

const JOBS = Number(process.env.BENCH_JOBS ?? 200);
const WORKERS = (process.env.BENCH_WORKERS ?? "1,2,4").split(",").map(Number);

async function main(): Promise<void> {
  const dbName = `scarpline_bench_${process.pid}_${randomBytes(3).toString("hex")}`;
  const admin = knex({ ...knexConfig(), connection: { ...(knexConfig().connection as object), database: undefined } });
  await admin.raw(`CREATE DATABASE \`${dbName}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  process.env.DATABASE_NAME = dbName;
  const db = knex(knexConfig(dbName));
  const redis = await startRedis(await freePort());
  process.env.REDIS_PORT = String(redis.port);
  try {
    await db.migrate.latest();
    await seedDemo(db);
    const project = await db("projects").where({ name: DEMO_PROJECT }).first();
    const user = await db("users").first();
    const studyId = await createDesignStudy(
      { projectId: project.id, name: "Queue benchmark", parameters: DEFAULT_PARAMS, userId: user.id },
      db,
    );
    const context = await fetchDesignContext(project.id);
    const input: DesignSweepInput = {
      studyId,
      params: DEFAULT_PARAMS,
      materials: context.materials,
      settings: { ...DEFAULT_SWEEP, from: 3, to: 3 },
      required: context.required,
    };
    const units = designSweepKind.units(designSweepKind.input.parse(input));
    console.log(`bench:queue: ${JOBS} design sweeps of ${units} searches each, ${os.availableParallelism()} cores`);
    const env = { DATABASE_NAME: dbName, REDIS_PORT: String(redis.port) };
    const rows: string[] = [];
    for (const n of WORKERS) {
      const workers = await Promise.all(Array.from({ length: n }, () => startWorkerProcess(env)));
      try {
        const ids: number[] = [];
        for (let i = 0; i < JOBS; i++)
          ids.push(
            await createJob(
              {
                projectId: project.id,
                kind: designSweepKind.kind,
                subject: designStudySubject(studyId),
                input,
                userId: user.id,
              },
              db,
            ),
          );
        const t0 = performance.now();
        for (const id of ids) if (!(await enqueueRow(id))) throw new Error("the benchmark's Redis did not answer");
        for (;;) {
          const [{ n: left }] = await db("jobs").whereIn("id", ids).whereNot("state", "done").count({ n: "*" });
          if (Number(left) === 0) break;
          const [{ n: failed }] = await db("jobs")
            .whereIn("id", ids)
            .whereIn("state", ["failed", "cancelled"])
            .count({ n: "*" });
          if (Number(failed) > 0) throw new Error(`${failed} jobs failed; see the workers' output`);
          await new Promise((r) => setTimeout(r, 100));
        }
        const minutes = (performance.now() - t0) / 60_000;
        const line = `${String(n).padStart(2)} worker${n > 1 ? "s" : " "}: ${JOBS} jobs in ${(minutes * 60).toFixed(1)} s = ${(JOBS / minutes).toFixed(0)} jobs/min`;
        console.log(line);
        rows.push(line);
      } finally {
        await Promise.all(workers.map((w) => stopProcess(w.process)));
      }
    }
  } finally {
    await jobQueue().close();
    await stopRedis(redis);
    await db.destroy();
    await getDb().destroy();
    await admin.raw(`DROP DATABASE IF EXISTS \`${dbName}\``);
    await admin.destroy();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
