import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { keepScreenshotOnFailure, launchBrowser, signInAs, watchConsole } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

// A minimal one-page PDF, so the upload is a real PDF and not a renamed file.
const PDF = Buffer.from(
  "%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n" +
    "3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 200 200]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n",
);

describe("materials from lab results", () => {
  test("an engineer derives c' and φ' from a shear-box sheet, uses them, and attaches the sheet", async () => {
    const page = await browser.newPage({ viewport: { width: 1400, height: 1000 } });
    const errors = watchConsole(page);
    await keepScreenshotOnFailure(page, "materials-shear-box", async () => {
      await signInAs(page, "engineer@scarpline.test");
      await page.getByRole("link", { name: "Lower Wendle Reservoir embankment" }).click();
      await page.waitForURL(/\/projects\/\d+$/);
      // A material of the test's own: the demo library is read by other tests and must stay as seeded.
      const { origin, pathname: projectPath } = new URL(page.url());
      const created = await page.request.post(`${origin}/api${projectPath}/materials`, {
        data: {
          key: "borrow-b-clay",
          name: "Borrow area B clay",
          parameters: { model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 5, phi: 25 },
        },
      });
      expect(created.status()).toBe(201);
      await page.getByRole("link", { name: "Materials" }).click();
      await page
        .getByRole("link", { name: /Borrow area B clay/ })
        .first()
        .click();
      await page.getByTestId("lab-entry").waitFor();
      const setsBefore = await page.getByTestId("lab-set").count();

      await page.getByLabel("Name of the set").fill("Borrow area B, shear box, browser test");
      // Hand calculation: these three tests lie on τ = 20 + 0.5·σn, so c' = 20 kPa and φ' = atan(0.5) = 26.57°.
      const rows: [string, number, number][] = [
        ["B-1", 50, 45],
        ["B-2", 100, 70],
        ["B-3", 200, 120],
      ];
      for (const [i, [name, sigma, tau]] of rows.entries()) {
        await page.getByLabel(`Specimen, row ${i + 1}`).fill(name);
        await page.getByLabel(`Normal stress σn, row ${i + 1}`).fill(String(sigma));
        await page.getByLabel(`Peak shear stress τ, row ${i + 1}`).fill(String(tau));
      }
      await page.getByRole("button", { name: "Work out the result" }).click();
      await expect
        .poll(() => page.getByTestId("lab-entry").getByTestId("lab-result").textContent())
        .toMatch(/20\.0[\s\S]*26\.6/);
      await page.getByRole("button", { name: "Save the test set" }).click();
      await expect.poll(() => page.getByTestId("lab-set").count()).toBe(setsBefore + 1);

      const card = page.getByTestId("lab-set").filter({ hasText: "Borrow area B, shear box, browser test" });
      await card.getByRole("button", { name: /^Use c′/ }).click();
      await expect
        .poll(async () => (await page.getByTestId("source-badge").allTextContents()).join(" "))
        .toMatch(/lab test set/);
      await expect.poll(() => page.getByLabel(/Effective cohesion/).inputValue()).toMatch(/^20(\.0+)?$/);

      await page
        .getByTestId("document-input")
        .setInputFiles({ name: "shear-box-sheet-B.pdf", mimeType: "application/pdf", buffer: PDF });
      await page.getByTestId("upload-stored").waitFor();
      await expect.poll(() => page.getByTestId("document-table").textContent()).toContain("shear-box-sheet-B.pdf");
    });
    expect(errors).toEqual([]);
    await page.close();
  });
});
