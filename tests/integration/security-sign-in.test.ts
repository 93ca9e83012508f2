import { describe, expect, test } from "vitest";
import { AppClient, signedIn } from "../support/http";
import { getDb } from "@/db/index";
import { LOCK_AFTER, SLOW_PATH_MAX_WAIT_MS, SLOW_PATH_SPACING_MS } from "@/lib/auth/throttle";

/**
 * One sign-in attempt as a browser at `address` makes it (the address rides in X-Forwarded-For, as a
 * reverse proxy in front of the app would set it). Returns whether a session came back and the error text.
 */
async function attempt(email: string, password: string, address: string): Promise<{ ok: boolean; error: string }> {
  const client = new AppClient();
  const forwarded = { "x-forwarded-for": address };
  const csrf = await (await client.request("/api/auth/csrf", { headers: forwarded })).json();
  const res = await client.request("/api/auth/callback/credentials", {
    method: "POST",
    headers: { ...forwarded, "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ csrfToken: csrf.csrfToken, email, password, json: "true" }).toString(),
  });
  const target = ((await res.json()) as { url?: string }).url ?? "";
  const error = new URL(target, client.baseUrl).searchParams.get("error") ?? "";
  const session = await (await client.request("/api/auth/session")).json();
  return { ok: Boolean(session?.user?.email) && !error, error: decodeURIComponent(error) };
}

async function forget(email: string): Promise<void> {
  await getDb()("sign_in_counters").where("counter_key", "like", `%${email}`).delete();
}

describe("sign-in lockout (issue 12, item 2)", () => {
  test("24 parallel wrong passwords with the right one among them lock the account for that client", async () => {
    const admin = await signedIn("admin@scarpline.test");
    const email = "lockout-target@scarpline.test";
    const created = await admin.request("/api/users", {
      method: "POST",
      json: { email, name: "Lock Target", role: "engineer", password: "right-password-1" },
    });
    expect(created.status).toBe(201);
    const attacker = "203.0.113.24"; // a documentation address (RFC 5737)
    try {
      const wrong = Array.from({ length: 24 }, (_, i) => attempt(email, `wrong-password-${i}`, attacker));
      const answers = await Promise.all([
        ...wrong.slice(0, 12),
        attempt(email, "right-password-1", attacker),
        ...wrong.slice(12),
      ]);
      // Counted before checking: at most LOCK_AFTER passwords were checked, the rest refused unchecked.
      const checked = answers.filter((a) => /e-mail or password is not right/.test(a.error) || a.ok);
      const locked = answers.filter((a) => /Too many failed sign-ins/.test(a.error));
      expect(checked.length).toBeLessThanOrEqual(LOCK_AFTER);
      expect(checked.length + locked.length).toBe(25);
      // The right password, checked or not, did not clear the wrong ones: this client stays locked out.
      const pair = await getDb()("sign_in_counters")
        .where({ counter_key: `pair:${attacker} ${email}` })
        .first();
      expect(pair.failures).toBeGreaterThanOrEqual(24);
      const again = await attempt(email, "right-password-1", attacker);
      expect(again.ok).toBe(false);
      expect(again.error).toMatch(/Too many failed sign-ins/);

      // The owner, elsewhere, still gets in (by the slower path): a stranger cannot lock the account for good.
      const owner = await attempt(email, "right-password-1", "198.51.100.7");
      expect(owner.ok).toBe(true);

      // An administrator lifts the lock; then the same client gets in with the right password.
      const users = (await (await admin.request("/api/users")).json()).users as { id: number; email: string }[];
      const target = users.find((u) => u.email === email)!;
      const unlock = await admin.request(`/api/users/${target.id}`, { method: "PATCH", json: { unlockSignIn: true } });
      expect(unlock.status).toBe(200);
      expect((await attempt(email, "right-password-1", attacker)).ok).toBe(true);
    } finally {
      await forget(email);
    }
  }, 120_000);

  test("guesses on one account from many addresses are checked one at a time; the overflow turned away", async () => {
    // Counters are keyed by the e-mail typed, so an account nobody has behaves as a real one does.
    const email = "crowd-target@scarpline.test";
    try {
      await getDb()("sign_in_counters").insert({ counter_key: `account:${email}`, failures: LOCK_AFTER });
      const answers = await Promise.all(
        Array.from({ length: 20 }, (_, i) => attempt(email, `crowd-guess-${i}`, `198.18.0.${i + 1}`)),
      );
      const checked = answers.filter((a) => /e-mail or password is not right/.test(a.error));
      const busy = answers.filter((a) => /being tried very often/.test(a.error));
      expect(checked.length + busy.length).toBe(20);
      // At most one check a second with a queue of ten seconds: about eleven are checked, the rest refused.
      expect(checked.length).toBeLessThanOrEqual(SLOW_PATH_MAX_WAIT_MS / SLOW_PATH_SPACING_MS + 2);
      expect(busy.length).toBeGreaterThan(0);
    } finally {
      await forget(email);
      await getDb()("sign_in_counters").where("counter_key", "like", "address:198.18.0.%").delete();
    }
  }, 60_000);

  test("one client address trying many accounts is stopped, whatever the e-mails", async () => {
    const address = "192.0.2.99";
    try {
      await getDb()("sign_in_counters").insert({ counter_key: `address:${address}`, failures: 100 });
      const refused = await attempt("engineer@scarpline.test", "scarpline-demo", address);
      expect(refused.ok).toBe(false);
      expect(refused.error).toMatch(/Too many failed sign-ins/);
    } finally {
      await getDb()("sign_in_counters")
        .where({ counter_key: `address:${address}` })
        .delete();
      await forget("engineer@scarpline.test");
    }
  });
});
