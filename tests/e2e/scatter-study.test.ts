/**
 * The scatter study on a kept run, in Chromium: the demo downstream face's probabilistic run is
 * queued, runs on the test stack's queue worker with its progress on the page (also after a
 * reload), and ends with pf and β shown against the project's target. A spread that would make
 * most φ′ samples negative (φ′ < 0 means nothing: a fact of the trade) is refused on the page with
 * the material named. The figures themselves are checked against the engine in
 * tests/integration/probabilistic-jobs.test.ts; here the page's handling is checked.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { appUrl, keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { signedIn } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup } from "../support/runs";

let browser: Browser;
let runPath: string;

beforeAll(async () => {
  browser = await launchBrowser();
  const engineer = await signedIn("engineer@scarpline.test");
  const demo = await demoProject(engineer);
  const res = await engineer.request(`/api/projects/${demo.projectId}/runs`, {
    method: "POST",
    json: {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title: "Downstream face, scatter study",
      setup: quickSetup(demo.document, "downstream"),
    },
  });
  expect(res.status).toBe(201);
  runPath = `/projects/${demo.projectId}/runs/${(await res.json()).run.id}`;
});
afterAll(async () => {
  await browser?.close();
});

describe("the scatter study of a kept run", () => {
  test("a bad spread is refused on the page, naming the material; nothing is queued", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    await keepScreenshotOnFailure(page, "scatter-bad-spread", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.goto(appUrl(runPath));
      const panel = page.getByTestId("scatter-study");
      await panel.getByTestId("scatter-form").waitFor();
      await panel.getByLabel("Compacted clay fill φ′ (°) sd").fill("30");
      await panel.getByRole("button", { name: "Queue the probabilistic run" }).click();
      await expect.poll(() => panel.getByTestId("scatter-failed").textContent()).toMatch(/'fill' φ′ \(°\)/);
      expect(await panel.getByTestId("spread-fill-phi").textContent()).toMatch(/would fall outside 0 … 60/);
      expect(await panel.getByTestId("scatter-progress").count()).toBe(0);
    });
    await page.close();
  }, 60_000);

  test("the demo downstream face runs on a worker with progress, survives a reload, and shows pf and β", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "scatter-study-run", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.goto(appUrl(runPath));
      const panel = page.getByTestId("scatter-study");
      await panel.getByTestId("scatter-form").waitFor();
      // The fill's φ′ spread starts from its lab set's fit.
      expect(await panel.getByTestId("spread-fill-phi").textContent()).toMatch(/sd of the fitted φ′ from lab set/);
      // A whole search per sample: long enough on one worker to watch it and reload the page.
      await panel.getByLabel("Each sample").selectOption("full-search");
      await panel.getByLabel("Samples").fill("2000");
      await panel.getByRole("button", { name: "Queue the probabilistic run" }).click();
      await expect
        .poll(() => panel.getByTestId("scatter-progress-text").textContent(), { timeout: 30_000 })
        .toMatch(/^[1-9][\d,]* of 2,000 samples$/);

      await page.reload();
      const again = page.getByTestId("scatter-study");
      await again.getByTestId("scatter-progress").waitFor({ timeout: 20_000 });
      await again.getByTestId("scatter-results").waitFor({ timeout: 120_000 });
      expect(await again.getByTestId("scatter-pf").first().textContent()).toMatch(/\d/);
      expect(Number(await again.getByTestId("scatter-beta-normal").first().textContent())).toBeGreaterThan(0);
      expect(Number(await again.getByTestId("scatter-beta-lognormal").first().textContent())).toBeGreaterThan(0);
      // One verdict per method: Bishop's simplified and the ordinary method.
      expect(await again.getByTestId("scatter-verdict").count()).toBe(2);
      expect(await again.getByTestId("scatter-verdict").first().textContent()).toMatch(/the project.s target of 3\.00/);
      await again.getByTestId("scatter-histogram").waitFor();
      await again.getByTestId("scatter-convergence").waitFor();
      expect(await again.getByTestId("fosm-row-bishop").count()).toBe(1);
    });
    expect(errors).toEqual([]);
    await page.close();
  }, 180_000);
});
