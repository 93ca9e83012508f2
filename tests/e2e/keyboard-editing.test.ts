import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { appUrl, keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import type { SectionDocument } from "@/lib/stability";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Presses Tab until the drawing has the focus: it must be reachable in the page's tab order. */
async function tabToDrawing(page: Page) {
  for (let i = 0; i < 80; i++) {
    await page.keyboard.press("Tab");
    const at = await page.evaluate(() => (document.activeElement as HTMLElement | null)?.dataset.testid);
    if (at === "editor-canvas") return;
  }
  throw new Error("Tab never reached the section drawing");
}

// Every pointer action has a keyboard path (WCAG 2.2, success criterion 2.1.1 Keyboard) and the
// focus is visible (2.4.7 Focus Visible). The section is the app's own starter bank.
describe("editing a section with the keyboard alone", () => {
  test("an engineer chooses a vertex, moves it, types its coordinates, undoes, and saves", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "keyboard-editing", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("link", { name: "New section" }).click();
      await page.getByLabel("Name").fill(`Keyboard-drawn bank ${Date.now()}`);
      await page.getByLabel("Name").press("Enter");
      await page.getByTestId("section-editor").waitFor();
      await page.waitForSelector("[data-testid='editor-canvas'][data-view]");

      await tabToDrawing(page);
      // The drawing shows a focus ring (a box shadow) while it has the focus.
      const ring = await page.getByTestId("editor-canvas").evaluate((el) => getComputedStyle(el).boxShadow);
      expect(ring).not.toBe("none");

      // Tab: region 1 (base), region 2 (bank); Up picks the bank's highest vertex, the crest corner (34, 8).
      await page.keyboard.press("Tab");
      await page.keyboard.press("Tab");
      await expect.poll(() => page.getByTestId("editor-chosen").textContent()).toMatch(/^Region 2 /);
      await page.keyboard.press("ArrowUp");
      await expect
        .poll(() => page.getByTestId("editor-chosen").textContent())
        .toContain("vertex 5 of 6: x 34.00 m, elevation 8.00 m");
      // Two grid steps of 0.5 m to the right.
      await page.keyboard.press("ArrowRight");
      await page.keyboard.press("ArrowRight");
      await expect.poll(() => page.getByTestId("editor-chosen").textContent()).toContain("x 35.00 m, elevation 8.00 m");

      // Enter opens the coordinates: type x, Tab to the elevation, type it, then undo the elevation.
      await page.keyboard.press("Enter");
      await expect
        .poll(() => page.evaluate(() => document.activeElement?.getAttribute("data-testid")))
        .toBe("vertex-x-4");
      await page.keyboard.type("36");
      await page.keyboard.press("Enter");
      await page.keyboard.press("Tab");
      await page.keyboard.type("8.5");
      await page.keyboard.press("Enter");
      await expect.poll(() => page.getByTestId("editor-chosen").textContent()).toContain("x 36.00 m, elevation 8.50 m");
      await page.keyboard.press("Escape");
      await expect
        .poll(() => page.evaluate(() => document.activeElement?.getAttribute("data-testid")))
        .toBe("editor-canvas");
      await page.keyboard.press("Control+z");
      await expect.poll(() => page.getByTestId("editor-chosen").textContent()).toContain("x 36.00 m, elevation 8.00 m");

      // "?" lists the shortcuts.
      await page.keyboard.press("?");
      await expect.poll(() => page.getByTestId("shortcut-help").textContent()).toContain("Tab / Shift+Tab");
      // Kept for reading: the focus ring, the chosen vertex and the shortcut list.
      await page.screenshot({ path: "test-results/keyboard-editing-help.png", fullPage: true });
      await page.keyboard.press("Escape");

      await page.getByTestId("save-version").focus();
      await page.keyboard.press("Enter");
      await expect.poll(() => page.getByTestId("form-ok").textContent()).toMatch(/version 2/);

      // The saved geometry, read back from the server: only the crest corner moved.
      const [, projectId, sectionId] = /\/projects\/(\d+)\/sections\/(\d+)/.exec(page.url())!;
      const res = await page.request.get(appUrl(`/api/projects/${projectId}/sections/${sectionId}`));
      const saved = ((await res.json()) as { document: SectionDocument }).document;
      expect(saved.regions[1].points).toEqual([
        [10, 0],
        [60, 0],
        [60, 4],
        [42, 4],
        [36, 8],
        [26, 8],
      ]);
      expect(saved.regions[0].points).toEqual([
        [0, -2],
        [60, -2],
        [60, 0],
        [0, 0],
      ]);
    });
    expect(errors).toEqual([]);
    await page.close();
  });
});
