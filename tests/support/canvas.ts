import type { Page } from "playwright-core";

interface View {
  scale: number;
  offsetX: number;
  offsetY: number;
  exaggeration?: number;
}

/** Screen position of a world point (m) on a canvas that publishes its view as `data-view`. */
export async function worldToScreen(
  page: Page,
  testId: string,
  x: number,
  y: number,
): Promise<{ x: number; y: number }> {
  const el = page.getByTestId(testId);
  await page.waitForSelector(`[data-testid="${testId}"][data-view]`);
  const view = JSON.parse((await el.getAttribute("data-view"))!) as View;
  const box = (await el.boundingBox())!;
  return {
    x: box.x + view.offsetX + x * view.scale,
    y: box.y + view.offsetY - y * view.scale * (view.exaggeration ?? 1),
  };
}

export async function clickWorld(page: Page, testId: string, x: number, y: number): Promise<void> {
  const p = await worldToScreen(page, testId, x, y);
  await page.mouse.click(p.x, p.y);
}
