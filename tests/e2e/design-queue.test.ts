/**
 * A server sweep in the browser: it runs as a job on the queue's workers (tests/support/stack.ts
 * starts them), the page shows its progress, a reloaded page finds the running job again, and
 * cancel stops it. The FS values themselves are checked against the engine in
 * tests/integration/design.test.ts; here the page's handling of the job is what is checked.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { appUrl, launchBrowser, signInAs, watchConsole } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function newStudy(page: Page, name: string): Promise<void> {
  await signInAs(page, "designer@scarpline.test");
  await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
  await page.getByRole("heading", { name: "Sections" }).waitFor();
  await page.goto(page.url() + "/design");
  await page.getByLabel("New study name").fill(name);
  await page.getByRole("button", { name: "Start study" }).click();
  await page.waitForURL(/\/design\/\d+$/);
}

/** 2:1 to 6:1 by 0.125: 33 ratios × 3 cases, long enough on one worker to reload the page mid-run. */
async function longServerSweep(page: Page): Promise<void> {
  await page.getByLabel("Steepest (H:1V)").fill("2");
  await page.getByLabel("Flattest (H:1V)").fill("6");
  await page.getByLabel("Step").fill("0.125");
  await page.getByLabel("Run on the server").check();
  await page.getByRole("button", { name: "Sweep slopes" }).click();
}

describe("a sweep on the server's job queue, seen from the page", () => {
  test("progress shows, a reloaded page picks the running job up again, and the result is shown", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = watchConsole(page);
    await newStudy(page, "Queued sweep");
    await longServerSweep(page);
    await expect
      .poll(async () => Number(await page.getByTestId("sweep-progress").getAttribute("value")), { timeout: 30_000 })
      .toBeGreaterThan(0);
    expect(await page.getByText(/of 102 searches on the server/).count()).toBe(1);

    await page.reload();
    // The page asks for the study's latest sweep job and follows it.
    await page.getByTestId("sweep-progress").waitFor({ timeout: 20_000 });
    await expect
      .poll(() => page.getByTestId("sweep-timing").textContent(), { timeout: 90_000 })
      .toMatch(/on the server with 1 worker/);
    expect(await page.getByTestId("sweep-row").count()).toBe(99);
    await page.getByTestId("recommendation").waitFor();
    expect(errors).toEqual([]);
    await page.close();
  }, 150_000);

  test("cancelling a server sweep stops its job; nothing is kept", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    await newStudy(page, "Cancelled queued sweep");
    await longServerSweep(page);
    await expect
      .poll(async () => Number(await page.getByTestId("sweep-progress").getAttribute("value")), { timeout: 30_000 })
      .toBeGreaterThan(0);
    await page.getByRole("button", { name: "Cancel sweep" }).click();
    await page.getByText("Cancelled; nothing was kept.").waitFor();
    // The job itself ended as cancelled on the server, not just on the page.
    const studyUrl = new URL(page.url());
    const [, projectId, studyId] = studyUrl.pathname.match(/projects\/(\d+)\/design\/(\d+)/)!;
    await expect
      .poll(
        async () =>
          (await page.request.get(appUrl(`/api/projects/${projectId}/design/${studyId}/sweep`)).then((r) => r.json()))
            .job.state,
        { timeout: 20_000 },
      )
      .toBe("cancelled");
    await page.reload();
    await page.getByRole("button", { name: "Sweep slopes" }).waitFor();
    expect(await page.getByTestId("sweep-row").count()).toBe(0);
    await page.close();
  }, 120_000);
});
