import { expect, test } from './fixtures';
import { signUpFresh } from './helpers';

// Under the page policy (nonced scripts and style elements, no eval) every page must render and work; the fixture
// fails the test on any refusal the browser reports. The calculator's plot must be styled too: plotly.js puts its
// rules into the nonced style element the root layout renders.
test('every kind of page renders under the Content-Security-Policy, the plot styled, the 404 page with its status', async ({ page }) => {
  await signUpFresh(page, 'csp');
  for (const path of ['/', '/sites', '/consequence-levels', '/profile', '/members', '/items/new']) {
    const response = await page.goto(path);
    expect(response?.status(), path).toBe(200);
    expect(response?.headers()['content-security-policy'], path).toMatch(/'strict-dynamic'/);
    await expect(page.getByRole('heading').first()).toBeVisible();
  }

  await page.goto('/calculator');
  await page.waitForSelector('.js-plotly-plot');
  const plotRules = await page.evaluate(() => (document.getElementById('plotly.js-style-global') as HTMLStyleElement | null)?.sheet?.cssRules.length ?? 0);
  expect(plotRules).toBeGreaterThan(10);

  const missing = await page.goto('/no-such-page');
  expect(missing?.status()).toBe(404);
  await expect(page.getByRole('heading', { name: 'Nothing here' })).toBeVisible();
});
