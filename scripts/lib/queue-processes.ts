/**
 * The queue's processes for tests and benchmarks: a Redis of the test's own (Debian's redis-server on a free
 * port, data in a temporary folder, run in the foreground so killing it leaves nothing) and
 * queue workers (the bundled .engine/worker.mjs, as npm start runs them).
 */
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import { connect, createServer } from "node:net";
import os from "node:os";
import path from "node:path";

const ROOT = path.resolve(__dirname, "../..");

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });
}

/** Whether a Redis answers PING on the port. */
export function redisAnswers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect(port, "127.0.0.1");
    const done = (ok: boolean) => {
      socket.destroy();
      resolve(ok);
    };
    socket.setTimeout(1_000, () => done(false));
    socket.once("error", () => done(false));
    socket.once("connect", () => socket.write("PING\r\n"));
    socket.once("data", (d) => done(d.toString().startsWith("+PONG")));
  });
}

export interface TestRedis {
  port: number;
  folder: string;
  process: ChildProcess;
}

/** Starts redis-server in the foreground; `folder` keeps its append-only file across a restart. */
export async function startRedis(port: number, folder?: string): Promise<TestRedis> {
  const dir = folder ?? fs.mkdtempSync(path.join(os.tmpdir(), "scarpline-redis-"));
  const child = spawn(
    "redis-server",
    ["--port", String(port), "--bind", "127.0.0.1", "--dir", dir, "--appendonly", "yes", "--save", ""],
    { stdio: ["ignore", "pipe", "pipe"] },
  );
  process.once("exit", () => child.kill("SIGKILL"));
  let output = "";
  child.stdout?.on("data", (d) => (output += d));
  child.stderr?.on("data", (d) => (output += d));
  const deadline = Date.now() + 10_000;
  while (!(await redisAnswers(port))) {
    if (child.exitCode !== null || Date.now() > deadline) {
      child.kill("SIGKILL");
      throw new Error(`redis-server did not start on ${port}:\n${output}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return { port, folder: dir, process: child };
}

export async function stopProcess(child: ChildProcess, signal: NodeJS.Signals = "SIGTERM"): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  child.kill(signal);
  await Promise.race([exited, new Promise((r) => setTimeout(r, 12_000))]);
  if (child.exitCode === null && child.signalCode === null) child.kill("SIGKILL");
}

export async function stopRedis(redis: TestRedis, keepFolder = false): Promise<void> {
  await stopProcess(redis.process);
  if (!keepFolder) fs.rmSync(redis.folder, { recursive: true, force: true });
}

export interface TestWorker {
  process: ChildProcess;
  output: () => string;
}

/** Starts one queue worker with the given settings and resolves once it says it is ready. */
export async function startWorkerProcess(env: Record<string, string>): Promise<TestWorker> {
  const child = spawn(process.execPath, [path.join(ROOT, ".engine/worker.mjs")], {
    cwd: ROOT,
    env: { ...process.env, ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  process.once("exit", () => child.kill("SIGKILL"));
  let output = "";
  child.stdout?.on("data", (d) => (output += d));
  child.stderr?.on("data", (d) => (output += d));
  const deadline = Date.now() + 20_000;
  while (!output.includes(" ready on ")) {
    if (child.exitCode !== null || Date.now() > deadline) {
      child.kill("SIGKILL");
      throw new Error(`the queue worker did not start:\n${output}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return { process: child, output: () => output };
}
