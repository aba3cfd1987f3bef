import type { Page } from '@playwright/test';

const DIR = 'tests/.artifacts/screens';

/** Desktop and tablet screenshots of the page as it stands, for a person to look at. */
export async function screens(page: Page, name: string): Promise<void> {
  const original = page.viewportSize();
  await page.setViewportSize({ width: 1366, height: 900 });
  // Plots re-lay themselves out a moment after a resize; a picture taken at once shows the old width.
  await page.waitForTimeout(500);
  await page.screenshot({ path: `${DIR}/${name}-desktop.png`, fullPage: true });
  await page.setViewportSize({ width: 820, height: 1180 });
  await page.waitForTimeout(500);
  await page.screenshot({ path: `${DIR}/${name}-tablet.png`, fullPage: true });
  if (original) await page.setViewportSize(original);
}

/** Waits until every form on the page has hydrated, so typed text is not overwritten by the form's defaults. */
export async function formsReady(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const forms = [...document.querySelectorAll('form[noValidate], form[novalidate]')];
    return forms.length > 0 && forms.every((f) => f.hasAttribute('data-ready'));
  });
}
