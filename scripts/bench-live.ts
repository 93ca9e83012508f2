/**
 * Benchmark of live checking in a real browser (issue 16 item 5; targets: p95 under 100 ms,
 * above 50 frames per second). Builds and starts the app on a fresh seeded database as the
 * browser tests do, copies the demo dam, keeps a run of it with a 5,000-circle grid (25 × 20
 * centres × 10 radii, no refinement) so live mode searches that set-up, then drags the
 * downstream toe back and forth for 5 s in Chromium.
 * Latency: from the drawing changing to the answer for that state being shown (the badge's
 * data-latency-ms; during a drag mostly the coarse pass's, docs/live-stability.md). Frame rate:
 * animation frames the page painted during the drag. Also: from release to the final answer.
 * Prints figures only; the last line is `live_p95_ms=N`. SCARPLINE_SKIP_BUILD=1 reuses a build.
 */
import os from "node:os";
import { chromium, type Page } from "playwright-core";
import { acquireStack, releaseStack } from "../tests/support/stack";
import { quickSetup } from "../tests/support/runs";
import type { SectionDocument } from "../lib/stability";
import { searchCircleCount } from "../lib/runs/record/limits";

const DRAG_SECONDS = 5;
const pct = (xs: number[], p: number) =>
  [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(p * xs.length))];

async function toScreen(page: Page, x: number, y: number) {
  const el = page.getByTestId("editor-canvas");
  await page.waitForSelector('[data-testid="editor-canvas"][data-view]');
  const v = JSON.parse((await el.getAttribute("data-view"))!) as {
    scale: number;
    offsetX: number;
    offsetY: number;
    exaggeration?: number;
  };
  const box = (await el.boundingBox())!;
  return { x: box.x + v.offsetX + x * v.scale, y: box.y + v.offsetY - y * v.scale * (v.exaggeration ?? 1) };
}

async function main() {
  const stack = await acquireStack(true);
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--disable-gpu", "--disable-quic"],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 1500, height: 1000 } });
    await page.goto(`${stack.appUrl}/sign-in`);
    await page.getByLabel("E-mail").fill("engineer@scarpline.test");
    await page.getByLabel("Password").fill("scarpline-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/projects/);
    await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
    await page.waitForURL(/\/projects\/\d+$/);
    const projectPath = new URL(page.url()).pathname;
    const api = `${stack.appUrl}/api${projectPath}`;
    const sections = (await (await page.request.get(`${api}/sections`)).json()).sections as {
      id: number;
      name: string;
    }[];
    const demo = sections.find((s) => s.name.startsWith("Main embankment"))!;
    const doc = (await (await page.request.get(`${api}/sections/${demo.id}`)).json()).document as SectionDocument;
    const copy = await page.request.post(`${api}/sections`, { data: { name: "Live bench", document: doc } });
    const sectionId = (await copy.json()).section.id as number;
    const base = quickSetup(doc, "downstream", { slices: 50, refine: false });
    const setup = { ...base, grid: { ...base.grid, nx: 25, ny: 20 }, radii: { ...base.radii, n: 10 } };
    const run = await page.request.post(`${api}/runs`, {
      data: { sectionId, sectionVersion: 1, title: "Live bench set-up", setup },
    });
    if (run.status() !== 201) throw new Error(`keeping the bench run failed: ${await run.text()}`);

    await page.goto(`${stack.appUrl}${projectPath}/sections/${sectionId}`);
    await page.getByRole("button", { name: "Live check" }).click();
    const badge = page.getByTestId("live-badge");
    await page.waitForFunction(
      () => document.querySelector('[data-testid="live-badge"]')?.getAttribute("data-state") === "final",
    );

    // Record every answer shown and every frame painted, inside the page. Plain text: tsx would wrap
    // a function's inner helpers in its own naming calls, which do not exist in the page.
    await page.evaluate(`(() => {
      const b = { latencies: [], searches: [], withFs: 0, frames: 0, start: performance.now(), on: true };
      window.__bench = b;
      const el = document.querySelector('[data-testid="live-badge"]');
      new MutationObserver(() => {
        const l = el.getAttribute("data-latency-ms");
        if (b.on && l) b.latencies.push(Number(l));
        if (b.on && l) b.searches.push(Number(el.getAttribute("data-search-ms")));
        if (b.on && l && (el.getAttribute("data-fs") || "{}") !== "{}") b.withFs++;
      }).observe(el, { attributes: true, attributeFilter: ["data-answered"] });
      const tick = () => {
        if (!b.on) return;
        b.frames++;
        requestAnimationFrame(tick);
      };
      requestAnimationFrame(tick);
    })()`);

    // The demo's downstream toe is at (92, 6); swing it out to x = 100 and back (inward the drain is in the way).
    const toe = await toScreen(page, 92, 6);
    const far = await toScreen(page, 100, 6);
    const span = far.x - toe.x;
    await page.mouse.move(toe.x, toe.y);
    await page.mouse.down();
    const t0 = Date.now();
    let moves = 0;
    while (Date.now() - t0 < DRAG_SECONDS * 1000) {
      const t = (Date.now() - t0) / 1000;
      await page.mouse.move(toe.x + span * (0.5 - 0.5 * Math.cos(t * Math.PI)), toe.y);
      moves++;
    }
    const stats = (await page.evaluate(`(() => {
      const b = window.__bench;
      b.on = false;
      const fps = (b.frames * 1000) / (performance.now() - b.start);
      return { latencies: b.latencies, searches: b.searches, withFs: b.withFs, fps };
    })()`)) as { latencies: number[]; searches: number[]; withFs: number; fps: number };
    const released = Date.now();
    await page.mouse.up();
    await badge.waitFor();
    // The answers during the drag are mostly the coarse pass's ("settling"); the full set-up's final
    // answer comes once the drawing rests.
    await page.waitForFunction(() => {
      const b = document.querySelector('[data-testid="live-badge"]');
      return (
        b?.getAttribute("data-state") === "final" &&
        b.getAttribute("data-answered") === b.getAttribute("data-generation")
      );
    });
    const toFinal = Date.now() - released;

    const l = stats.latencies;
    console.log(
      `circles per search: ${searchCircleCount(setup.grid, setup.radii)} (no refinement), ` +
        `${setup.slices} slices, both methods`,
    );
    console.log(`pointer moves: ${moves} in ${DRAG_SECONDS} s; answers shown: ${l.length}, ${stats.withFs} with an FS`);
    if (l.length === 0) throw new Error("no live answer arrived during the drag");
    console.log(
      `update latency ms: p50 ${pct(l, 0.5).toFixed(1)}, p95 ${pct(l, 0.95).toFixed(1)}, ` +
        `max ${Math.max(...l).toFixed(1)}`,
    );
    const sm = stats.searches;
    console.log(`search time in the worker ms: p50 ${pct(sm, 0.5).toFixed(1)}, p95 ${pct(sm, 0.95).toFixed(1)}`);
    console.log(`frame rate during the drag: ${stats.fps.toFixed(1)} per second`);
    console.log(`from release to the final answer (full set-up): ${toFinal} ms`);
    console.log(`machine load average (1 min): ${os.loadavg()[0].toFixed(2)} on ${os.cpus().length} cores`);
    console.log(`live_p95_ms=${Math.round(pct(l, 0.95))}`);
  } finally {
    await browser.close();
    await releaseStack();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
