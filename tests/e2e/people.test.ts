import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { inject } from "vitest";
import type { Browser, Page } from "playwright-core";
import { appUrl, keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { signedIn } from "../support/http";
import { openTestDb } from "../support/direct-db";
import { createDraft, demoProject, mailAbout, move } from "../support/review";
import { addPerson, awaitResetMail, requestReset, resetLinkIn } from "../support/people";

/**
 * People, sign-in and the admin pages in Debian's Chromium. Sources: RFC 9110 §15.5.4 (403 Forbidden:
 * the server understood and refuses; a refusal page must carry it, not 200); the OWASP Forgot Password
 * Cheat Sheet (a reset link works once and expires); the OWASP Session Management Cheat Sheet (a person
 * can end all their sessions). All quoted from memory.
 */
const WAIT = { timeout: 15_000 };
const PASSWORD = "people-pass-1";

let browser: Browser;
const db = openTestDb(inject("dbName"));
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await db.destroy();
});

/** Fills the sign-in form and submits it, without waiting for where it goes. */
async function submitSignIn(page: Page, email: string, password: string) {
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

describe("the sign-in form", () => {
  test("an empty form says what is missing and sends nothing", async () => {
    const page = await browser.newPage();
    const sent: string[] = [];
    page.on("request", (r) => {
      if (r.url().includes("/api/auth/")) sent.push(r.url());
    });
    await page.goto(appUrl("/sign-in"));
    await page.waitForLoadState("networkidle");
    sent.length = 0; // next-auth may read its session on load; only what the click sends counts
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect
      .poll(() => page.locator(".field-error").allTextContents())
      .toEqual(["Enter your e-mail address.", "Enter your password."]);
    expect(await page.getByLabel("E-mail").getAttribute("aria-invalid")).toBe("true");
    await page.screenshot({ path: "test-results/sign-in-empty.png" });
    await page.getByLabel("E-mail").fill("engineer@scarpline.test");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.locator(".field-error").allTextContents()).toEqual(["Enter your password."]);
    expect(sent).toEqual([]);
    expect(page.url()).toContain("/sign-in");
    await page.close();
  });
});

describe("administrators' pages", () => {
  test("other roles get HTTP 403 on every admin page; the administrator gets 200", async () => {
    const { projectId } = await demoProject(await signedIn("admin@scarpline.test"));
    const adminPages = ["/admin/users", "/admin/mail", `/projects/${projectId}/members`];
    for (const role of ["engineer", "reviewer", "designer"]) {
      const page = await browser.newPage();
      await signInAs(page, `${role}@scarpline.test`);
      for (const path of adminPages) {
        const res = await page.goto(appUrl(path));
        expect(res?.status(), `${role} ${path}`).toBe(403);
        await page.getByTestId("forbidden").waitFor();
      }
      await page.close();
    }
    const admin = await browser.newPage();
    await signInAs(admin, "admin@scarpline.test");
    for (const path of adminPages) expect((await admin.goto(appUrl(path)))?.status(), path).toBe(200);
    await admin.close();
  });
});

describe("managing people", () => {
  test("an administrator deactivates a person: they cannot sign in, their runs keep their name; then reactivates", async () => {
    const email = "deactivated-person@scarpline.test";
    const name = "Deactivation Test Person";
    const id = await addPerson(email, { name, password: PASSWORD });
    const adminClient = await signedIn("admin@scarpline.test");
    const demo = await demoProject(adminClient);
    const member = await adminClient.request(`/api/projects/${demo.projectId}/members`, {
      method: "POST",
      json: { userId: id, role: "engineer" },
    });
    expect(member.status).toBeLessThan(300);
    const runTitle = `Run by a person later deactivated ${Date.now()}`;
    await createDraft(await signedIn(email, PASSWORD), demo, runTitle);

    const admin = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = watchConsole(admin);
    await signInAs(admin, "admin@scarpline.test");
    await keepScreenshotOnFailure(admin, "people-deactivate", async () => {
      await admin.getByRole("link", { name: "People" }).click();
      const row = admin.getByTestId(`person-${email}`);
      // Their sign-in for the draft above shows as an ISO 8601 date and time with its zone.
      expect(await row.getByTestId("person-last-sign-in").textContent()).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC$/);
      // The only administrator cannot leave the seat, and the screen says why.
      const self = admin.getByTestId("person-admin@scarpline.test");
      expect(await self.getByRole("button", { name: "Deactivate" }).isDisabled()).toBe(true);
      expect(await self.getByLabel("Role of Demo Administrator").isDisabled()).toBe(true);
      expect(await self.getByTestId("last-admin-note").textContent()).toMatch(/at least one active administrator/);

      await row.getByRole("button", { name: "Deactivate" }).click();
      await expect.poll(() => row.getByTestId("person-status").textContent(), WAIT).toBe("Deactivated");
      await admin.screenshot({ path: "test-results/people-screen.png", fullPage: true });
    });

    const person = await browser.newPage();
    await person.goto(appUrl("/sign-in"));
    await submitSignIn(person, email, PASSWORD);
    await expect.poll(() => person.getByTestId("form-error").textContent(), WAIT).toMatch(/deactivated/);
    expect(person.url()).toContain("/sign-in");

    await admin.goto(appUrl(`/projects/${demo.projectId}/runs`));
    const runRow = admin.getByTestId("runs-table").locator("tr", { hasText: runTitle });
    await expect.poll(() => runRow.textContent(), WAIT).toContain(name);

    await admin.goto(appUrl("/admin/users"));
    const row = admin.getByTestId(`person-${email}`);
    await row.getByRole("button", { name: "Reactivate" }).click();
    await expect.poll(() => row.getByTestId("person-status").textContent(), WAIT).toBe("Active");
    await person.goto(appUrl("/sign-in"));
    await submitSignIn(person, email, PASSWORD);
    await person.waitForURL(/\/projects/, WAIT);
    expect(errors).toEqual([]);
    await person.close();
    await admin.close();
  });

  test("a mailed reset link sets a new password once, and is refused a second time and after expiry", async () => {
    const email = "reset-person@scarpline.test";
    const id = await addPerson(email, { name: "Reset Test Person", password: PASSWORD });
    const admin = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    await signInAs(admin, "admin@scarpline.test");
    await admin.goto(appUrl("/admin/users"));
    const row = admin.getByTestId(`person-${email}`);
    await row.getByRole("button", { name: "Mail a reset link" }).click();
    await expect
      .poll(() => row.getByTestId("person-done").textContent(), WAIT)
      .toMatch(/Reset link mailed to reset-person@scarpline.test; it works once and expires on .* UTC/);

    const mail = await awaitResetMail(email);
    expect(mail.text).toMatch(/expires on \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC \(60 minutes after it was sent\)/);
    const { url } = resetLinkIn(mail);
    const person = await browser.newPage();
    await keepScreenshotOnFailure(person, "people-reset", async () => {
      await person.goto(url);
      await person.screenshot({ path: "test-results/reset-form.png" });
      await person.getByLabel("New password", { exact: true }).fill("short1");
      await person.getByLabel("New password again").fill("short1");
      await person.getByRole("button", { name: "Set new password" }).click();
      await expect
        .poll(() => person.locator(".field-error").first().textContent(), WAIT)
        .toBe("At least 10 characters.");
      await person.getByLabel("New password", { exact: true }).fill("people-pass-2");
      await person.getByLabel("New password again").fill("people-pass-2");
      await person.getByRole("button", { name: "Set new password" }).click();
      await person.getByTestId("reset-done").waitFor(WAIT);
      await person.getByRole("link", { name: "Sign in" }).click();
      await person.waitForURL(/\/sign-in/);
      await submitSignIn(person, email, "people-pass-2");
      await person.waitForURL(/\/projects/, WAIT);

      // The same link a second time.
      await person.goto(url);
      expect(await person.getByTestId("reset-refused").textContent()).toMatch(/works only once/);
      await person.screenshot({ path: "test-results/reset-refused.png" });
    });

    // A fresh link, moved past its expiry.
    expect((await requestReset(await signedIn("admin@scarpline.test"), id)).status).toBe(201);
    const second = resetLinkIn(await awaitResetMail(email, 2));
    const hash = createHash("sha256").update(second.token).digest("hex");
    await db("password_reset_tokens")
      .where({ token_hash: hash })
      .update({ expires_at: new Date(Date.now() - 60_000) });
    await person.goto(second.url);
    expect(await person.getByTestId("reset-refused").textContent()).toMatch(
      /expired on \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/,
    );
    await person.close();
    await admin.close();
  });

  test("signing out everywhere ends the session in another browser too", async () => {
    const email = "everywhere-browser@scarpline.test";
    await addPerson(email, { name: "Everywhere Test Person", password: PASSWORD });
    const first = await browser.newContext();
    const second = await browser.newContext();
    const a = await first.newPage();
    const b = await second.newPage();
    await signInAs(a, email, PASSWORD);
    await signInAs(b, email, PASSWORD);
    await a.goto(appUrl("/account"));
    await a.screenshot({ path: "test-results/account-page.png", fullPage: true });
    await a.getByRole("button", { name: "Sign out everywhere" }).click();
    await a.waitForURL(/\/sign-in/, WAIT);
    await b.goto(appUrl("/account"));
    await b.waitForURL(/\/sign-in/, WAIT);
    expect((await b.request.get(appUrl("/api/projects"))).status()).toBe(401);
    await first.close();
    await second.close();
  });
});

describe("mail links", () => {
  test("a review request's link brings the reviewer back to the review after sign-in", async () => {
    const engineer = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineer);
    const title = `Mail link return ${Date.now()}`;
    const runId = await createDraft(engineer, demo, title);
    expect((await move(engineer, demo, runId, "submit")).status).toBe(200);
    let link = "";
    await expect
      .poll(async () => {
        const mail = (await mailAbout(title)).find((m) => m.envelope.to.includes("reviewer@scarpline.test"));
        link = /Open the review: (\S+)/.exec(mail?.text ?? "")?.[1] ?? "";
        return link;
      }, WAIT)
      .toMatch(new RegExp(`/projects/${demo.projectId}/runs/${runId}/review$`));

    const page = await browser.newPage();
    await page.goto(link);
    await page.waitForURL(/\/sign-in\?callbackUrl=/);
    expect(new URL(page.url()).searchParams.get("callbackUrl")).toBe(
      `/projects/${demo.projectId}/runs/${runId}/review`,
    );
    await page.getByTestId("sign-in-return").waitFor();
    await submitSignIn(page, "reviewer@scarpline.test", "scarpline-demo");
    await page.waitForURL(new RegExp(`/projects/${demo.projectId}/runs/${runId}/review$`), WAIT);
    await page.getByTestId("run-canvas").waitFor(WAIT);

    // A callbackUrl to another site is not followed.
    const other = await browser.newPage();
    await other.goto(appUrl("/sign-in?callbackUrl=" + encodeURIComponent("//evil.example/projects")));
    expect(await other.getByTestId("sign-in-return").count()).toBe(0);
    await submitSignIn(other, "reviewer@scarpline.test", "scarpline-demo");
    await other.waitForURL(appUrl("/projects"), WAIT);
    await page.close();
    await other.close();
  });
});
