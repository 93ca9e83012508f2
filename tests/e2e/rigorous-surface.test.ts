/**
 * Issue 15 in Chromium: on the demo spoil bank over a clay seam an engineer draws a slip surface
 * along the seam, runs the search with all four methods, and sees them side by side with the line
 * of thrust, before and after keeping the run.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { clickWorld } from "../support/canvas";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function fsOf(page: Page, testId: string): Promise<number> {
  const text = (await page.getByTestId(testId).textContent()) ?? "";
  const m = /(\d+\.\d{3})/.exec(text);
  if (!m) throw new Error(`${testId} shows no factor: ${text}`);
  return Number(m[1]);
}

async function sideBySide(page: Page) {
  const table = page.getByTestId("method-comparison");
  await table.waitFor();
  for (const m of ["bishop", "fellenius", "spencer", "morgenstern-price"])
    expect(await table.getByTestId(`method-row-${m}`).count()).toBe(1);
  expect(await page.getByTestId("method-surface-bishop").textContent()).toContain("circle only");
  expect(await page.getByTestId("method-surface-fellenius").textContent()).toContain("circle only");
  const surface = await fsOf(page, "method-surface-spencer");
  const circle = await fsOf(page, "method-circle-bishop");
  expect(await page.getByTestId("method-surface-spencer").textContent()).toMatch(/λ = \d\.\d{3}/);
  // The seam governs: the drawn surface along it, and the surface the search finds, are clearly
  // below the critical circle.
  expect(surface).toBeLessThan(circle * 0.9);
  const searched = await fsOf(page, "method-searched-spencer");
  expect(searched).toBeLessThan((await fsOf(page, "method-circle-spencer")) * 0.9);
  await page.getByTestId("thrust-key").waitFor();
  return { surface, circle, searched };
}

describe("a slip surface drawn along a weak seam", () => {
  test("draw, run, and read four methods side by side with the line of thrust", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "rigorous-surface", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("link", { name: /Spoil bank over a clay seam/ }).click();
      await page.waitForURL(/\/sections\/\d+$/);
      await page.getByRole("link", { name: "New run" }).click();
      await page.getByTestId("run-setup-form").waitFor();
      await page.getByLabel("Spencer's method").check();
      await page.getByLabel("Morgenstern–Price").check();
      await page.getByLabel("Morgenstern–Price interslice function").selectOption("half-sine");
      await page.getByLabel("Circles, then surfaces of any shape").check();

      await page.getByRole("button", { name: "Draw on the section" }).click();
      await page.waitForSelector('[data-testid="run-canvas"][data-mode="drawing"]');
      // Starts on the crest (snapped to the ground), two bends on the seam, ends above the ground.
      await clickWorld(page, "run-canvas", 37, 18.5);
      await clickWorld(page, "run-canvas", 48, 6.2);
      await clickWorld(page, "run-canvas", 72, 6.2);
      await clickWorld(page, "run-canvas", 80, 9.5);
      const accepted = page.getByTestId("surface-accepted");
      await accepted.waitFor();
      expect(await accepted.textContent()).toMatch(/from \(37\.\d\d, 20\.00\) m to \(80\.\d\d, 8\.00\) m/);
      await page.getByRole("button", { name: "Done drawing" }).click();

      await page.getByRole("button", { name: "Run the search" }).click();
      await page.getByTestId("search-progress").waitFor();
      await page.getByTestId("search-outcome").waitFor({ timeout: 90_000 });
      const preview = await sideBySide(page);

      await page.getByLabel("Name of the run").fill("Seam surface drawn in the browser");
      await page.getByRole("button", { name: "Keep this run" }).click();
      await page.waitForURL(/\/runs\/\d+$/);
      const kept = await sideBySide(page);
      // The server computed the same factors as the browser's preview.
      expect(kept).toEqual(preview);
      await page.getByTestId("interslice-table").locator("summary").click();
      expect(await page.getByTestId("interslice-row").count()).toBeGreaterThan(10);
      expect(await page.getByTestId("rigorous-warnings").count()).toBe(1);
    });
    expect(errors).toEqual([]);
    await page.close();
  }, 180_000);

  test("a surface that stops inside the soil gets the engine's reason beside the drawing, and no factor", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    await keepScreenshotOnFailure(page, "rigorous-surface-refused", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("link", { name: /Spoil bank over a clay seam/ }).click();
      await page.getByRole("link", { name: "New run" }).click();
      await page.getByTestId("run-setup-form").waitFor();
      await page.getByLabel("Points x,y (m), upper end first or last").fill("37,20 48,6.2 72,6.2 76,6.5");
      await page.getByRole("button", { name: "Use these points" }).click();
      const refused = page.getByTestId("surface-refused");
      await refused.waitFor();
      expect(await refused.textContent()).toMatch(/ground/i);
      await page.getByRole("button", { name: "Run the search" }).click();
      // No search runs for a refused surface.
      await page.waitForTimeout(500);
      expect(await page.getByTestId("search-outcome").count()).toBe(0);
    });
    await page.close();
  }, 120_000);
});
