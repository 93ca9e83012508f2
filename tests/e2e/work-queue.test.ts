import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { appUrl, keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { signedIn, type AppClient } from "../support/http";
import { demoProject } from "../support/demo";
import { quickSetup, searchFor } from "../support/runs";

const WAIT = { timeout: 15_000 };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Saves a draft of the demo section over HTTP, as the run page's "Keep this run" does. */
async function saveDraft(client: AppClient, title: string): Promise<{ projectId: number; runId: number }> {
  const demo = await demoProject(client);
  const setup = quickSetup(demo.document, "downstream");
  const res = await client.request(`/api/projects/${demo.projectId}/runs`, {
    method: "POST",
    json: {
      sectionId: demo.sectionId,
      sectionVersion: demo.version,
      title,
      setup,
      result: searchFor(demo.document, setup),
    },
  });
  expect(res.status).toBe(201);
  return { projectId: demo.projectId, runId: (await res.json()).run.id };
}

describe("the reviewer's queue", () => {
  test("an engineer submits two runs; the reviewer's dashboard lists the older first and opens its review", async () => {
    const engineerClient = await signedIn("engineer@scarpline.test");
    const stamp = Date.now();
    const older = await saveDraft(engineerClient, `Queue check A ${stamp}`);
    const newer = await saveDraft(engineerClient, `Queue check B ${stamp}`);

    const engineer = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const reviewer = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = [...watchConsole(engineer), ...watchConsole(reviewer)];
    await signInAs(engineer, "engineer@scarpline.test");

    await keepScreenshotOnFailure(engineer, "queue-engineer", async () => {
      // The engineer's dashboard lists both as drafts.
      await engineer.goto(appUrl("/projects"));
      const drafts = engineer.getByTestId("my-drafts");
      expect(await drafts.textContent()).toContain(`Queue check A ${stamp}`);
      for (const run of [older, newer]) {
        await engineer.goto(appUrl(`/projects/${run.projectId}/runs/${run.runId}`));
        await engineer.getByRole("button", { name: "Submit for review" }).click();
        await expect
          .poll(() => engineer.getByTestId("review-status-note").textContent(), WAIT)
          .toContain("Awaiting review");
      }
      await engineer.goto(appUrl("/projects"));
      expect(await engineer.getByTestId("my-drafts").textContent()).not.toContain(`Queue check A ${stamp}`);
      await engineer.screenshot({ path: "test-results/engineer-dashboard.png", fullPage: true });
    });

    await signInAs(reviewer, "reviewer@scarpline.test");
    await keepScreenshotOnFailure(reviewer, "queue-reviewer", async () => {
      // The navigation counts the runs waiting; the dashboard lists them oldest first. Other browser
      // checks sharing this database may have left runs waiting too, so only these two are compared.
      const count = Number(/To review\s*(\d+)/.exec((await reviewer.getByTestId("nav-to-review").textContent())!)![1]);
      const rows = reviewer.getByTestId("queue-row");
      expect(await rows.count()).toBe(count);
      const texts = await rows.allTextContents();
      const a = texts.findIndex((t) => t.includes(`Queue check A ${stamp}`));
      const b = texts.findIndex((t) => t.includes(`Queue check B ${stamp}`));
      expect(a).toBeGreaterThanOrEqual(0);
      expect(b).toBe(a + 1);
      const first = texts[a];
      expect(first).toContain("Lower Wendle Reservoir embankment");
      expect(first).toContain("Long-term steady seepage");
      expect(first).toContain("Demo Engineer");
      expect(first).toContain("against 1.50");
      expect(first).toContain("today");

      // The row opens the review page of that run.
      await rows
        .nth(a)
        .getByRole("link", { name: `Queue check A ${stamp}` })
        .click();
      await reviewer.waitForURL(new RegExp(`/projects/${older.projectId}/runs/${older.runId}/review$`));
      await reviewer.getByTestId("run-canvas").waitFor();
      // The checklist and the decision sit beside the drawing; the slice table starts folded.
      const canvasBox = (await reviewer.getByTestId("run-canvas").boundingBox())!;
      const checklistBox = (await reviewer.getByTestId("check-geometry").boundingBox())!;
      expect(checklistBox.x).toBeGreaterThan(canvasBox.x + canvasBox.width - 1);
      expect(checklistBox.y).toBeLessThan(canvasBox.y + canvasBox.height);
      const slices = reviewer.getByTestId("slice-table").first();
      expect(await slices.evaluate((el) => (el as HTMLDetailsElement).open)).toBe(false);
      await reviewer.screenshot({ path: "test-results/review-page.png", fullPage: true });
      await reviewer.goto(appUrl("/projects"));
      await reviewer.screenshot({ path: "test-results/reviewer-dashboard.png", fullPage: true });
    });
    expect(errors).toEqual([]);
  });
});
