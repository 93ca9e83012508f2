/**
 * The real stack the integration and browser tests talk to: a database of the run's own on the
 * project's MariaDB (created here, dropped at the end), the S3 fake on a free port with a bucket and
 * data folder of the run's own (scripts/s3-fake.ts), the SMTP fake on a free port with a mail
 * folder of the run's own (scripts/smtp-fake.ts), the job queue's Redis on a free port with two
 * queue workers (tests/support/queue-processes.ts), and the built app served on a free port.
 * Shared by the integration and e2e projects: the first caller starts it, the last stops it.
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import path from "node:path";
import fs from "node:fs";
import os from "node:os";
import knex from "knex";
import { knexConfig } from "../../db/config";
import { seedDemo } from "../../db/seeds/demo";
import {
  freePort,
  startRedis,
  startWorkerProcess,
  stopProcess,
  stopRedis,
  type TestRedis,
} from "../../scripts/lib/queue-processes";

export interface Stack {
  dbName: string;
  appUrl: string;
  /** The settings the app server runs with, so a test can start another app or worker like it. */
  appEnv: Record<string, string>;
  workerPids: number[];
}

const ROOT = path.resolve(__dirname, "../..");
// Each concurrent test runner may build into its own folder (SCARPLINE_TEST_DIST).
const DIST_DIR = process.env.SCARPLINE_TEST_DIST ?? ".next-test";

interface State {
  users: number;
  stack: Promise<Stack>;
  server?: ChildProcess;
  s3?: FakeS3;
  smtp?: FakeSmtp;
  redis?: TestRedis;
  workers: ChildProcess[];
  dbName: string;
}
const g = globalThis as unknown as { scarplineStack?: State };

/** A migrated, seeded database of the given name on the project's MariaDB. */
export async function createDatabase(dbName: string): Promise<void> {
  const admin = knex({ ...knexConfig(), connection: { ...(knexConfig().connection as object), database: undefined } });
  try {
    await admin.raw(`CREATE DATABASE \`${dbName}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await admin.destroy();
  }
  const db = knex(knexConfig(dbName));
  try {
    await db.migrate.latest();
    await seedDemo(db);
  } finally {
    await db.destroy();
  }
}

export async function dropDatabase(dbName: string): Promise<void> {
  const admin = knex({ ...knexConfig(), connection: { ...(knexConfig().connection as object), database: undefined } });
  try {
    await admin.raw(`DROP DATABASE IF EXISTS \`${dbName}\``);
  } finally {
    await admin.destroy();
  }
}

function buildEngine(): void {
  // The queue workers and the engine threads load bundles (scripts/build-engine.mjs); a second's work, always
  // redone, and before the seed, which keeps its demo runs through those threads when a bundle exists.
  const engine = spawnSync(process.execPath, ["scripts/build-engine.mjs"], { cwd: ROOT, encoding: "utf8" });
  if (engine.status !== 0) throw new Error(`engine bundle failed:\n${engine.stdout}\n${engine.stderr}`);
}

function buildApp(): void {
  if (process.env.SCARPLINE_SKIP_BUILD === "1" && fs.existsSync(path.join(ROOT, DIST_DIR, "BUILD_ID"))) return;
  const result = spawnSync(process.execPath, ["node_modules/next/dist/bin/next", "build"], {
    cwd: ROOT,
    env: { ...process.env, NEXT_DIST_DIR: DIST_DIR, NEXT_TELEMETRY_DISABLED: "1" },
    encoding: "utf8",
  });
  if (result.status !== 0) throw new Error(`next build failed:\n${result.stdout}\n${result.stderr}`);
}

async function waitForServer(url: string, server: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`app server exited early:\n${log()}`);
    try {
      const res = await fetch(`${url}/sign-in`);
      if (res.ok) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`app server did not answer within 60 s:\n${log()}`);
}

interface FakeS3 {
  endpoint: string;
  bucket: string;
  folder: string;
  process: ChildProcess;
}

/** Starts scripts/s3-fake.ts on a free port, with a bucket and a temporary data folder of this run's own. */
async function startFakeS3(): Promise<FakeS3> {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), "scarpline-s3-"));
  const port = await freePort();
  const bucket = `scarpline-test-${process.pid}-${randomBytes(3).toString("hex")}`;
  const child = await startFake("scripts/s3-fake.ts", "s3-fake ready", {
    S3_PORT: String(port),
    S3_BUCKET: bucket,
    S3_DATA_DIR: path.join(folder, "data"),
    S3_PID_FILE: path.join(folder, "s3-fake.pid"),
  });
  const fake: FakeS3 = { endpoint: `http://127.0.0.1:${port}`, bucket, folder, process: child };
  return fake;
}

/**
 * Starts one of the project's loopback stand-ins and resolves once it prints its ready line.
 * node --import tsx keeps the fake in one process, so killing it leaves nothing behind.
 */
async function startFake(script: string, readyText: string, env: Record<string, string>): Promise<ChildProcess> {
  const child = spawn(process.execPath, ["--import", "tsx", script], {
    cwd: ROOT,
    env: { ...process.env, ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  // Should the run die before releaseStack, the fake must not outlive it.
  process.once("exit", () => child.kill("SIGKILL"));
  let output = "";
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => fail(new Error(`${script} did not start within 20 s:\n${output}`)), 20_000);
    const fail = (err: Error) => {
      clearTimeout(timer);
      child.kill("SIGKILL");
      reject(err);
    };
    child.stderr?.on("data", (d) => (output += d));
    child.stdout?.on("data", (d) => {
      output += d;
      if (output.includes(readyText)) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.once("exit", (code) => fail(new Error(`${script} exited early (code ${code}):\n${output}`)));
  });
  return child;
}

interface FakeSmtp {
  port: number;
  /** Where the fake writes each caught message as JSON (lib/mail/caught-mail.ts). */
  mailDir: string;
  folder: string;
  process: ChildProcess;
}

/** Starts scripts/smtp-fake.ts on a free port, keeping the mail it catches in a temporary folder. */
async function startFakeSmtp(): Promise<FakeSmtp> {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), "scarpline-smtp-"));
  const port = await freePort();
  const mailDir = path.join(folder, "mail");
  const child = await startFake("scripts/smtp-fake.ts", "smtp-fake ready", {
    SMTP_PORT: String(port),
    SMTP_MAIL_DIR: mailDir,
    SMTP_PID_FILE: path.join(folder, "smtp-fake.pid"),
  });
  return { port, mailDir, folder, process: child };
}

/** The app's mail settings (lib/env.ts) for the run's fake; tests read SMTP_MAIL_DIR too. */
function smtpEnv(fake: FakeSmtp): Record<string, string> {
  return {
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(fake.port),
    SMTP_SECURE: "false",
    SMTP_IGNORE_TLS: "true",
    SMTP_MAIL_DIR: fake.mailDir,
  };
}

async function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode === null && child.signalCode === null) {
    const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
    child.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5_000))]);
    child.kill("SIGKILL");
  }
}

/** The app's object-storage settings (lib/storage/s3-config.ts) for the run's fake. */
function s3Env(fake: FakeS3): Record<string, string> {
  return {
    S3_ENDPOINT: fake.endpoint,
    S3_BUCKET: fake.bucket,
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    S3_REGION: "us-east-1",
    S3_FORCE_PATH_STYLE: "true",
  };
}

async function stopFakeS3(fake: FakeS3): Promise<void> {
  if (fake.process.exitCode === null && fake.process.signalCode === null) {
    const exited = new Promise<void>((resolve) => fake.process.once("exit", () => resolve()));
    fake.process.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5_000))]);
    fake.process.kill("SIGKILL");
  }
  fs.rmSync(fake.folder, { recursive: true, force: true });
}

async function start(withServer: boolean, state: State): Promise<Stack> {
  buildEngine();
  await createDatabase(state.dbName);
  if (!withServer) return { dbName: state.dbName, appUrl: "", appEnv: {}, workerPids: [] };
  buildApp();
  state.s3 = await startFakeS3();
  state.smtp = await startFakeSmtp();
  // Test files read these too, to look into the bucket with their own S3 client and into the caught mail.
  Object.assign(process.env, s3Env(state.s3), smtpEnv(state.smtp));
  state.redis = await startRedis(await freePort());
  const port = await freePort();
  const appUrl = `http://127.0.0.1:${port}`;
  const appEnv: Record<string, string> = {
    NODE_ENV: "production",
    NEXT_DIST_DIR: DIST_DIR,
    DATABASE_NAME: state.dbName,
    NEXTAUTH_URL: appUrl,
    APP_URL: appUrl,
    NEXTAUTH_SECRET: randomBytes(24).toString("base64url"),
    REDIS_PORT: String(state.redis.port),
    // A worker killed mid-job hands it on after this (ms) instead of the production 30 s.
    JOB_LOCK_MS: "3000",
    ...s3Env(state.s3),
    ...smtpEnv(state.smtp),
  };
  // Two integration tests (jobs-queue, probabilistic-jobs) each SIGKILL one stack worker mid-job and stop
  // their own replacement when done; four leave at least two for the tests that run after them.
  for (let i = 0; i < 4; i++) state.workers.push((await startWorkerProcess(appEnv)).process);
  state.server = await startAppServer(appEnv, port);
  return { dbName: state.dbName, appUrl, appEnv, workerPids: state.workers.map((w) => w.pid!) };
}

/** Serves the built app on the port with the given settings; resolves once it answers. */
export async function startAppServer(appEnv: Record<string, string>, port: number): Promise<ChildProcess> {
  let output = "";
  const server = spawn(
    process.execPath,
    ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(port)],
    { cwd: ROOT, env: { ...process.env, ...appEnv }, stdio: ["ignore", "pipe", "pipe"] },
  );
  process.once("exit", () => server.kill("SIGKILL"));
  server.stdout?.on("data", (d) => (output += d));
  server.stderr?.on("data", (d) => (output += d));
  await waitForServer(`http://127.0.0.1:${port}`, server, () => output);
  return server;
}

/** Starts (or joins) the stack. The first caller decides whether the app server is needed. */
export function acquireStack(withServer: boolean): Promise<Stack> {
  if (!g.scarplineStack) {
    const state: State = {
      users: 0,
      workers: [],
      dbName: `scarpline_test_${process.pid}_${randomBytes(3).toString("hex")}`,
      stack: Promise.resolve() as never,
    };
    state.stack = start(withServer, state);
    g.scarplineStack = state;
  }
  g.scarplineStack.users++;
  return g.scarplineStack.stack;
}

export async function releaseStack(): Promise<void> {
  const state = g.scarplineStack;
  if (!state) return;
  if (--state.users > 0) return;
  g.scarplineStack = undefined;
  state.server?.kill("SIGTERM");
  await Promise.all(state.workers.map((w) => stopProcess(w)));
  if (state.redis) await stopRedis(state.redis);
  if (state.s3) await stopFakeS3(state.s3);
  if (state.smtp) {
    await stopChild(state.smtp.process);
    fs.rmSync(state.smtp.folder, { recursive: true, force: true });
  }
  await dropDatabase(state.dbName);
}
