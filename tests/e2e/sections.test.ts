import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { appUrl, keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { clickWorld } from "../support/canvas";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const DEMO_FILES = ["demo-materials.csv", "demo-geometry.csv", "demo-phreatic.csv"].map((f) =>
  path.resolve(__dirname, "../../public/demo", f),
);

async function openDemoProject(page: Page) {
  await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
  await page.getByRole("heading", { name: "Sections" }).waitFor();
}

describe("drawing and importing a section", () => {
  test("an engineer draws a region, imports the demo CSVs, fixes what the checks show, saves, and finds each version again", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "sections-draw-import", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await openDemoProject(page);
      await page.getByRole("link", { name: "New section" }).click();
      await page.getByLabel("Name").fill("Trial bank, drawn in the browser");
      await page.getByRole("button", { name: "Create section" }).click();
      await page.getByTestId("section-editor").waitFor();

      // Draw a wedge on the bank's right-hand bench (the starter's ground is at y = 4 from x = 42 to 60).
      await page.getByTestId("tool-region").click();
      await clickWorld(page, "editor-canvas", 42, 4);
      await clickWorld(page, "editor-canvas", 60, 4);
      await clickWorld(page, "editor-canvas", 60, 6);
      await page.keyboard.press("Enter");
      await expect.poll(() => page.getByTestId("issue-list").textContent()).toMatch(/No problems/);
      await page.getByTestId("save-version").click();
      await expect.poll(() => page.getByTestId("form-ok").textContent()).toMatch(/version 2/);
      await expect.poll(() => page.getByTestId("version-list").textContent()).toMatch(/v2\s*current/);

      // Import the demo files: every file previews clean, then applies to the drawing.
      await page.getByTestId("import-input").setInputFiles(DEMO_FILES);
      await expect.poll(() => page.getByTestId("drop-preview").count()).toBe(3);
      await page.getByTestId("import-apply").click();

      // Break the fill's crest on purpose by typing a coordinate, see the check, then mend it.
      await page.getByTestId("tool-select").click();
      await clickWorld(page, "editor-canvas", 40, 9);
      await page.getByTestId("vertex-table").waitFor();
      const rows = await page.getByTestId("vertex-table").locator("input[data-testid^='vertex-y-']").count();
      expect(rows).toBe(6);
      const crestY = page.getByTestId("vertex-y-4");
      await crestY.fill("2");
      await crestY.press("Enter");
      await expect.poll(() => page.getByTestId("issue-list").textContent()).not.toMatch(/No problems/);
      expect(await page.getByTestId("save-version").isDisabled()).toBe(true);
      await crestY.fill("18");
      await crestY.press("Enter");
      await expect.poll(() => page.getByTestId("issue-list").textContent()).toMatch(/No problems/);
      await page.getByLabel("What changed (optional)").fill("Replaced by the demo files");
      await page.getByTestId("save-version").click();
      await expect.poll(() => page.getByTestId("form-ok").textContent()).toMatch(/version 3/);

      // Reopen: the current version holds the imported section; version 2 opens read-only.
      await page.reload();
      await expect
        .poll(() => page.getByTestId("version-list").textContent())
        .toMatch(/v3.*current.*Replaced by the demo files/s);
      await page.getByTestId("version-list").getByRole("link", { name: "Open read-only" }).first().click();
      await expect.poll(() => page.getByTestId("version-meta").textContent()).toMatch(/Read-only/);
      expect(await page.getByTestId("save-version").count()).toBe(0);
    });
    expect(errors).toEqual([]);
    await page.close();
  });

  test("a bad CSV shows each problem with its row and column and changes nothing", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    await signInAs(page, "engineer@scarpline.test");
    await openDemoProject(page);
    await page.getByRole("link", { name: /Main embankment/ }).click();
    await page
      .getByTestId("import-input")
      .setInputFiles({
        name: "broken-geometry.csv",
        mimeType: "text/csv",
        buffer: Buffer.from("region,material,x,y\nbank,fill,0,0\nbank,,twelve,0\nbank,,6,4\n"),
      });
    await expect.poll(() => page.getByTestId("import-problems").textContent()).toMatch(/Row 3, column x/);
    expect(await page.getByTestId("import-apply").isDisabled()).toBe(true);
    expect(await page.getByTestId("save-version").isDisabled()).toBe(true);
    await page.close();
  });
});
