import fs from "node:fs/promises";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { appUrl, launchBrowser, signInAs } from "../support/browser";
import { signedIn } from "../support/http";
import { createDraft, demoProject, move } from "../support/review";
import { pdfText } from "../support/pdf-text";
import { findEngineWords } from "../support/engine-words";

let browser: Browser;
let comparePage = "";
beforeAll(async () => {
  browser = await launchBrowser();
  // Runs in three states, so the run pages, the queue and the report have something to show.
  const engineer = await signedIn("engineer@scarpline.test");
  const demo = await demoProject(engineer);
  const below = await createDraft(engineer, demo, "Walk: a draft below its required FS", undefined, 1.5);
  const submitted = await createDraft(engineer, demo, "Walk: a run awaiting review");
  await move(engineer, demo, submitted, "submit");
  comparePage = `/projects/${demo.projectId}/runs/compare?ids=${submitted},${below}`;
});
afterAll(async () => {
  await browser?.close();
});

const OUT = path.resolve("test-results/walk");
const START = ["/projects", "/account", "/admin/users", "/admin/mail"];
const PER_ROLE = 40;

/** A page's address with its numbers replaced, so the walk opens each kind of page twice at most. */
const shape = (p: string) => p.replace(/\d+/g, ":id").replace(/\?.*$/, "");

async function walk(page: Page, role: string): Promise<{ pages: Record<string, string>; reports: string[] }> {
  const seen = new Set<string>();
  const shapes = new Map<string, number>();
  const queue = [...START, comparePage];
  const pages: Record<string, string> = {};
  const reports = new Set<string>();
  await fs.mkdir(path.join(OUT, role), { recursive: true });
  while (queue.length > 0 && Object.keys(pages).length < PER_ROLE) {
    const at = queue.shift()!;
    if (seen.has(at) || (shapes.get(shape(at)) ?? 0) >= 2) continue;
    seen.add(at);
    shapes.set(shape(at), (shapes.get(shape(at)) ?? 0) + 1);
    const res = await page.goto(appUrl(at));
    if (!res || res.status() >= 400) continue;
    await page.waitForLoadState("networkidle").catch(() => undefined);
    await page.screenshot({ path: path.join(OUT, role, `${Object.keys(pages).length + 1}.png`), fullPage: true });
    // A file's column names (shown as code) are the file's own spelling, not words for a reader.
    const text = await page.evaluate(() => {
      for (const c of document.querySelectorAll("code")) c.textContent = "";
      return document.body.innerText;
    });
    pages[at] = text;
    const name = `${Object.keys(pages).length}-${at.replace(/[^a-z0-9]+/gi, "-")}`.slice(0, 90);
    await fs.writeFile(path.join(OUT, role, `${name}.txt`), text);
    await fs.rename(path.join(OUT, role, `${Object.keys(pages).length}.png`), path.join(OUT, role, `${name}.png`));
    const links = await page.$$eval("a[href^='/']", (as) => as.map((a) => a.getAttribute("href") ?? ""));
    for (const l of links) {
      if (/\/report(\?|$)/.test(l)) reports.add(l);
      else if (!l.startsWith("/api/") && !l.includes("sign-out") && !seen.has(l)) queue.push(l);
    }
  }
  return { pages, reports: [...reports] };
}

// The words on screen and in the report are the user's (issue 18, item 5): no engine codes such as
// "mohr-coulomb", "fellenius" or "regions[2]" reach a reader.
describe("every page, as each role, in the user's words", () => {
  for (const role of ["engineer", "reviewer", "designer", "admin"]) {
    test(`${role}: no engine codes on the pages or in a run report`, async () => {
      const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
      await signInAs(page, `${role}@scarpline.test`);
      const { pages, reports } = await walk(page, role);
      expect(Object.keys(pages).length).toBeGreaterThan(2);
      const found: string[] = [];
      for (const [at, text] of Object.entries(pages)) {
        for (const w of findEngineWords(text)) found.push(`${at}: ${w}`);
      }
      if (reports[0]) {
        const pdf = await page.request.get(appUrl(reports[0]));
        for (const w of findEngineWords(await pdfText(await pdf.body()))) found.push(`${reports[0]}: ${w}`);
      }
      await fs.writeFile(path.join(OUT, role, "findings.txt"), found.join("\n"));
      expect(found).toEqual([]);
      await page.close();
    });
  }
});
