import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, signInAs, watchConsole } from "../support/browser";
import { steepestPassingRatio } from "@/lib/design";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("slope design as a new designer would use it", () => {
  test("from the demo embankment's numbers to a recommended pair of face slopes, with the evidence", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = watchConsole(page);
    await signInAs(page, "designer@scarpline.test");
    await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
    await page.getByRole("heading", { name: "Sections" }).waitFor();
    await page.goto(page.url() + "/design");

    await page.getByLabel("New study name").fill("Browser sweep of the demo embankment");
    await page.getByRole("button", { name: "Start study" }).click();
    await page.waitForURL(/\/design\/\d+$/);

    // The defaults are the demo embankment's dimensions, and the section is drawn with its line.
    expect(await page.getByLabel("Crest elevation (m)").inputValue()).toBe("18");
    expect(await page.getByLabel("Upstream slope (H:1V)").inputValue()).toBe("3");
    expect(await page.getByLabel("Downstream slope (H:1V)").inputValue()).toBe("2.5");
    await page.getByTestId("run-canvas").waitFor();
    await expect.poll(() => page.getByTestId("seepage-normal").textContent()).toContain("Piping: no unprotected exit");
    await expect
      .poll(() => page.getByTestId("compaction-spec").textContent())
      .toMatch(/dry density ≥ \d\.\d{3} Mg\/m³/);

    const started = Date.now();
    await page.getByRole("button", { name: "Sweep slopes" }).click();
    await page.getByTestId("recommendation").waitFor({ timeout: 60_000 });
    await expect
      .poll(() => page.getByTestId("sweep-timing").textContent(), { timeout: 60_000 })
      .toMatch(/in this browser with \d worker/);
    // The server ran the same sweep when keeping it and found the browser's values (no difference noted).
    expect(await page.getByTestId("sweep-timing").textContent()).not.toMatch(/differed|Not kept/);
    const seconds = (Date.now() - started) / 1000;
    console.log(`browser sweep of the demo embankment: ${seconds.toFixed(1)} s`);

    // Read the table and apply the rule independently of the page: n* per case, the flattest per face.
    const rows = await page.getByTestId("sweep-row").evaluateAll((els) =>
      els.map((e) => ({
        caseKey: e.getAttribute("data-case")!,
        ratio: Number(e.getAttribute("data-ratio")),
        fs: e.getAttribute("data-fs") ? Number(e.getAttribute("data-fs")) : null,
      })),
    );
    expect(rows).toHaveLength(27);
    const required = { "steady-seepage": 1.5, "drawdown-storage": 1.3, "drawdown-surcharge": 1.1 } as const;
    const nStar = (k: keyof typeof required) =>
      steepestPassingRatio(
        rows.filter((r) => r.caseKey === k),
        required[k],
      );
    const downstream = nStar("steady-seepage");
    const upstream = Math.max(nStar("drawdown-storage") ?? Infinity, nStar("drawdown-surcharge") ?? Infinity);

    const shownUp = Number(await page.getByTestId("recommended-upstream").getAttribute("data-ratio"));
    const shownDown = Number(await page.getByTestId("recommended-downstream").getAttribute("data-ratio"));
    expect(shownDown).toBe(downstream);
    expect(shownUp).toBe(upstream);
    // The demo's faces (3:1 and 2.5:1) fall short of 1.3 and 1.5, so both recommendations are flatter.
    expect(shownUp).toBeGreaterThan(3);
    expect(shownDown).toBeGreaterThan(2.5);
    await expect.poll(() => page.getByTestId("pair-fill").textContent()).toMatch(/Rechecked as a pair/);
    await page.getByTestId("fs-ratio-chart").getByRole("img").first().waitFor();
    await page.getByTestId("caution").first().waitFor();

    // The evidence behind the downstream choice opens as a saved run with its canvas.
    await page
      .getByRole("button", {
        name: `Open Downstream, long-term steady seepage (normal pool) at ${shownDown.toFixed(2)}:1 as a saved run`,
      })
      .click();
    await page.waitForURL(/\/runs\/\d+$/, { timeout: 30_000 });
    await page.getByTestId("run-canvas").waitFor();
    expect(errors).toEqual([]);
    await page.close();
  }, 150_000);
});
