import { expect, test } from '@playwright/test';
import { signUpFresh } from './helpers';
import { formsReady, screens } from './screens';

// An invented yard with 30 invented bolts: more than the 25 rows the screen shows per page.
test('printing a site gives the whole register, no navigation, and the safety caution', async ({ page }) => {
  test.setTimeout(180_000);
  await signUpFresh(page, 'print');
  const api = page.request;
  const site = (await (await api.post('/api/v1/sites', { data: { name: 'Print test yard', kind: 'building', surface: 'ground', design_wind: 8 } })).json()).site;
  const level = (await (await api.post(`/api/v1/sites/${site.id}/levels`, { data: { name: 'Gantry', floor_height: 15 } })).json()).level;
  for (let i = 0; i < 30; i++) {
    const item = await api.post(`/api/v1/sites/${site.id}/items`, {
      data: { tag: `P-${String(i).padStart(2, '0')}`, description: 'Bolt', category: 'fastener', mass: 0.2, shape: 'sphere', dimensions: { diameter: 0.03 }, level_id: level.id, securing: 'unsecured' },
    });
    expect(item.status()).toBe(201);
  }

  await page.goto(`/sites/${site.id}`);
  // The print listener is the table's own: wait until the page's client code runs (its forms are ready then).
  await formsReady(page);
  const rows = page.locator('table tbody tr');
  await expect(rows).toHaveCount(25);
  await expect(page.getByTestId('print-caution')).toBeHidden();

  await page.emulateMedia({ media: 'print' });
  await expect(rows).toHaveCount(30);
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeHidden();
  await expect(page.getByRole('search', { name: 'Search and filter the register' })).toBeHidden();
  await expect(page.getByTestId('print-caution')).toBeVisible();
  await screens(page, 'register-site-print');

  await page.emulateMedia({ media: 'screen' });
  await expect(rows).toHaveCount(25);
});
