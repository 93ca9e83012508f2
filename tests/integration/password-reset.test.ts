import { createHash, randomBytes } from "node:crypto";
import { afterAll, describe, expect, test } from "vitest";
import { inject } from "vitest";
import { AppClient, sessionCookie, signedIn } from "../support/http";
import { openTestDb } from "../support/direct-db";
import { addPerson, awaitResetMail, requestReset, resetLinkIn } from "../support/people";
import { readResetToken, redeemResetToken, storeResetToken } from "@/db/queries/password-resets";
import { fetchSessionState, fetchUserById } from "@/db/queries/users";
import { getDb } from "@/db/index";

/**
 * The reset-link token store and the routes around it. Source for what a reset link must do: the OWASP
 * Forgot Password Cheat Sheet (from memory): random, single-use, expiring, stored hashed, ends the
 * person's sessions, and the new password obeys the usual rule.
 */
const db = openTestDb(inject("dbName"));
afterAll(async () => {
  await db.destroy();
  await getDb().destroy();
});

const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");
const newToken = () => randomBytes(32).toString("base64url");
const inMinutes = (m: number) => new Date(Math.floor(Date.now() / 1000) * 1000 + m * 60_000);
const PASSWORD = "people-pass-1";

describe("the reset-token store (db/queries/password-resets.ts)", () => {
  test("only the token's SHA-256 is kept; a good token is used once, ends the sessions and sets the hash", async () => {
    const id = await addPerson("store-once@scarpline.test", { password: PASSWORD });
    const token = newToken();
    await storeResetToken({ userId: id, tokenHash: sha256(token), expiresAt: inMinutes(60), createdBy: null });
    const rows = await db("password_reset_tokens").where({ user_id: id });
    expect(rows).toHaveLength(1);
    expect(rows[0].token_hash).toBe(sha256(token));
    expect(JSON.stringify(rows)).not.toContain(token);

    expect((await readResetToken(sha256(token))).kind).toBe("valid");
    const before = await fetchSessionState(id);
    expect((await redeemResetToken(sha256(token), "$2b$10$new-hash-for-the-test")).kind).toBe("valid");
    expect((await fetchUserById(id))?.password_hash).toBe("$2b$10$new-hash-for-the-test");
    expect((await fetchSessionState(id))?.sessionVersion).toBe(before!.sessionVersion + 1);

    const again = await redeemResetToken(sha256(token), "$2b$10$another-hash");
    expect(again.kind).toBe("used");
    expect((await fetchUserById(id))?.password_hash).toBe("$2b$10$new-hash-for-the-test");
  });

  test("an expired, an unknown and a superseded token change nothing", async () => {
    const id = await addPerson("store-expiry@scarpline.test", { password: PASSWORD });
    const hashBefore = (await fetchUserById(id))!.password_hash;
    const old = newToken();
    await storeResetToken({ userId: id, tokenHash: sha256(old), expiresAt: inMinutes(-1), createdBy: null });
    expect((await redeemResetToken(sha256(old), "$2b$10$x")).kind).toBe("expired");
    expect((await redeemResetToken(sha256(newToken()), "$2b$10$x")).kind).toBe("unknown");

    const first = newToken();
    const second = newToken();
    await storeResetToken({ userId: id, tokenHash: sha256(first), expiresAt: inMinutes(60), createdBy: null });
    await storeResetToken({ userId: id, tokenHash: sha256(second), expiresAt: inMinutes(60), createdBy: null });
    // Only the newest link mailed to a person works.
    expect((await readResetToken(sha256(first))).kind).toBe("expired");
    expect((await readResetToken(sha256(second))).kind).toBe("valid");
    expect((await fetchUserById(id))!.password_hash).toBe(hashBefore);
  });

  test("two uses of one token at the same moment: exactly one sets the password", async () => {
    const id = await addPerson("store-race@scarpline.test", { password: PASSWORD });
    const token = newToken();
    await storeResetToken({ userId: id, tokenHash: sha256(token), expiresAt: inMinutes(60), createdBy: null });
    const outcomes = await Promise.all(
      ["$2b$10$race-a", "$2b$10$race-b", "$2b$10$race-c"].map((h) => redeemResetToken(sha256(token), h)),
    );
    expect(outcomes.filter((o) => o.kind === "valid")).toHaveLength(1);
    expect(outcomes.filter((o) => o.kind === "used")).toHaveLength(2);
  });

  test("a deactivated person's token does not set a password", async () => {
    const id = await addPerson("store-inactive@scarpline.test", { password: PASSWORD });
    const token = newToken();
    await storeResetToken({ userId: id, tokenHash: sha256(token), expiresAt: inMinutes(60), createdBy: null });
    await db("users").where({ id }).update({ active: false });
    expect((await redeemResetToken(sha256(token), "$2b$10$x")).kind).toBe("inactive");
  });
});

describe("reset links over HTTP", () => {
  test("an administrator mails a link; it sets a new password once, ends old sessions, and is refused after", async () => {
    const email = "reset-http@scarpline.test";
    const id = await addPerson(email, { password: PASSWORD });
    const oldSession = await sessionCookie(email, PASSWORD);
    const admin = await signedIn("admin@scarpline.test");
    const sent = await requestReset(admin, id);
    expect(sent.status).toBe(201);
    const { expiresAt } = await sent.json();
    const minutes = (Date.parse(expiresAt) - Date.now()) / 60_000;
    expect(minutes).toBeGreaterThan(55);
    expect(minutes).toBeLessThanOrEqual(60);

    const mail = await awaitResetMail(email);
    const { token } = resetLinkIn(mail);
    expect(mail.text).toContain(`${inject("appUrl")}/reset-password/${token}`);

    const anyone = new AppClient();
    const weak = await anyone.request("/api/password-reset", {
      method: "POST",
      json: { token, newPassword: "short1", confirmPassword: "short1" },
    });
    expect(weak.status).toBe(400);
    expect((await weak.json()).error.fields.newPassword).toEqual(["At least 10 characters."]);

    const body = { token, newPassword: "people-pass-2", confirmPassword: "people-pass-2" };
    expect((await anyone.request("/api/password-reset", { method: "POST", json: body })).status).toBe(200);
    const replay = await anyone.request("/api/password-reset", { method: "POST", json: body });
    expect(replay.status).toBe(410);
    expect((await replay.json()).error.code).toBe("reset_used");

    const stale = await fetch(inject("appUrl") + "/api/projects", { headers: { cookie: oldSession } });
    expect(stale.status).toBe(401);
    expect((await new AppClient().signIn(email, PASSWORD)).ok).toBe(false);
    expect((await new AppClient().signIn(email, "people-pass-2")).ok).toBe(true);
  });

  test("a link moved past its expiry is refused with 410 and says when it expired", async () => {
    const email = "reset-expired@scarpline.test";
    const id = await addPerson(email, { password: PASSWORD });
    expect((await requestReset(await signedIn("admin@scarpline.test"), id)).status).toBe(201);
    const { token } = resetLinkIn(await awaitResetMail(email));
    await db("password_reset_tokens")
      .where({ token_hash: sha256(token) })
      .update({ expires_at: inMinutes(-5) });
    const res = await new AppClient().request("/api/password-reset", {
      method: "POST",
      json: { token, newPassword: "people-pass-2", confirmPassword: "people-pass-2" },
    });
    expect(res.status).toBe(410);
    const error = (await res.json()).error;
    expect(error.code).toBe("reset_expired");
    expect(error.message).toMatch(/expired on \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/);
  });

  test("only an administrator sends links, and not to a deactivated person", async () => {
    const id = await addPerson("reset-rules@scarpline.test", { password: PASSWORD });
    const engineer = await signedIn("engineer@scarpline.test");
    expect((await requestReset(engineer, id)).status).toBe(403);
    const admin = await signedIn("admin@scarpline.test");
    expect((await admin.request(`/api/users/${id}`, { method: "PATCH", json: { active: false } })).status).toBe(200);
    const refused = await requestReset(admin, id);
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.message).toMatch(/reactivate them/);
  });
});

describe("last sign-in and signing out everywhere", () => {
  test("a sign-in is recorded with its time; signing out everywhere ends every session, this one too", async () => {
    const email = "everywhere@scarpline.test";
    await addPerson(email, { password: PASSWORD });
    const admin = await signedIn("admin@scarpline.test");
    const listed = async () =>
      (
        (await (await admin.request("/api/users")).json()).users as { email: string; lastSignInAt: string | null }[]
      ).find((u) => u.email === email)!;
    expect((await listed()).lastSignInAt).toBeNull();
    const other = await sessionCookie(email, PASSWORD);
    const me = await signedIn(email, PASSWORD);
    const at = Date.parse((await listed()).lastSignInAt!);
    expect(Math.abs(at - Date.now())).toBeLessThan(60_000);

    expect((await me.request("/api/account/sessions", { method: "DELETE" })).status).toBe(200);
    expect((await me.request("/api/projects")).status).toBe(401);
    const stale = await fetch(inject("appUrl") + "/api/projects", { headers: { cookie: other } });
    expect(stale.status).toBe(401);
    expect((await new AppClient().request("/api/account/sessions", { method: "DELETE" })).status).toBe(401);
  });
});
