/**
 * The local stand-in for object storage: an S3-compatible server (s3rver) on 127.0.0.1,
 * for development and tests only. Run in the foreground with `tsx scripts/s3-fake.ts`;
 * scripts/services-start.sh backgrounds it and scripts/stop.sh ends it through the pid file.
 *
 * Settings (all optional):
 *   S3_PORT        port on 127.0.0.1 (4569)
 *   S3_BUCKET      bucket created on start (scarpline-documents)
 *   S3_DATA_DIR    where objects are kept (.data/s3)
 *   S3_PID_FILE    pid file (.data/s3-fake.pid)
 *
 * Idempotent: when the pid file names a live process and the port answers, it says so and
 * exits 0. A port held by some other program is reported, not waited on.
 * Prints `s3-fake ready ...` on stdout once the bucket exists and the server listens.
 */
import fs from "node:fs";
import path from "node:path";
import { DATA_ROOT, HOST, livePid, portAnswers, readPort, serviceLog } from "./lib/loopback-service";
import { createRequire } from "node:module";

// s3rver ships no type declarations; this is the part of its API used here.
interface S3rverOptions {
  address: string;
  port: number;
  directory: string;
  silent: boolean;
  vhostBuckets: boolean;
  configureBuckets: { name: string; configs: string[] }[];
}
interface S3rverInstance {
  run(): Promise<{ address: string; port: number }>;
  close(): Promise<void>;
}
type S3rverConstructor = new (options: S3rverOptions) => S3rverInstance;

const log = serviceLog("s3-fake");
const BUCKET_NAME = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;

interface FakeSettings {
  port: number;
  bucket: string;
  directory: string;
  pidFile: string;
}

function readSettings(env: NodeJS.ProcessEnv = process.env): FakeSettings {
  const port = readPort(env, "S3_PORT", 4569);
  const bucket = env.S3_BUCKET ?? "scarpline-documents";
  if (!BUCKET_NAME.test(bucket))
    throw new Error(
      `S3_BUCKET must be a valid bucket name (3–63 lower-case letters, digits, '.' or '-'), got '${bucket}'`,
    );
  return {
    port,
    bucket,
    directory: path.resolve(env.S3_DATA_DIR ?? path.join(DATA_ROOT, "s3")),
    pidFile: path.resolve(env.S3_PID_FILE ?? path.join(DATA_ROOT, "s3-fake.pid")),
  };
}

async function main(): Promise<void> {
  const settings = readSettings();
  const running = livePid(settings.pidFile);
  const answering = await portAnswers(settings.port);
  if (running && answering) {
    log(`already running (pid ${running}) on http://${HOST}:${settings.port}`);
    console.log(`s3-fake ready on http://${HOST}:${settings.port} bucket=${settings.bucket}`);
    return;
  }
  if (answering)
    throw new Error(`port ${settings.port} on ${HOST} is held by another process; set S3_PORT to a free port`);
  if (running)
    throw new Error(
      `process ${running} from ${settings.pidFile} is alive but does not answer on port ${settings.port}; stop it first`,
    );
  fs.rmSync(settings.pidFile, { force: true });

  fs.mkdirSync(settings.directory, { recursive: true });
  fs.mkdirSync(path.dirname(settings.pidFile), { recursive: true });
  const S3rver = createRequire(__filename)("s3rver") as S3rverConstructor;
  const server = new S3rver({
    address: HOST,
    port: settings.port,
    directory: settings.directory,
    silent: true,
    // The app addresses buckets by path (forcePathStyle), never by sub-domain.
    vhostBuckets: false,
    // Created before the server listens, so "answers" also means "the bucket exists".
    configureBuckets: [{ name: settings.bucket, configs: [] }],
  });
  await server.run();
  fs.writeFileSync(settings.pidFile, `${process.pid}\n`);

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    log(`${signal}: stopping`);
    // Another start may have replaced the pid file meanwhile; only remove our own.
    if (livePid(settings.pidFile) === process.pid) fs.rmSync(settings.pidFile, { force: true });
    await server.close().catch(() => undefined);
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop("SIGTERM"));
  process.on("SIGINT", () => void stop("SIGINT"));

  log(`objects under ${settings.directory}`);
  console.log(`s3-fake ready on http://${HOST}:${settings.port} bucket=${settings.bucket}`);
}

main().catch((err: unknown) => {
  log(`error: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
