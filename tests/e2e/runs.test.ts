import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function runAndKeep(page: Page, title: string, denseGrid: boolean): Promise<void> {
  await page.getByRole("link", { name: "New run" }).click();
  await page.getByTestId("run-setup-form").waitFor();
  if (denseGrid) {
    // A dense grid keeps the search busy long enough to watch its progress.
    await page.getByLabel("Columns").fill("60");
    await page.getByLabel("Rows").fill("60");
    await page.getByLabel(/Count/).fill("20");
  }
  await page.getByRole("button", { name: "Run the search" }).click();
  if (denseGrid) await page.getByTestId("search-progress").waitFor();
  await page.getByTestId("search-outcome").waitFor({ timeout: 60_000 });
  const drawn = JSON.parse((await page.getByTestId("run-canvas").getAttribute("data-critical")) ?? "[]") as {
    method?: string;
    fs?: number;
  }[];
  expect(drawn.map((c) => c.method)).toEqual(expect.arrayContaining(["bishop", "fellenius"]));
  expect(drawn.every((c) => typeof c.fs === "number" && c.fs > 0.5 && c.fs < 5)).toBe(true);
  const previewFacts = await summaryFacts(page);
  await page.getByLabel("Name of the run").fill(title);
  await page.getByRole("button", { name: "Keep this run" }).click();
  await page.waitForURL(/\/runs\/\d+$/);
  await page.getByTestId("fs-summary").waitFor();
  // The server ran the same search and kept its own result: the browser's preview matched it
  // exactly (no notice), and the kept run states the same warnings, set-aside circles and least mα.
  expect(await page.getByTestId("preview-notice").count()).toBe(0);
  expect(await summaryFacts(page)).toEqual(previewFacts);
  expect(previewFacts.join("\n")).toMatch(/Least mα\s*\d\.\d{3}/);
}

/** What the results panel says beside the FS: warnings with their codes, critical circles, circle counts. */
async function summaryFacts(page: Page): Promise<string[]> {
  const summary = page.getByTestId("fs-summary");
  const warnings = await summary
    .locator("[data-code]")
    .evaluateAll((els) => els.map((e) => `${e.getAttribute("data-code")}: ${e.textContent}`));
  const circles = await summary
    .locator("[data-testid^='critical-'], [data-testid='fs-summary-circles']")
    .allTextContents();
  return [...warnings, ...circles];
}

describe("runs", () => {
  test("an engineer checks the downstream face, reads the slices, runs a flatter variant and compares the two", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "runs-flow", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("link", { name: /Main embankment/ }).click();
      await page.waitForURL(/\/sections\/\d+$/);
      const sectionUrl = page.url();
      await runAndKeep(page, "Downstream, steady seepage, as drawn", true);

      // The slice table sorts by a column and offers its CSV.
      const table = page.getByTestId("slice-table");
      await table.waitFor();
      const weightHeader = table.getByRole("columnheader", { name: /Weight/ });
      await weightHeader.getByRole("button").click();
      expect(await weightHeader.getAttribute("aria-sort")).toMatch(/ascending|descending/);
      expect(await page.getByTestId("slice-csv-download").count()).toBe(1);
      expect(await page.getByTestId("caution").count()).toBeGreaterThan(0);

      // Flatter downstream face: pull the crest's downstream corner back from x = 62 to 59.
      await page.goto(sectionUrl);
      await page.getByTestId("editor-canvas").waitFor();
      const { clickWorld } = await import("../support/canvas");
      await clickWorld(page, "editor-canvas", 40, 9);
      const x = page.getByTestId("vertex-x-4");
      await x.fill("59");
      await x.press("Enter");
      await page.getByTestId("save-version").click();
      await expect.poll(() => page.getByTestId("form-ok").textContent()).toMatch(/version 2/);
      await expect.poll(() => page.getByTestId("version-list").textContent()).toMatch(/v2\s*current/);
      await runAndKeep(page, "Downstream, steady seepage, flatter face", false);

      // Compare the two from the runs list.
      await page.getByRole("link", { name: "Runs" }).first().click();
      await page.getByTestId("runs-table").waitFor();
      await page.getByLabel("Pick Downstream, steady seepage, as drawn to compare").check();
      await page.getByLabel("Pick Downstream, steady seepage, flatter face to compare").check();
      await page.getByTestId("compare-button").click();
      await page.getByTestId("compare-table").waitFor();
      const compare = await page.getByTestId("compare-table").textContent();
      expect(compare).toContain("as drawn");
      expect(compare).toContain("flatter face");
      const overlays = JSON.parse((await page.getByTestId("run-canvas").getAttribute("data-critical")) ?? "[]");
      expect(overlays).toHaveLength(2);
      await expect
        .poll(() => page.getByTestId("input-diff").first().textContent())
        .toMatch(/Embankment fill: 1 point moved/);
    });
    expect(errors).toEqual([]);
    await page.close();
  });
});
