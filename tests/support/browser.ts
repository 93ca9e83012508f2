import { chromium, type Browser, type Page } from "playwright-core";
import { inject } from "vitest";

/** Debian's Chromium driven by playwright-core; nothing downloads a browser of its own. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--disable-gpu", "--disable-quic"],
  });
}

export const appUrl = (path = "") => inject("appUrl") + path;

/** Signs in through the real form, as a person would. */
export async function signInAs(page: Page, email: string, password = "scarpline-demo"): Promise<void> {
  await page.goto(appUrl("/sign-in"));
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/projects/);
}

/** Collects console errors and failed requests so a test can assert the page stayed clean. */
export function watchConsole(page: Page): string[] {
  const errors: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") errors.push(m.text());
  });
  page.on("pageerror", (e) => errors.push(e.message));
  return errors;
}

/** Runs a browser test body; on failure keeps a screenshot in test-results/ to show what the page looked like. */
export async function keepScreenshotOnFailure<T>(page: Page, name: string, body: () => Promise<T>): Promise<T> {
  try {
    return await body();
  } catch (err) {
    await page
      .screenshot({ path: `test-results/${name.replace(/[^a-z0-9]+/gi, "-")}.png`, fullPage: true })
      .catch(() => undefined);
    throw err;
  }
}
