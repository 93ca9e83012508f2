import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, test } from "vitest";
import { AppClient, signedIn } from "../support/http";
import { demoProject } from "../support/demo";
import { can, type Action, type Role } from "@/lib/permissions";

/**
 * Every route handler against every role, with the permission matrix (lib/permissions.ts) as the source of
 * what each role may do. A route file, or a method in one, that has no entry below fails the first test,
 * so a new route cannot ship without saying who may call it.
 */
type Gate =
  | { kind: "public" }
  | { kind: "signed-in" }
  | { kind: "organisation"; action: Action }
  /** Inside a project; run routes then apply the review rules (lib/review/rules.ts) to the run's state. */
  | { kind: "project"; action: Action };

const PUBLIC: Gate = { kind: "public" };
const SIGNED_IN: Gate = { kind: "signed-in" };
const org = (action: Action): Gate => ({ kind: "organisation", action });
const project = (action: Action): Gate => ({ kind: "project", action });

const P = "/api/projects/[projectId]";
const MATRIX: Record<string, Gate> = {
  "GET /api/auth/[...nextauth]": PUBLIC,
  "POST /api/auth/[...nextauth]": PUBLIC,
  "GET /api/templates/[kind]": PUBLIC,
  "GET /api/account/notifications": SIGNED_IN,
  "PUT /api/account/notifications": SIGNED_IN,
  "POST /api/account/password": SIGNED_IN,
  "DELETE /api/account/sessions": SIGNED_IN,
  "POST /api/password-reset": PUBLIC,
  "GET /api/projects": SIGNED_IN,
  "POST /api/projects": org("projects.create"),
  "GET /api/users": org("users.manage"),
  "POST /api/users": org("users.manage"),
  "PATCH /api/users/[userId]": org("users.manage"),
  "POST /api/users/[userId]/password-reset": org("users.manage"),
  "GET /api/admin/mail": org("mail.view"),
  [`GET ${P}`]: project("project.view"),
  [`GET ${P}/design`]: project("project.view"),
  [`POST ${P}/design`]: project("design.sweep"),
  [`GET ${P}/design/[studyId]`]: project("project.view"),
  [`PATCH ${P}/design/[studyId]`]: project("design.sweep"),
  [`DELETE ${P}/design/[studyId]`]: project("design.sweep"),
  [`POST ${P}/design/[studyId]/open`]: project("design.sweep"),
  [`PUT ${P}/design/[studyId]/results`]: project("design.sweep"),
  [`POST ${P}/design/[studyId]/sweep`]: project("design.sweep"),
  [`GET ${P}/design/[studyId]/sweep`]: project("project.view"),
  [`GET ${P}/jobs/[jobId]`]: project("project.view"),
  // Then only a role that may start the job's kind (lib/jobs/kinds.ts) cancels it.
  [`DELETE ${P}/jobs/[jobId]`]: project("project.view"),
  [`GET ${P}/documents`]: project("project.view"),
  [`POST ${P}/documents`]: project("document.upload"),
  [`GET ${P}/documents/[documentId]`]: project("project.view"),
  // Then only the uploader or an administrator (checked on the document itself).
  [`DELETE ${P}/documents/[documentId]`]: project("project.view"),
  [`GET ${P}/lab-tests`]: project("project.view"),
  [`POST ${P}/lab-tests`]: project("material.edit"),
  [`GET ${P}/lab-tests/[testId]`]: project("project.view"),
  [`DELETE ${P}/lab-tests/[testId]`]: project("material.edit"),
  [`GET ${P}/loading-conditions`]: project("project.view"),
  [`PUT ${P}/loading-conditions/[key]`]: project("settings.edit"),
  [`GET ${P}/reliability-target`]: project("project.view"),
  [`PUT ${P}/reliability-target`]: project("settings.edit"),
  [`GET ${P}/materials`]: project("project.view"),
  [`POST ${P}/materials`]: project("material.edit"),
  [`GET ${P}/materials/[materialId]`]: project("project.view"),
  [`PUT ${P}/materials/[materialId]`]: project("material.edit"),
  [`DELETE ${P}/materials/[materialId]`]: project("material.edit"),
  [`GET ${P}/materials/export`]: project("project.view"),
  [`POST ${P}/materials/import`]: project("material.edit"),
  [`GET ${P}/members`]: project("project.view"),
  [`POST ${P}/members`]: project("members.manage"),
  [`DELETE ${P}/members/[userId]`]: project("members.manage"),
  [`GET ${P}/runs`]: project("project.view"),
  [`POST ${P}/runs`]: project("run.create"),
  [`GET ${P}/runs/export`]: project("project.view"),
  [`GET ${P}/runs/[runId]`]: project("project.view"),
  [`PATCH ${P}/runs/[runId]`]: project("project.view"),
  [`DELETE ${P}/runs/[runId]`]: project("project.view"),
  [`PUT ${P}/runs/[runId]/checklist`]: project("project.view"),
  [`GET ${P}/runs/[runId]/comments`]: project("project.view"),
  [`POST ${P}/runs/[runId]/comments`]: project("project.view"),
  [`GET ${P}/runs/[runId]/probabilistic`]: project("project.view"),
  [`POST ${P}/runs/[runId]/probabilistic`]: project("run.create"),
  [`GET ${P}/runs/[runId]/report`]: project("project.view"),
  [`GET ${P}/runs/[runId]/review`]: project("project.view"),
  [`GET ${P}/runs/[runId]/slices`]: project("project.view"),
  [`POST ${P}/runs/[runId]/status`]: project("project.view"),
  [`GET ${P}/sections`]: project("project.view"),
  [`POST ${P}/sections`]: project("section.edit"),
  [`GET ${P}/sections/[sectionId]`]: project("project.view"),
  [`PUT ${P}/sections/[sectionId]`]: project("section.edit"),
  [`DELETE ${P}/sections/[sectionId]`]: project("section.edit"),
  [`POST ${P}/sections/[sectionId]/archive`]: project("section.edit"),
  [`GET ${P}/sections/[sectionId]/seepage/[conditionId]`]: project("project.view"),
  [`PUT ${P}/sections/[sectionId]/seepage/[conditionId]`]: project("section.edit"),
  [`GET ${P}/sections/[sectionId]/versions/[version]`]: project("project.view"),
  [`POST ${P}/sections/[sectionId]/versions/[version]/restore`]: project("section.edit"),
};

const API_DIR = path.resolve(__dirname, "../../app/api");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

/** "METHOD /api/…" for every handler a route file exports, read from its source. */
function routeHandlers(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name === "route.ts") {
        const source = fs.readFileSync(full, "utf8");
        const route = "/api/" + path.relative(API_DIR, dir).split(path.sep).join("/");
        for (const m of METHODS) {
          if (new RegExp(`export const ${m}\\b|\\bas ${m}\\b`).test(source)) found.push(`${m} ${route}`);
        }
      }
    }
  };
  walk(API_DIR);
  return found.sort();
}

interface Caller {
  name: string;
  client: AppClient;
  /** The organisation-wide role, and the role inside the demo project (null: not a member). */
  role: Role | null;
  projectRole: Role | null;
}

const NONE = "999999999";
let callers: Caller[] = [];
let ids: Record<string, string> = {};

beforeAll(async () => {
  const admin = await signedIn("admin@scarpline.test");
  const made = await admin.request("/api/users", {
    method: "POST",
    json: { email: "outsider@scarpline.test", name: "Out Sider", role: "engineer", password: "outsider-pass-1" },
  });
  expect(made.status).toBe(201);
  const demo = await demoProject(admin);
  const materials = (await (await admin.request(`/api/projects/${demo.projectId}/materials`)).json()).materials;
  ids = {
    projectId: String(demo.projectId),
    sectionId: String(demo.sectionId),
    version: "1",
    materialId: String(materials[0]?.id ?? NONE),
    kind: "geometry",
    nextauth: "session",
  };
  callers = [
    { name: "anonymous", client: new AppClient(), role: null, projectRole: null },
    { name: "admin", client: admin, role: "admin", projectRole: "admin" },
    ...(["engineer", "reviewer", "designer"] as const).map((r) => ({
      name: r,
      role: r,
      projectRole: r,
      client: admin,
    })),
    { name: "outsider", client: admin, role: "engineer" as Role, projectRole: null },
  ];
  for (const c of callers) {
    if (c.name === "engineer" || c.name === "reviewer" || c.name === "designer") {
      c.client = await signedIn(`${c.name}@scarpline.test`);
    }
    if (c.name === "outsider") c.client = await signedIn("outsider@scarpline.test", "outsider-pass-1");
  }
}, 60_000);

/** The URL to call: real ids where reading is harmless, ids that do not exist wherever a call could write. */
function urlFor(key: string): string {
  const [method, route] = key.split(" ");
  return route.replace(/\[(\.\.\.)?([^\]]+)\]/g, (_, _dots, name: string) => {
    if (name === "projectId" || name === "kind" || name === "nextauth") return ids[name];
    return method === "GET" ? (ids[name] ?? NONE) : NONE;
  });
}

/** What a caller must get: "allowed" (neither 401 nor 403), or one exact refusal status. */
function expected(gate: Gate, c: Caller): "allowed" | 401 | 403 | 404 {
  if (gate.kind === "public") return "allowed";
  if (c.role === null) return 401;
  if (gate.kind === "signed-in") return "allowed";
  if (gate.kind === "organisation") return can(c.role, gate.action) ? "allowed" : 403;
  if (c.projectRole === null) return 404;
  return can(c.projectRole, gate.action) ? "allowed" : 403;
}

describe("route × role matrix", () => {
  test("every route handler has an entry in the matrix, and every entry a handler", () => {
    const handlers = routeHandlers();
    expect(handlers.filter((h) => !(h in MATRIX))).toEqual([]);
    expect(Object.keys(MATRIX).filter((k) => !handlers.includes(k))).toEqual([]);
  });

  test("every handler goes through apiRoute, the one place that refuses foreign origins (lib/api/handler.ts)", () => {
    const unwrapped: string[] = [];
    const walk = (dir: string) => {
      for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
        const full = path.join(dir, entry.name);
        if (entry.isDirectory()) walk(full);
        else if (entry.name === "route.ts") {
          const source = fs.readFileSync(full, "utf8");
          for (const m of source.matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\s*=\s*(\w+)/g)) {
            if (m[2] !== "apiRoute") unwrapped.push(`${m[1]} ${path.relative(API_DIR, full)}`);
          }
        }
      }
    };
    walk(API_DIR);
    expect(unwrapped).toEqual([]);
    // The sign-in handler is next-auth's own; its POST calls the same check before handing over.
    const auth = fs.readFileSync(path.join(API_DIR, "auth/[...nextauth]/route.ts"), "utf8");
    expect(auth).toMatch(/refuseForeignOrigin\(request\)/);
  });

  test("each role gets exactly what the permission matrix grants on every route, and never a 500", async () => {
    const wrong: string[] = [];
    let calls = 0;
    // Signing out everywhere ends the caller's sessions, so it is called last.
    const ENDS_SESSIONS = "DELETE /api/account/sessions";
    const keys = Object.keys(MATRIX).filter((k) => k !== "POST /api/auth/[...nextauth]" && k !== ENDS_SESSIONS);
    for (const key of [...keys, ENDS_SESSIONS]) {
      const method = key.split(" ")[0];
      const url = urlFor(key);
      for (const c of callers) {
        const res = await c.client.request(url, { method });
        calls++;
        await res.arrayBuffer();
        const want = expected(MATRIX[key], c);
        const ok =
          res.status < 500 && (want === "allowed" ? res.status !== 401 && res.status !== 403 : res.status === want);
        if (!ok) wrong.push(`${c.name} ${method} ${url}: ${res.status}, expected ${want}`);
      }
    }
    expect(wrong).toEqual([]);
    expect(calls).toBeGreaterThan(300);
  }, 180_000);
});
