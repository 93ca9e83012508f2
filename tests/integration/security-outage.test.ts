import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { createServer } from "node:net";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { encode } from "next-auth/jwt";
import { AppClient } from "../support/http";

/**
 * The same build served with its database out of reach: DATABASE_PORT points at a port nobody listens on,
 * as when the database server has stopped (the app answered "connect ECONNREFUSED 127.0.0.1:3317").
 */
const ROOT = path.resolve(__dirname, "../..");
const SECRET = randomBytes(24).toString("base64url");
let server: ChildProcess;
let url = "";
let log = "";

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });
}

beforeAll(async () => {
  const [appPort, deadPort] = [await freePort(), await freePort()];
  url = `http://127.0.0.1:${appPort}`;
  server = spawn(
    process.execPath,
    ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(appPort)],
    {
      cwd: ROOT,
      env: {
        ...process.env,
        NODE_ENV: "production",
        NEXT_DIST_DIR: process.env.SCARPLINE_TEST_DIST ?? ".next-test",
        DATABASE_PORT: String(deadPort),
        NEXTAUTH_URL: url,
        APP_URL: url,
        NEXTAUTH_SECRET: SECRET,
      },
      stdio: ["ignore", "pipe", "pipe"],
    },
  );
  server.stdout?.on("data", (d) => (log += d));
  server.stderr?.on("data", (d) => (log += d));
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`${url}/sign-in`)).ok) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the app did not start:\n${log}`);
}, 90_000);

afterAll(() => {
  server?.kill("SIGTERM");
});

describe("with the database down (issue 12, item 7)", () => {
  test("signing in shows a plain message, not the driver's error, and the cause goes to the log", async () => {
    const { ok, error } = await new AppClient(url).signIn("engineer@scarpline.test", "scarpline-demo");
    expect(ok).toBe(false);
    const shown = decodeURIComponent(error ?? "");
    expect(shown).toMatch(/Sign-in is unavailable just now/);
    expect(shown).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|\d{4,5}/);
    expect(log).toMatch(/ECONNREFUSED/);
  });

  test("a project page answers 503 'the service is unavailable', not 404", async () => {
    for (const page of ["/projects/1", "/projects/1/sections/1", "/projects", "/"]) {
      const res = await fetch(`${url}${page}`, { redirect: "manual" });
      expect(res.status, page).toBe(503);
      expect(await res.text()).toMatch(/The service is unavailable/);
    }
    // The sign-in page itself still shows its form.
    expect((await fetch(`${url}/sign-in`)).status).toBe(200);
  });

  test("an API call with a session answers 503 with the same words", async () => {
    const token = await encode({
      token: { uid: 1, sv: 1, role: "engineer", organisationId: 1, email: "engineer@scarpline.test" },
      secret: SECRET,
    });
    const res = await fetch(`${url}/api/projects`, { headers: { cookie: `next-auth.session-token=${token}` } });
    expect(res.status).toBe(503);
    const body = await res.json();
    expect(body.error.code).toBe("unavailable");
    expect(body.error.message).toMatch(/The service is unavailable/);
  });
});
