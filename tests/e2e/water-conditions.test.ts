import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { worldToScreen } from "../support/canvas";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Whether the run canvas shows water (a blue-dominant pixel on any layer) at a world point (m). */
async function waterAt(page: Page, x: number, y: number): Promise<boolean> {
  const p = await worldToScreen(page, "run-canvas", x, y);
  return page.evaluate(
    ({ sx, sy }) => {
      const root = document.querySelector('[data-testid="run-canvas"]')!;
      for (const canvas of Array.from(root.querySelectorAll("canvas"))) {
        const r = canvas.getBoundingClientRect();
        const k = canvas.width / r.width;
        const ctx = canvas.getContext("2d");
        if (!ctx) continue;
        const [red, , blue, alpha] = ctx.getImageData(
          Math.round((sx - r.left) * k),
          Math.round((sy - r.top) * k),
          1,
          1,
        ).data;
        if (alpha > 40 && blue > red + 25) return true;
      }
      return false;
    },
    { sx: p.x, sy: p.y },
  );
}

async function runAndKeep(page: Page, condition: string, title: string): Promise<void> {
  await page.getByRole("link", { name: /Main embankment/ }).click();
  await page.getByRole("link", { name: "New run" }).click();
  await page.getByTestId("run-setup-form").waitFor();
  await page.getByLabel("Loading condition").selectOption({ label: condition });
  await page.getByLabel("Upstream face").check();
  await page.getByRole("button", { name: "Place for this face" }).click();
  await page.getByLabel("Columns").fill("8");
  await page.getByLabel("Rows").fill("8");
  await page.getByLabel(/Count/).fill("6");
  await page.getByRole("button", { name: "Run the search" }).click();
  await page.getByTestId("search-outcome").waitFor({ timeout: 60_000 });
  await page.getByLabel("Name of the run").fill(title);
  await page.getByRole("button", { name: "Keep this run" }).click();
  await page.waitForURL(/\/runs\/\d+$/);
  await page.getByTestId("fs-summary").waitFor();
  await page.waitForSelector('[data-testid="run-canvas"][data-view] canvas');
}

describe("water per loading condition", () => {
  test("a drawdown run of the demo dam draws the lowered pool; end of construction has no reservoir", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "water-conditions", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.waitForURL(/\/projects\/\d+$/);
      const projectUrl = page.url();

      await page.getByRole("link", { name: /Main embankment/ }).click();
      await page.getByRole("link", { name: "New run" }).click();
      await page.getByTestId("run-setup-form").waitFor();
      await page.getByLabel("Loading condition").selectOption({ label: "Rapid drawdown from the normal pool" });
      // The loading condition proposes its usual water and the pools it drains between.
      expect(await page.getByTestId("water-condition").inputValue()).toBe("drawdown-storage");
      expect(await page.getByLabel("Pool before").inputValue()).toBe("16");
      expect(await page.getByLabel("Pool after").inputValue()).toBe("8");
      await page.screenshot({ path: "test-results/water-run-form-drawdown.png" });
      await page.goto(projectUrl);

      await runAndKeep(page, "Rapid drawdown from the normal pool", "Upstream, drawdown 16 to 8 m");
      expect(await page.getByTestId("run-water").textContent()).toContain("Rapid drawdown, 16.0 m to 8.0 m");
      // Over the reservoir (x = 5 m, ground at 6.0 m) water stands to the lowered pool (8.0 m), not to 16.0 m.
      expect(await waterAt(page, 5, 7)).toBe(true);
      expect(await waterAt(page, 5, 12)).toBe(false);
      expect(await page.getByTestId("run-canvas-key").textContent()).toContain("line before drawdown (not analysed)");
      await page.screenshot({ path: "test-results/water-run-drawdown.png", fullPage: true });

      await page.goto(projectUrl);
      await runAndKeep(page, "End of construction", "Upstream, end of construction");
      expect(await page.getByTestId("run-water").textContent()).toMatch(/End of construction, no reservoir/);
      expect(await waterAt(page, 5, 7)).toBe(false);
      expect(await waterAt(page, 5, 12)).toBe(false);
      await page.screenshot({ path: "test-results/water-run-end-of-construction.png", fullPage: true });
    });
    expect(errors).toEqual([]);
    await page.close();
  });

  test("the editor shows each water condition and edits the one chosen", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1100 } });
    await keepScreenshotOnFailure(page, "water-editor", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("link", { name: /Main embankment/ }).click();
      await page.getByTestId("water-conditions-panel").waitFor();
      const shown = page.getByTestId("water-condition-shown");
      expect(await shown.locator("option").count()).toBe(5);
      await shown.selectOption("end-of-construction");
      expect(await page.getByTestId("water-condition-pools").textContent()).toContain(
        "Pool on the left none, on the right none",
      );
      expect(await page.getByTestId("water-condition-kind").inputValue()).toBe("construction");
      await shown.selectOption("drawdown-surcharge");
      expect(await page.getByTestId("water-condition-drawdown-to").inputValue()).toBe("8");
      expect(await page.getByTestId("water-condition-pools").textContent()).toContain("Pool on the left 17.00 m");
      await page.getByTestId("water-conditions-panel").screenshot({ path: "test-results/water-editor-panel.png" });
      await page.screenshot({ path: "test-results/water-editor.png", fullPage: true });
    });
    await page.close();
  });
});
