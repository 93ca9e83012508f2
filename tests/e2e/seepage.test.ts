import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { runSeepage } from "@/lib/seepage";
import { toEngineMaterial } from "@/lib/materials/engine-material";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import { waterConditionsOf } from "@/lib/sections/water-conditions";
import { buildSeepageDocument } from "@/lib/section-seepage/document";
import {
  CORE_PERMEABILITY_SET,
  ZONED_DAM_NAME,
  ZONED_MATERIALS,
  ZONED_SEEPAGE_SETTINGS,
  buildZonedDamSection,
} from "@/db/seeds/demo-zoned-dam";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** "2.23 × 10⁻⁶" back to a number. */
function readSci(text: string): number {
  const m = /(-?\d+(?:\.\d+)?) × 10([⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)/.exec(text);
  if (!m) throw new Error(`no value in "${text}"`);
  const digits: Record<string, string> = { "⁻": "-", "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4" };
  Object.assign(digits, { "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9" });
  return Number(m[1]) * 10 ** Number([...m[2]].map((c) => digits[c]).join(""));
}

/** The same solve in Node, from the seed's own inputs: the browser must show what the solver gives. */
function expectedSolution() {
  const o = checkAndDeriveLabTest("permeability", CORE_PERMEABILITY_SET.data);
  if (!o.ok || o.record.kind !== "permeability") throw new Error("demo set");
  const coreK = Number(o.record.result.k.toPrecision(2));
  const section = buildZonedDamSection(ZONED_MATERIALS.map((m) => toEngineMaterial(m)));
  const lib = ZONED_MATERIALS.map((m) => {
    const p = m.parameters as { k?: number; kRatio?: number };
    return { key: m.key, name: m.name, k: m.key === "core" ? coreK : p.k, kRatio: p.kRatio };
  });
  const built = buildSeepageDocument(section, waterConditionsOf(section)[0], lib, ZONED_SEEPAGE_SETTINGS);
  if (!built.ok) throw new Error("demo document");
  const run = runSeepage(built.document);
  if (!run.ok) throw new Error("demo solve");
  return run.solution;
}

describe("seepage view", () => {
  test("the demo zoned dam's flow net: q per metre and along the crest, exits with piping factors", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1100 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "seepage-view", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("link", { name: ZONED_DAM_NAME }).click();
      await page.getByRole("link", { name: "Seepage and flow net" }).click();
      await page.waitForURL(/\/seepage/);

      // The core's kh comes from its falling-head set; every pervious zone has a kh.
      const core = page.locator('[data-testid="conductivity-table"] tr[data-material="core"]');
      expect(await core.textContent()).toMatch(/permeability set #\d+/);
      expect(await page.getByTestId("conductivity-table").textContent()).not.toContain("not set");
      expect(await page.locator("[data-pool]").count()).toBe(2);
      expect(await page.locator("[data-drain]").count()).toBe(1);

      await page.getByTestId("seepage-solve").click();
      await page.getByTestId("seepage-results").waitFor({ timeout: 90_000 });
      await page.screenshot({ path: "test-results/seepage-zoned-dam-head.png", fullPage: true });

      const expected = expectedSolution();
      const q = readSci((await page.getByTestId("seepage-q").textContent())!);
      expect(Math.abs(q / expected.q - 1)).toBeLessThan(0.01);
      const qTotal = readSci((await page.getByTestId("seepage-q-total").textContent())!);
      expect(Math.abs(qTotal / (q * 320) - 1)).toBeLessThan(0.01);
      const exitI = Number(await page.getByTestId("exit-i").first().textContent());
      expect(exitI).toBeCloseTo(expected.exitGradients[0].i, 3);
      expect(await page.locator("#exit-gradients, [data-testid=exit-gradients]").textContent()).toMatch(/F piping/);
      expect(await page.getByTestId("flow-net-check").first().textContent()).toMatch(/Nf = \d+ channels, Nd = 12/);
      expect(await page.locator('[data-layer="flow-lines"] path').count()).toBeGreaterThanOrEqual(3);
      expect(await page.locator('[data-layer="equipotentials"] path').count()).toBeGreaterThan(5);
      expect(await page.getByTestId("caution").count()).toBeGreaterThan(0);

      await page.getByLabel("Colour the section by").selectOption("pressure");
      await page.getByLabel("Show the mesh").check();
      expect(await page.locator('[data-layer="mesh"][data-colour="pressure"] path').count()).toBe(
        expected.mesh.elements,
      );
      await page.screenshot({ path: "test-results/seepage-zoned-dam-pressure-mesh.png", fullPage: true });

      // The drain tool: two clicks on the drawing add a drain to the coordinates.
      await page.getByRole("button", { name: "Draw a drain" }).click();
      const svg = page.getByTestId("flow-net-svg");
      const box = (await svg.boundingBox())!;
      // Below the drawing's foot is outside the section: refused. Mid-height is in the dam.
      await svg.click({ position: { x: box.width * 0.5, y: box.height - 3 } });
      await page.getByText("is not in pervious material").waitFor();
      await svg.click({ position: { x: box.width * 0.45, y: box.height * 0.55 } });
      await svg.click({ position: { x: box.width * 0.5, y: box.height * 0.55 } });
      await page.getByRole("button", { name: "Add this drain" }).click();
      expect((await page.getByLabel(/^Drains/).inputValue()).split("\n")).toHaveLength(2);
      expect(await page.locator("[data-drain]").count()).toBe(2);

      // A fine mesh takes a while: the progress shows the free-surface rounds, and Cancel stops it.
      await page.getByLabel("Element size").fill("0.4");
      await page.getByTestId("seepage-solve").click();
      await page.getByTestId("seepage-progress").waitFor();
      await page.getByRole("button", { name: "Cancel" }).click();
      await page.getByText("Solve cancelled; nothing was kept.").waitFor();

      // The core's kh traced to its falling-head set in the library.
      await page.locator('tr[data-material="core"]').getByRole("link", { name: "edit in the library" }).click();
      await page.waitForURL(/\/materials\/\d+$/);
      await page.getByText("kh, geometric mean").first().waitFor();
      expect(await page.locator("body").textContent()).toContain("Craig's Soil Mechanics");
      await page.screenshot({ path: "test-results/seepage-core-permeability-set.png", fullPage: true });
      expect(errors).toEqual([]);
    });
    await page.close();
  });

  test("a section whose materials have no kh says which and where to set it, before any solve", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "seepage-no-k", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.getByRole("link", { name: /Main embankment/ }).click();
      await page.getByRole("link", { name: "Seepage and flow net" }).click();
      await page.getByTestId("seepage-solve").click();
      await page.getByText("has no hydraulic conductivity kh").first().waitFor();
      expect(await page.locator("body").textContent()).toMatch(/Material 'fill' \(Compacted clay fill\) has no/);
      expect(await page.getByTestId("seepage-results").count()).toBe(0);
      expect(errors).toEqual([]);
    });
    await page.close();
  });
});
