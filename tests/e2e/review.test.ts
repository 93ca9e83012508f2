import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { appUrl, launchBrowser, signInAs, watchConsole } from "../support/browser";
import { signedIn, type AppClient } from "../support/http";
import { runGridSearch, type SectionDocument } from "@/lib/stability";
import { documentForRun, runSetupSchema, type RunSetup } from "@/lib/analysis/run-setup";
import { directionForFace } from "@/lib/analysis/face";
import { suggestGrid } from "@/lib/analysis/auto-grid";
import { listCaughtMail, type CaughtMail } from "@/lib/mail/caught-mail";
import { pdfText } from "../support/pdf-text";

// Each step waits for a server round trip and a page refresh, so polls get more than the default second.
const WAIT = { timeout: 15_000 };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Saves a quick draft run of the demo section as the engineer, the way the browser would. */
async function createDraft(client: AppClient, title: string): Promise<{ projectId: number; runId: number }> {
  const projects = (await (await client.request("/api/projects")).json()).projects as { id: number; name: string }[];
  const projectId = projects.find((p) => p.name === "Lower Wendle Reservoir embankment")!.id;
  const sections = (await (await client.request(`/api/projects/${projectId}/sections`)).json()).sections as {
    id: number;
    name: string;
  }[];
  const sectionId = sections.find((s) => s.name.startsWith("Main embankment"))!.id;
  const body = await (await client.request(`/api/projects/${projectId}/sections/${sectionId}`)).json();
  const doc = body.document as SectionDocument;
  const g = suggestGrid(doc, directionForFace(doc, "downstream"), { nx: 6, ny: 6, nr: 5 });
  // Parsed, so settings the form defaults are filled in as the browser's form would.
  const setup: RunSetup = runSetupSchema.parse({
    condition: "steady-seepage",
    face: "downstream",
    methods: ["bishop", "fellenius"],
    slices: 30,
    ordinaryForm: "classical",
    grid: g.grid,
    radii: g.radii,
    refine: false,
    requiredFs: 1.5,
  });
  const result = runGridSearch(documentForRun(doc, setup));
  const res = await client.request(`/api/projects/${projectId}/runs`, {
    method: "POST",
    json: { sectionId, sectionVersion: body.section.currentVersion, title, setup, result },
  });
  expect(res.status).toBe(201);
  return { projectId, runId: (await res.json()).run.id };
}

/** Waits for the notice with this subject start to reach the SMTP fake, and returns it. */
async function waitForMail(subjectStart: string, to: string): Promise<CaughtMail> {
  let found: CaughtMail | undefined;
  await expect
    .poll(
      async () => {
        found = (await listCaughtMail(process.env.SMTP_MAIL_DIR!)).find(
          (m) => m.subject.startsWith(subjectStart) && m.envelope.to.includes(to),
        );
        return Boolean(found);
      },
      { timeout: 10_000 },
    )
    .toBe(true);
  return found!;
}

const linkIn = (mail: CaughtMail) =>
  /http:\/\/127\.0\.0\.1:\d+\/projects\/\d+\/runs\/\d+(\/review)?/.exec(mail.text)![0];

async function statusText(page: Page) {
  return page.getByTestId("review-status-note").textContent();
}

describe("carrying a run from draft to sign-off in the browser", () => {
  test("engineer submits, reviewer returns with a pinned comment, engineer revises and resubmits, reviewer signs off; both get the mail", async () => {
    const title = `Downstream seepage check ${Date.now()}`;
    const { projectId, runId } = await createDraft(await signedIn("engineer@scarpline.test"), title);
    const engineer = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const reviewer = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const engineerErrors = watchConsole(engineer);
    const reviewerErrors = watchConsole(reviewer);
    await signInAs(engineer, "engineer@scarpline.test");
    await signInAs(reviewer, "reviewer@scarpline.test");

    // The engineer submits the draft from the run page.
    await engineer.goto(appUrl(`/projects/${projectId}/runs/${runId}`));
    await engineer.getByLabel("Note for the reviewer (optional)").fill("Foundation strengths from the 2024 box tests.");
    await engineer.getByRole("button", { name: "Submit for review" }).click();
    await expect.poll(() => statusText(engineer), WAIT).toContain("Awaiting review");

    // The reviewer follows the link in the notice to the review page and pins a comment on the section.
    const request = await waitForMail(`Review requested: ${title}`, "reviewer@scarpline.test");
    expect(linkIn(request)).toMatch(new RegExp(`/projects/${projectId}/runs/${runId}/review$`));
    await reviewer.goto(linkIn(request));
    await reviewer.getByTestId("run-canvas").waitFor();
    await reviewer.getByLabel("A place on the section").check();
    const overlay = reviewer.getByTestId("pin-overlay");
    await expect.poll(() => overlay.getAttribute("data-placing"), WAIT).toBe("true");
    const box = (await overlay.boundingBox())!;
    const view = JSON.parse((await reviewer.getByTestId("run-canvas").getAttribute("data-view"))!) as {
      scale: number;
      offsetX: number;
      offsetY: number;
    };
    const click = { x: Math.round(box.width * 0.6), y: Math.round(box.height * 0.55) };
    await overlay.click({ position: click });
    const expectedX = (click.x - view.offsetX) / view.scale;
    await expect.poll(() => reviewer.getByTestId("pin-status").textContent(), WAIT).toMatch(/Pinned at x = /);
    // The pin lands where the click was, in section metres (RunCanvas's view transform).
    const pinnedX = Number(/x = (-?[\d.]+) m/.exec((await reviewer.getByTestId("pin-status").textContent())!)![1]);
    expect(pinnedX).toBeCloseTo(expectedX, 1);
    await reviewer
      .getByRole("textbox", { name: "New comment" })
      .fill("Toe drain level here differs from drawing D-102.");
    await reviewer.getByRole("button", { name: "Add comment" }).click();
    await expect
      .poll(() => reviewer.getByTestId("comment-list").textContent(), WAIT)
      .toContain("Toe drain level here differs");
    await reviewer.getByTestId("comment-pin-1").waitFor();
    await reviewer.getByLabel("Note to the author").fill("Recheck the toe drain, then resubmit.");
    await reviewer.getByRole("button", { name: "Return with comments" }).click();
    await expect.poll(() => statusText(reviewer), WAIT).toContain("Returned with comments");

    // The engineer reads the notice, sees the pin on the run and revises it as a new run.
    const returned = await waitForMail(`Returned with comments: ${title}`, "engineer@scarpline.test");
    expect(returned.text).toContain("Recheck the toe drain, then resubmit.");
    expect(returned.text).toContain("Toe drain level here differs from drawing D-102.");
    await engineer.goto(linkIn(returned));
    await engineer.getByTestId("comment-pin-1").waitFor();
    expect(await engineer.getByTestId("audit-trail").textContent()).toContain("Demo Reviewer");
    await engineer.getByRole("link", { name: "Revise as a new run" }).click();
    await engineer.getByRole("button", { name: "Run the search" }).click();
    await engineer.getByTestId("search-outcome").waitFor({ timeout: 60_000 });
    await engineer.getByLabel("Name of the run").fill(`${title} rev B`);
    await engineer.getByRole("button", { name: "Keep this run" }).click();
    await engineer.waitForURL(/\/runs\/\d+$/);
    const revisedId = Number(/\/runs\/(\d+)$/.exec(engineer.url())![1]);
    expect(revisedId).not.toBe(runId);
    await expect.poll(() => engineer.getByTestId("revision-chain").textContent(), WAIT).toContain(`Run ${runId}`);
    await engineer.getByRole("button", { name: "Submit for review" }).click();
    await expect.poll(() => statusText(engineer), WAIT).toContain("Awaiting review");

    // The reviewer confirms every checklist item and signs the revision off.
    const second = await waitForMail(`Review requested: ${title} rev B`, "reviewer@scarpline.test");
    await reviewer.goto(linkIn(second));
    for (const key of ["geometry", "strengths", "water", "grid", "fs"]) {
      await reviewer.getByTestId(`check-${key}`).getByLabel("Confirmed").check();
    }
    await reviewer.getByLabel("Note on “Geometry matches the drawings”").fill("Drawing D-102 rev C");
    await reviewer.getByRole("button", { name: "Save checklist" }).click();
    await expect.poll(() => reviewer.getByTestId("check-fs").getAttribute("data-state"), WAIT).toBe("ok");
    await reviewer.getByLabel("Note to the author").fill("Agrees with the drawings and the lab sets.");
    // The run's FS (Bishop about 1.32, ordinary about 1.08) is below the required 1.50: signing it
    // off needs the reviewer's reason, and the button says what it does.
    await reviewer.getByTestId("below-required").waitFor();
    const signOff = reviewer.getByRole("button", { name: "Sign off below the required FS" });
    expect(await signOff.isDisabled()).toBe(true);
    await reviewer
      .getByLabel("Why sign it off below the required FS?")
      .fill("Accepted as the record of a failing case; the flatter face follows in revision C.");
    await expect.poll(() => signOff.isDisabled(), WAIT).toBe(false);
    await signOff.click();
    await expect.poll(() => statusText(reviewer), WAIT).toContain("Signed off — below the required FS");

    // The engineer follows the sign-off notice; the run now offers no change.
    const signedOff = await waitForMail(
      `Signed off — below the required FS: ${title} rev B`,
      "engineer@scarpline.test",
    );
    await engineer.goto(linkIn(signedOff));
    await expect
      .poll(() => statusText(engineer), WAIT)
      .toContain("Signed off — below the required FS by Demo Reviewer");
    expect(await statusText(engineer)).toContain("the flatter face follows in revision C");
    expect(await engineer.getByTestId("author-actions").count()).toBe(0);
    const badge = engineer.getByTestId("run-status").first();
    expect(await badge.textContent()).toContain("Signed off — below the required FS");
    expect(await badge.getAttribute("data-status")).toBe("approved-below");

    // The runs list shows the same words and shape, never the plain green sign-off.
    await engineer.goto(appUrl(`/projects/${projectId}/runs`));
    const row = engineer.getByRole("row").filter({ hasText: `${title} rev B` });
    await expect.poll(() => row.getByTestId("run-status").textContent(), WAIT).toContain("below the required FS");

    // The calculation report, opened from the run page, says so in its status box.
    const report = await engineer.request.get(appUrl(`/api/projects/${projectId}/runs/${revisedId}/report`));
    expect(report.headers()["content-type"]).toBe("application/pdf");
    const pdf = await pdfText(await report.body());
    expect(pdf).toContain("SIGNED OFF — BELOW THE REQUIRED FS, by Demo Reviewer");
    expect(pdf).toContain("the flatter face follows in revision C");

    // Both people's notices are in the administrator's mail log.
    const admin = await browser.newPage();
    await signInAs(admin, "admin@scarpline.test");
    await admin.getByRole("link", { name: "Mail log" }).click();
    const log = admin.getByTestId("mail-log");
    await expect.poll(() => log.textContent(), WAIT).toContain(`Signed off — below the required FS: ${title} rev B`);
    const text = (await log.textContent())!;
    expect(text).toContain(`Review requested: ${title}`);
    expect(text).toContain(`Returned with comments: ${title}`);
    expect(text).toContain("reviewer@scarpline.test");
    expect(text).toContain("engineer@scarpline.test");

    expect(engineerErrors).toEqual([]);
    expect(reviewerErrors).toEqual([]);
    await Promise.all([engineer.close(), reviewer.close(), admin.close()]);
  });
});
