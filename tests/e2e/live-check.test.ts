/**
 * Live check in Chromium on a copy of the demo embankment: the FS follows a drag of the
 * downstream toe, the badge ends "final" on the newest state, leaving live mode leaves no number
 * on screen, and the kept state run by the server gives the live FS exactly.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import type { SectionDocument } from "@/lib/stability";
import { automaticSetup, setupOnWater } from "@/lib/live/live-setup";
import { drawnConditionId } from "@/lib/sections/water-condition-edits";
import { keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { worldToScreen } from "../support/canvas";
import { quickSetup } from "../support/runs";
import { pdfText } from "../support/pdf-text";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

type Fs = Partial<Record<"bishop" | "fellenius", number>>;

/** The badge once it is final for the newest state the drawing reached. */
async function finalFs(page: Page): Promise<Fs> {
  const badge = page.getByTestId("live-badge");
  await expect
    .poll(
      async () =>
        (await badge.getAttribute("data-state")) === "final" &&
        (await badge.getAttribute("data-answered")) === (await badge.getAttribute("data-generation")),
      { timeout: 30_000 },
    )
    .toBe(true);
  return JSON.parse((await badge.getAttribute("data-fs"))!) as Fs;
}

/** Signs in, copies the demo section (the demo itself is read by other tests and must stay as seeded). */
async function copyOfDemo(page: Page, name: string) {
  await signInAs(page, "engineer@scarpline.test");
  await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
  await page.waitForURL(/\/projects\/\d+$/);
  const { origin, pathname: projectPath } = new URL(page.url());
  const api = `${origin}/api${projectPath}`;
  const sections = (await (await page.request.get(`${api}/sections`)).json()).sections as {
    id: number;
    name: string;
  }[];
  const demo = sections.find((s) => s.name.startsWith("Main embankment"))!;
  const demoDoc = (await (await page.request.get(`${api}/sections/${demo.id}`)).json()).document as SectionDocument;
  const created = await page.request.post(`${api}/sections`, {
    data: { name: `${name} ${Date.now()}`, document: demoDoc },
  });
  expect(created.status()).toBe(201);
  return { origin, projectPath, api, demoDoc, sectionId: (await created.json()).section.id as number };
}

/** Drags a world point to another in small steps, as a hand does. */
async function dragWorld(page: Page, from: [number, number], to: [number, number], steps = 20) {
  const a = await worldToScreen(page, "editor-canvas", from[0], from[1]);
  const b = await worldToScreen(page, "editor-canvas", to[0], to[1]);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  await page.mouse.move(b.x, b.y, { steps });
  await page.mouse.up();
}

describe("live check of a section", () => {
  test("dragging the downstream toe outward raises FS, and the kept state's run matches the live FS", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "live-check", async () => {
      const { origin, projectPath, api, demoDoc, sectionId } = await copyOfDemo(page, "Live check trial");
      await page.goto(`${origin}${projectPath}/sections/${sectionId}`);
      await page.getByTestId("section-editor").waitFor();

      await page.getByRole("button", { name: "Live check" }).click();
      const before = await finalFs(page);
      expect(before.bishop).toBeGreaterThan(1);

      // The demo's downstream toe is at (92, 6) on a 2.5H:1V face; dragged to (98, 6) the face flattens to 3H:1V.
      await dragWorld(page, [92, 6], [98, 6]);
      const after = await finalFs(page);
      // A flatter face stands at a higher factor of safety (common practice).
      expect(after.bishop!).toBeGreaterThan(before.bishop!);

      // Keep the live state as version 2, then have the server run it with the same search set-up.
      await page.getByTestId("live-keep").click();
      await expect.poll(() => page.getByTestId("form-ok").textContent(), { timeout: 30_000 }).toMatch(/version 2/);
      const setup = setupOnWater(demoDoc, automaticSetup(demoDoc), drawnConditionId(demoDoc));
      const run = await page.request.post(`${api}/runs`, {
        data: { sectionId, sectionVersion: 2, title: "Live state kept and run", setup },
      });
      expect(run.status()).toBe(201);
      const runId = (await run.json()).run.id as number;
      const kept = (await (await page.request.get(`${api}/runs/${runId}`)).json()).run as {
        result: { results: Record<"bishop" | "fellenius", { fs: number }> };
      };
      // The same engine code in Chromium and in Node: the two JavaScript engines' Math functions may differ in
      // the last bit (seen: 5e-16 on the ordinary method), so agreement is held at 1e-12 relative, not bit for bit.
      expect(Math.abs(kept.result.results.bishop.fs / after.bishop! - 1)).toBeLessThan(1e-12);
      expect(Math.abs(kept.result.results.fellenius.fs / after.fellenius! - 1)).toBeLessThan(1e-12);

      // Leaving live mode takes the number off the screen, also when a search is still running.
      await page.getByRole("button", { name: "End live check" }).click();
      await expect.poll(() => page.getByTestId("live-badge").count()).toBe(0);
      await page.getByRole("button", { name: "Live check" }).click();
      await page.getByRole("button", { name: "End live check" }).click();
      await page.waitForTimeout(1500);
      expect(await page.getByTestId("live-badge").count()).toBe(0);
      expect(errors).toEqual([]);
    });
    await page.close();
  });

  test("live check follows a surcharge dragged along the crest and a whole region dragged", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "live-parts", async () => {
      const { origin, projectPath, api, demoDoc } = await copyOfDemo(page, "Live parts trial");
      // A 30 kPa strip on the crest (x = 56…62 at 18 m): invented, as a construction load would stand there.
      const loaded = { ...demoDoc, loads: { ...demoDoc.loads, surcharges: [{ x1: 56.5, x2: 59.5, q: 30 }] } };
      const created = await page.request.post(`${api}/sections`, {
        data: { name: `Live parts loaded ${Date.now()}`, document: loaded },
      });
      expect(created.status()).toBe(201);
      const sectionId = (await created.json()).section.id as number;
      await page.goto(`${origin}${projectPath}/sections/${sectionId}`);
      await page.getByTestId("section-editor").waitFor();
      await page.getByRole("button", { name: "Live check" }).click();
      const before = await finalFs(page);
      const badge = page.getByTestId("live-badge");
      const generation = async () => Number(await badge.getAttribute("data-generation"));

      // The band stands just above the crest; dragged to its downstream edge, the load moves over the slip mass.
      const g0 = await generation();
      await dragWorld(page, [58, 18.4], [60.5, 18.4]);
      expect(await generation()).toBeGreaterThan(g0 + 1);
      const moved = await finalFs(page);
      expect(moved.bishop).not.toBe(before.bishop);

      // The whole fill dragged 1 m downstream from inside it (clear of the phreatic line): its shared
      // corners with the foundation and the drain go along, so the section stays whole and is searched as
      // it moves.
      const g1 = await generation();
      await dragWorld(page, [45, 10], [46, 10]);
      expect(await generation()).toBeGreaterThan(g1 + 1);
      const dragged = await finalFs(page);
      expect(dragged.bishop).toBeGreaterThan(0);
      expect(errors).toEqual([]);
    });
    await page.close();
  });

  test("the what-if panel gives the kept FS at the kept values, follows a slider, and resets", async () => {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1100 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "what-if", async () => {
      const { origin, projectPath, api, demoDoc, sectionId } = await copyOfDemo(page, "What-if trial");
      const run = await page.request.post(`${api}/runs`, {
        data: { sectionId, sectionVersion: 1, title: "What-if base run", setup: quickSetup(demoDoc, "downstream") },
      });
      expect(run.status()).toBe(201);
      const runId = (await run.json()).run.id as number;
      const kept = (await (await page.request.get(`${api}/runs/${runId}`)).json()).run as {
        result: { results: Record<"bishop" | "fellenius", { fs: number }> };
      };
      const stored = kept.result.results.bishop.fs;
      await page.goto(`${origin}${projectPath}/runs/${runId}`);
      await page.getByRole("button", { name: "Try other values" }).click();
      const out = page.getByTestId("what-if-fs");
      const finalBishop = async () => {
        await expect.poll(() => out.getAttribute("data-state"), { timeout: 30_000 }).toBe("final");
        return (JSON.parse((await out.getAttribute("data-fs"))!) as Fs).bishop!;
      };
      // At the kept values the browser's search is the kept search: the same number, bit for bit.
      expect(await finalBishop()).toBe(stored);

      // A weaker fill gives a lower FS (common practice), said in words.
      await page.locator('input[data-key="material:fill:phi"]').fill("21.5");
      await expect
        .poll(() => page.getByTestId("what-if-words").textContent(), { timeout: 30_000 })
        .toMatch(/^φ′ of Compacted clay fill 25\.9° → 21\.5°: FS \d\.\d{3} → \d\.\d{3}$/);
      expect(await finalBishop()).toBeLessThan(stored);

      await page.getByTestId("what-if-reset").click();
      await expect.poll(() => page.getByTestId("what-if-words").count()).toBe(0);
      expect(await finalBishop()).toBe(stored);

      // The tornado: with small c′ throughout, a φ′ leads (FS of a drained slope with little cohesion goes with
      // tan φ′ of the soils the slip passes through; common practice). The downstream circle reaches the foundation.
      await page.getByRole("button", { name: "Run the study" }).click();
      await page.getByTestId("fs-line").waitFor({ timeout: 120_000 });
      const order = JSON.parse((await page.getByTestId("tornado").getAttribute("data-order"))!) as string[];
      expect(order[0]).toMatch(/^φ′ of (Compacted clay fill|Silty clay foundation)$/);
      // The PDF, asked for with the section, carries it as the server searched it.
      const pdf = await page.request.get(`${api}/runs/${runId}/report?sensitivity=10`, { timeout: 120_000 });
      expect(pdf.status()).toBe(200);
      const text = await pdfText(new Uint8Array(await pdf.body()).buffer);
      expect(text).toContain("Sensitivity");
      expect(text).toContain(order[0].replace(/^\S+ /, ""));
      const bad = await page.request.get(`${api}/runs/${runId}/report?sensitivity=90`);
      expect(bad.status()).toBe(400);
      expect(errors).toEqual([]);
    });
    await page.close();
  });
});
