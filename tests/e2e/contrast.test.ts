import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { appUrl, launchBrowser, signInAs } from "../support/browser";
import { signedIn } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup, searchFor } from "../support/runs";

// axe-core (Deque) checks WCAG 2.1 AA colour contrast: 4.5:1 for normal text, 3:1 for large text
// (W3C, Web Content Accessibility Guidelines 2.1, success criterion 1.4.3).
const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

interface AxeNode {
  target: string[];
  failureSummary?: string;
}
interface AxeResult {
  violations: { id: string; nodes: AxeNode[] }[];
}

async function contrastProblems(page: Page): Promise<string[]> {
  await page.addScriptTag({ content: AXE_SOURCE });
  const result = (await page.evaluate(() =>
    (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<unknown> } }).axe.run(document, {
      runOnly: { type: "rule", values: ["color-contrast"] },
    }),
  )) as AxeResult;
  return result.violations.flatMap((v) => v.nodes.map((n) => `${n.target.join(" ")}: ${n.failureSummary ?? v.id}`));
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("colour contrast of the main pages (axe-core, WCAG 2.1 AA)", () => {
  test("dashboard, project, run, review, materials and new-section pages have no contrast failures", async () => {
    const engineerClient = await signedIn("engineer@scarpline.test");
    const demo = await demoProject(engineerClient);
    const setup = quickSetup(demo.document, "downstream");
    const kept = await engineerClient.request(`/api/projects/${demo.projectId}/runs`, {
      method: "POST",
      json: {
        sectionId: demo.sectionId,
        sectionVersion: demo.version,
        title: `Contrast check ${Date.now()}`,
        setup,
        result: searchFor(demo.document, setup),
      },
    });
    const runId = (await kept.json()).run.id as number;
    const base = `/projects/${demo.projectId}`;

    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    await signInAs(page, "engineer@scarpline.test");
    const found: Record<string, string[]> = {};
    for (const path of [
      "/projects",
      base,
      `${base}/runs`,
      `${base}/runs/${runId}`,
      `${base}/runs/${runId}/review`,
      `${base}/materials`,
      `${base}/sections/new`,
      `${base}/sections/${demo.sectionId}`,
    ]) {
      await page.goto(appUrl(path));
      await page.waitForLoadState("networkidle");
      const problems = await contrastProblems(page);
      if (problems.length) found[path] = problems;
    }
    expect(found).toEqual({});
  });
});

describe("colour contrast of the people and sign-in pages (axe-core, WCAG 2.1 AA)", () => {
  test("people, mail log, account and the sign-in form with its messages have no contrast failures", async () => {
    const found: Record<string, string[]> = {};
    const anonymous = await browser.newPage();
    await anonymous.goto(appUrl("/sign-in"));
    await anonymous.getByRole("button", { name: "Sign in" }).click();
    await anonymous.locator(".field-error").first().waitFor();
    const signInProblems = await contrastProblems(anonymous);
    if (signInProblems.length) found["/sign-in (empty form)"] = signInProblems;
    await anonymous.close();

    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    await signInAs(page, "admin@scarpline.test");
    for (const path of ["/admin/users", "/admin/mail", "/account"]) {
      await page.goto(appUrl(path));
      await page.waitForLoadState("networkidle");
      const problems = await contrastProblems(page);
      if (problems.length) found[path] = problems;
    }
    expect(found).toEqual({});
  });
});
