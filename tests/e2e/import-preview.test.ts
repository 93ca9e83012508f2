import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { appUrl, keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";

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

describe("importing a new section from files", () => {
  test("the imported section is drawn, with its region names from the CSV, before it is created", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "import-preview", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).first().click();
      await page.getByRole("link", { name: "New section" }).click();
      const name = `Imported bank ${Date.now()}`;
      await page.getByLabel("Name").fill(name);
      await page.getByLabel("Import files").check();
      await page.getByTestId("import-input").setInputFiles(DEMO_FILES);
      await expect.poll(() => page.getByTestId("drop-preview").count()).toBe(3);
      expect(await page.getByTestId("import-preview").count()).toBe(0);
      await page.getByTestId("import-apply").click();

      // The drawing shows every region under the name the geometry CSV gave it (public/demo/demo-geometry.csv).
      const preview = page.getByTestId("import-preview");
      await preview.waitFor();
      const text = await preview.textContent();
      for (const region of ["embankment-fill", "foundation", "bedrock", "toe-drain"]) expect(text).toContain(region);
      expect(text).toContain("Compacted clay fill");
      expect(await preview.locator("polygon").count()).toBe(4);
      expect(await preview.locator("polyline").count()).toBe(1);
      await page.screenshot({ path: "test-results/import-preview.png", fullPage: true });

      await page.getByRole("button", { name: "Create section" }).click();
      await page.getByTestId("section-editor").waitFor();
      const sectionUrl = page.url();
      const res = await page.request.get(appUrl(`/api${new URL(sectionUrl).pathname}`));
      const body = await res.json();
      const names = body.document.regions.map((r: { name?: string }) => r.name).sort();
      expect(names).toEqual(["bedrock", "embankment-fill", "foundation", "toe-drain"]);
    });
    expect(errors).toEqual([]);
    await page.close();
  });
});
