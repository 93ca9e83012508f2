/**
 * In Chromium: the demo zoned dam's kept run took its pore pressures from the seepage solution and
 * says so beside its FS, and a new run set to "pore pressures from the seepage solution" searches in
 * the browser (the one orchestrator in its worker) and keeps a run the server computed alike.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { ZONED_DAM_NAME } from "@/db/seeds/demo-zoned-dam";
import { ZONED_RUN_TITLE } from "@/db/seeds/demo-zoned-run";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** "2.23 × 10⁻⁶" in a text back to a number. */
function readSci(text: string): number {
  const m = /(\d+(?:\.\d+)?) × 10([⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)/.exec(text);
  if (!m) throw new Error(`no value in "${text}"`);
  const sup = "⁰¹²³⁴⁵⁶⁷⁸⁹";
  const exp = [...m[2]].map((c) => (c === "⁻" ? "-" : String(sup.indexOf(c)))).join("");
  return Number(m[1]) * 10 ** Number(exp);
}

describe("a run on the seepage solution, and the pools it starts from", () => {
  test("the zoned dam's kept run shows its FS and where its pore pressures came from; a new one runs alike", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1100 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "seepage-run", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.waitForURL(/\/projects\/\d+$/);
      const projectUrl = page.url();

      await page.goto(`${projectUrl}/runs`);
      await page.getByRole("link", { name: ZONED_RUN_TITLE }).click();
      await page.waitForURL(/\/runs\/\d+$/);
      await page.getByTestId("fs-summary").waitFor();
      const fs = Number(await page.getByTestId("fs-value-bishop").textContent());
      // c' = 0 shells at 2.5H:1V with φ' 37° on sand: a critical FS between 1 and 2.5 (common practice range).
      expect(fs).toBeGreaterThan(1);
      expect(fs).toBeLessThan(2.5);
      expect(await page.getByTestId("run-water").textContent()).toContain("pore pressures from its seepage solution");
      const source = (await page.getByTestId("run-water-seepage").textContent())!;
      expect(source).toContain("finite-element seepage solution");
      // The seepage view's q for this dam (tests/e2e/seepage.test.ts): about 2.2 × 10⁻⁶ m³/s per metre.
      const q = readSci(source);
      expect(q).toBeGreaterThan(1.5e-6);
      expect(q).toBeLessThan(3e-6);
      await page.screenshot({ path: "test-results/seepage-run-kept.png", fullPage: true });

      // A new run on the same water, now from the seepage solution, searched in the browser and kept.
      await page.goto(projectUrl);
      await page.getByRole("link", { name: ZONED_DAM_NAME }).click();
      await page.getByRole("link", { name: "New run" }).click();
      await page.getByTestId("run-setup-form").waitFor();
      await page.getByTestId("water-from-seepage").check();
      await page.getByLabel("Columns").fill("6");
      await page.getByLabel("Rows").fill("6");
      await page.getByLabel(/Count/).fill("5");
      await page.getByRole("button", { name: "Run the search" }).click();
      await page.getByTestId("search-outcome").waitFor({ timeout: 90_000 });
      await page.getByLabel("Name of the run").fill("Downstream, seepage water, browser check");
      await page.getByRole("button", { name: "Keep this run" }).click();
      await page.waitForURL(/\/runs\/\d+$/);
      await page.getByTestId("fs-summary").waitFor();
      expect(Number(await page.getByTestId("fs-value-bishop").textContent())).toBeGreaterThan(0);
      expect(await page.getByTestId("run-water-seepage").textContent()).toContain("finite-element seepage solution");
      // The drawing shows the solved phreatic surface and the pool, kept with the result.
      await page.waitForSelector('[data-testid="run-canvas"][data-view] canvas');
      expect(await page.getByTestId("run-canvas-key").textContent()).toContain("phreatic line");
      await page.screenshot({ path: "test-results/seepage-run-new.png", fullPage: true });

      // The pools of the seepage view: the left pool's mark dragged down lowers its level; typed, it follows.
      await page.goto(projectUrl);
      await page.getByRole("link", { name: ZONED_DAM_NAME }).click();
      await page.getByRole("link", { name: "Seepage and flow net" }).click();
      await page.waitForURL(/\/seepage/);
      const handle = page.locator('[data-pool-handle="left"]');
      const box = (await handle.boundingBox())!;
      await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
      await page.mouse.down();
      await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2 + 20, { steps: 5 });
      await page.mouse.up();
      const dragged = Number(await page.locator("#seepage-pool-left").inputValue());
      expect(dragged).toBeLessThan(23);
      expect(dragged).toBeGreaterThan(15);
      expect(await page.locator('[data-pool="left"]').textContent()).toContain(`${dragged.toFixed(2)} m`);
      await page.locator("#seepage-pool-left").fill("21.5");
      expect(await page.locator('[data-pool="left"]').textContent()).toContain("21.50 m");
      expect(await page.getByTestId("seepage-pools").textContent()).toContain("left edge at 21.50 m");
    });
    expect(errors).toEqual([]);
    await page.close();
  });
});
