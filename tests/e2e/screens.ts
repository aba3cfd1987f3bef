import type { Page } from '@playwright/test';

const DIR = 'tests/.artifacts/screens';

/** Desktop and tablet screenshots of the page as it stands, for a person to look at. */
export async function screens(page: Page, name: string): Promise<void> {
  const original = page.viewportSize();
  await page.setViewportSize({ width: 1366, height: 900 });
  await page.screenshot({ path: `${DIR}/${name}-desktop.png`, fullPage: true });
  await page.setViewportSize({ width: 820, height: 1180 });
  await page.screenshot({ path: `${DIR}/${name}-tablet.png`, fullPage: true });
  if (original) await page.setViewportSize(original);
}
