import { describe, expect, test } from "vitest";
import { AppClient, signedIn } from "../support/http";
import { getDb } from "@/db/index";

describe("sign-in", () => {
  test("signIn(engineer) with the right password issues a session with the role", async () => {
    const client = await signedIn("engineer@scarpline.test");
    const session = await (await client.request("/api/auth/session")).json();
    expect(session.user.email).toBe("engineer@scarpline.test");
    expect(session.user.role).toBe("engineer");
  });

  test("a wrong password and an unknown e-mail get the same generic message", async () => {
    const wrong = await new AppClient().signIn("reviewer@scarpline.test", "not-the-password1");
    const unknown = await new AppClient().signIn("nobody@scarpline.test", "not-the-password1");
    expect(wrong.ok).toBe(false);
    expect(unknown.ok).toBe(false);
    expect(wrong.error).toBe(unknown.error);
    expect(wrong.error).toMatch(/e-mail or password is not right/);
  });

  test("repeated failures for one account are slowed down and then locked", async () => {
    const email = "designer@scarpline.test";
    const client = new AppClient();
    const times: number[] = [];
    try {
      for (let i = 0; i < 8; i++) {
        const t0 = performance.now();
        await client.signIn(email, `wrong-password-${i}`);
        times.push(performance.now() - t0);
      }
      // After the free attempts each answer waits longer (lib/auth/throttle.ts).
      expect(times[6]).toBeGreaterThan(times[0] + 1000);
      const locked = await client.signIn(email, "scarpline-demo");
      expect(locked.ok).toBe(false);
      expect(decodeURIComponent(locked.error ?? "")).toMatch(/Too many failed sign-ins/);
    } finally {
      await getDb()("sign_in_counters").where("counter_key", "like", `%${email}`).delete();
    }
    expect((await new AppClient().signIn(email, "scarpline-demo")).ok).toBe(true);
  }, 60_000);
});

describe("API answers to bad requests", () => {
  test("GET /api/projects without a session is 401 with the error shape", async () => {
    const res = await new AppClient().request("/api/projects");
    expect(res.status).toBe(401);
    const body = await res.json();
    expect(body.error.code).toBe("unauthorized");
    expect(typeof body.error.message).toBe("string");
  });

  test("POST /api/projects by an engineer is 403", async () => {
    const client = await signedIn("engineer@scarpline.test");
    const res = await client.request("/api/projects", {
      method: "POST",
      json: { name: "Not allowed", description: "" },
    });
    expect(res.status).toBe(403);
    expect((await res.json()).error.code).toBe("forbidden");
  });

  test("POST /api/projects with a malformed body is 400 with field errors, and nothing is written", async () => {
    const client = await signedIn("admin@scarpline.test");
    const before = await getDb()("projects").count({ n: "*" }).first();
    const res = await client.request("/api/projects", { method: "POST", json: { name: "x", description: 42 } });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.code).toBe("invalid_input");
    expect(body.error.fields.name).toEqual(["At least 3 characters."]);
    expect(body.error.fields.description).toEqual([expect.stringMatching(/expected string, received number/)]);
    const bad = await client.request("/api/projects", {
      method: "POST",
      body: "{not json",
      headers: { "content-type": "application/json" },
    });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.code).toBe("invalid_json");
    const after = await getDb()("projects").count({ n: "*" }).first();
    expect(after?.n).toBe(before?.n);
  });

  test("a project the user is not a member of answers 404", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const created = await admin.request("/api/projects", {
      method: "POST",
      json: { name: "Spillway channel cut", description: "Side slopes of a channel." },
    });
    expect(created.status).toBe(201);
    const { project } = await created.json();
    const engineer = await signedIn("engineer@scarpline.test");
    expect((await engineer.request(`/api/projects/${project.id}`)).status).toBe(404);
    expect((await admin.request(`/api/projects/${project.id}`)).status).toBe(200);
  });
});

describe("members and users", () => {
  test("an admin adds a member; the member then sees the project; a designer may not manage members", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const { project } = await (
      await admin.request("/api/projects", { method: "POST", json: { name: "Levee reach 4", description: "" } })
    ).json();
    const users = (await (await admin.request("/api/users")).json()).users as { id: number; email: string }[];
    const reviewer = users.find((u) => u.email === "reviewer@scarpline.test")!;
    const add = await admin.request(`/api/projects/${project.id}/members`, {
      method: "POST",
      json: { userId: reviewer.id, role: "reviewer" },
    });
    expect(add.status).toBe(201);
    const asReviewer = await signedIn("reviewer@scarpline.test");
    const list = (await (await asReviewer.request("/api/projects")).json()).projects as { id: number }[];
    expect(list.map((p) => p.id)).toContain(project.id);

    const designer = await signedIn("designer@scarpline.test");
    const demo = (await (await designer.request("/api/projects")).json()).projects[0];
    const denied = await designer.request(`/api/projects/${demo.id}/members`, {
      method: "POST",
      json: { userId: reviewer.id, role: "engineer" },
    });
    expect(denied.status).toBe(403);
  });

  test("POST /api/users refuses a duplicate e-mail with 409 and a weak password with 400", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const dup = await admin.request("/api/users", {
      method: "POST",
      json: { email: "engineer@scarpline.test", name: "Copy", role: "engineer", password: "abcdefgh12" },
    });
    expect(dup.status).toBe(409);
    const weak = await admin.request("/api/users", {
      method: "POST",
      json: { email: "new@scarpline.test", name: "New", role: "engineer", password: "short" },
    });
    expect(weak.status).toBe(400);
    expect((await weak.json()).error.fields.password).toContain("At least 10 characters.");
  });

  test("a new user changes their password and signs in with the new one only", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const created = await admin.request("/api/users", {
      method: "POST",
      json: { email: "pw@scarpline.test", name: "Pat Word", role: "designer", password: "first-pass-1" },
    });
    expect(created.status).toBe(201);
    const me = await signedIn("pw@scarpline.test", "first-pass-1");
    const wrong = await me.request("/api/account/password", {
      method: "POST",
      json: { currentPassword: "nope", newPassword: "second-pass-2", confirmPassword: "second-pass-2" },
    });
    expect(wrong.status).toBe(400);
    const ok = await me.request("/api/account/password", {
      method: "POST",
      json: { currentPassword: "first-pass-1", newPassword: "second-pass-2", confirmPassword: "second-pass-2" },
    });
    expect(ok.status).toBe(200);
    expect((await new AppClient().signIn("pw@scarpline.test", "first-pass-1")).ok).toBe(false);
    expect((await new AppClient().signIn("pw@scarpline.test", "second-pass-2")).ok).toBe(true);
  });
});
