import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { appUrl, launchBrowser, signInAs, watchConsole } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("signing in as each role", () => {
  test("a wrong password shows the generic message and stays on the sign-in page", async () => {
    const page = await browser.newPage();
    await page.goto(appUrl("/sign-in"));
    await page.getByLabel("E-mail").fill("engineer@scarpline.test");
    await page.getByLabel("Password").fill("wrong-password-1");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.getByTestId("form-error").textContent()).toMatch(/e-mail or password is not right/);
    expect(page.url()).toContain("/sign-in");
    await page.close();
  });

  for (const role of ["engineer", "reviewer", "designer"] as const) {
    test(`${role}: sees the demo project, not the admin pages`, async () => {
      const page = await browser.newPage();
      const errors = watchConsole(page);
      // Failed loads are judged by their responses: a prefetch of a link on the dashboard (a run another test
      // file has just deleted, say) may answer 404 harmlessly; every other failure counts.
      const failed: string[] = [];
      page.on("response", (r) => {
        const h = r.request().headers();
        if (r.status() >= 400 && !h["next-router-prefetch"] && !h["next-router-segment-prefetch"])
          failed.push(`${r.status()} ${new URL(r.url()).pathname}`);
      });
      await signInAs(page, `${role}@scarpline.test`);
      await expect
        .poll(() => page.getByTestId("project-list").textContent())
        .toContain("Lower Wendle Reservoir embankment");
      expect(await page.getByRole("link", { name: "People" }).count()).toBe(0);
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("heading", { name: "Sections" }).waitFor();
      expect(await page.getByRole("link", { name: "Members" }).count()).toBe(0);
      // The members page itself refuses a non-admin even when typed in, with HTTP 403 (RFC 9110 §15.5.4).
      expect((await page.goto(page.url() + "/members"))?.status()).toBe(403);
      await page.getByTestId("forbidden").waitFor();
      await page.goto(appUrl("/account"));
      expect(await page.getByTestId("account-role").textContent()).toBe(role[0].toUpperCase() + role.slice(1));
      // The refused members page is the one failed load; that refusal is the point, nothing else may fail.
      expect(errors.filter((e) => !e.startsWith("Failed to load resource"))).toEqual([]);
      expect(failed.filter((f) => !/^403 \/projects\/\d+\/members$/.test(f))).toEqual([]);
      await page.close();
    });
  }

  test("admin: adds a person, adds them to the demo project, signs out", async () => {
    const page = await browser.newPage();
    const errors = watchConsole(page);
    await signInAs(page, "admin@scarpline.test");
    await page.getByRole("link", { name: "People" }).click();
    await page.getByLabel("Name").fill("Demo Second Engineer");
    await page.getByLabel("E-mail").fill("engineer2@scarpline.test");
    await page.getByLabel("First password").fill("second-engineer-1");
    await page.getByRole("button", { name: "Add person" }).click();
    await expect.poll(() => page.getByTestId("user-table").textContent()).toContain("engineer2@scarpline.test");

    await page.getByRole("link", { name: "Projects" }).click();
    await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
    // The project page must have arrived before its Members link is used, or the two navigations race.
    await page.waitForURL(/\/projects\/\d+$/);
    await page.getByRole("link", { name: "Members" }).click();
    await page.waitForURL(/\/members$/);
    await page.getByLabel("Person").selectOption({ label: "Demo Second Engineer (engineer2@scarpline.test)" });
    await page.getByLabel("Role in this project").selectOption("engineer");
    await page.getByRole("button", { name: "Save member" }).click();
    await expect.poll(() => page.getByTestId("member-table").textContent()).toContain("Demo Second Engineer");

    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/sign-in/);
    expect(errors).toEqual([]);
    await page.close();
  });

  test("a page behind sign-in sends an anonymous visitor to the sign-in page", async () => {
    const page = await browser.newPage();
    await page.goto(appUrl("/projects"));
    await page.waitForURL(/\/sign-in/);
    await page.close();
  });
});
