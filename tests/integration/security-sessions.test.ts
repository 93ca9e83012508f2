import { describe, expect, test } from "vitest";
import { inject } from "vitest";
import { sessionCookie, signedIn } from "../support/http";

const base = () => inject("appUrl");

const asCookie = (cookie: string, path: string, init: RequestInit = {}) =>
  fetch(base() + path, { ...init, redirect: "manual", headers: { ...init.headers, cookie } });

async function newUser(email: string, role = "engineer"): Promise<number> {
  const admin = await signedIn("admin@scarpline.test");
  const res = await admin.request("/api/users", {
    method: "POST",
    json: { email, name: "Session Person", role, password: "session-pass-1" },
  });
  expect(res.status).toBe(201);
  return (await res.json()).user.id;
}

describe("sessions end when they should (issue 12, item 6)", () => {
  test("a token used after its sign-out gets 401 on the API and a redirect to sign-in on pages", async () => {
    await newUser("signout@scarpline.test");
    const cookie = await sessionCookie("signout@scarpline.test", "session-pass-1");
    expect((await asCookie(cookie, "/api/projects")).status).toBe(200);
    const csrf = await (await asCookie(cookie, "/api/auth/csrf")).json();
    const out = await asCookie(cookie, "/api/auth/signout", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken: csrf.csrfToken, json: "true" }).toString(),
    });
    expect(out.status).toBeLessThan(400);
    // The same cookie, replayed as an attacker holding a copy would.
    expect((await asCookie(cookie, "/api/projects")).status).toBe(401);
    const page = await asCookie(cookie, "/projects");
    expect([302, 303, 307]).toContain(page.status);
    expect(page.headers.get("location")).toMatch(/\/sign-in/);
  });

  test("a password change ends the other sessions of the user but not the one that made it", async () => {
    await newUser("pwchange@scarpline.test");
    const other = await sessionCookie("pwchange@scarpline.test", "session-pass-1");
    const me = await signedIn("pwchange@scarpline.test", "session-pass-1");
    const changed = await me.request("/api/account/password", {
      method: "POST",
      json: { currentPassword: "session-pass-1", newPassword: "session-pass-2", confirmPassword: "session-pass-2" },
    });
    expect(changed.status).toBe(200);
    expect((await me.request("/api/projects")).status).toBe(200);
    expect((await asCookie(other, "/api/projects")).status).toBe(401);
  });

  test("a role change and a deactivation end the user's sessions", async () => {
    const id = await newUser("rolechange@scarpline.test");
    const admin = await signedIn("admin@scarpline.test");
    const before = await sessionCookie("rolechange@scarpline.test", "session-pass-1");
    const role = await admin.request(`/api/users/${id}`, { method: "PATCH", json: { role: "reviewer" } });
    expect(role.status).toBe(200);
    expect((await role.json()).user.role).toBe("reviewer");
    expect((await asCookie(before, "/api/projects")).status).toBe(401);

    const after = await sessionCookie("rolechange@scarpline.test", "session-pass-1");
    expect((await asCookie(after, "/api/projects")).status).toBe(200);
    const off = await admin.request(`/api/users/${id}`, { method: "PATCH", json: { active: false } });
    expect(off.status).toBe(200);
    expect((await asCookie(after, "/api/projects")).status).toBe(401);
  });

  test("only an administrator changes roles, and the last active administrator keeps the seat", async () => {
    const id = await newUser("notadmin@scarpline.test");
    const engineer = await signedIn("engineer@scarpline.test");
    expect((await engineer.request(`/api/users/${id}`, { method: "PATCH", json: { role: "admin" } })).status).toBe(403);
    const admin = await signedIn("admin@scarpline.test");
    const me = (await (await admin.request("/api/auth/session")).json()).user.id as number;
    // The demo organisation has one administrator: deactivating or demoting them would leave nobody to manage people.
    for (const json of [{ active: false }, { role: "engineer" }]) {
      const refused = await admin.request(`/api/users/${me}`, { method: "PATCH", json });
      expect(refused.status).toBe(409);
      expect((await refused.json()).error.code).toBe("last_admin");
    }
    expect((await admin.request("/api/projects")).status).toBe(200);
  });
});
