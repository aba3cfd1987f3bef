import { expect, test } from '@playwright/test';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { signUpFresh } from './helpers';

// The probe's payload (issue 9, defect 12): a consequence level named as a link became a live link in every member's
// plot legend, because Plotly draws <a href> in legend names, hover text and annotations as an SVG link.
const linkName = (i: number) => `<a href="https://example.invalid/${i}">Rung ${i}</a>`;

test('names members wrote show as text in the energy plot, never as links', async ({ page }) => {
  // Plotly's 1.4 MB chunk loads after the page; on a busy machine that takes a while.
  test.setTimeout(180_000);
  await signUpFresh(page, 'plot-text');
  const api = page.request;
  const levels = DEFAULT_LADDER.map(({ lower_bound_j, colour }, i) => ({ name: linkName(i), lower_bound_j, colour }));
  expect((await api.put('/api/v1/consequence-levels', { data: { levels } })).status()).toBe(200);
  const site = await (await api.post('/api/v1/sites', { data: { name: 'Plot text yard', kind: 'building', surface: 'ground', design_wind: 5 } })).json();
  const level = await (await api.post(`/api/v1/sites/${site.site.id}/levels`, { data: { name: '<a href="https://example.invalid/level">Deck</a>', floor_height: 20 } })).json();
  const item = await api.post(`/api/v1/sites/${site.site.id}/items`, {
    data: { tag: '<b>T-1</b>', description: '<a href="https://example.invalid/item">Toolbox</a>', category: 'hand_tool', mass: 5, shape: 'sphere', dimensions: { diameter: 0.2 }, level_id: level.level.id, securing: 'unsecured' },
  });
  expect(item.status()).toBe(201);
  // A second item in another rung: Plotly draws a legend only for two traces or more.
  const light = await api.post(`/api/v1/sites/${site.site.id}/items`, {
    data: { tag: 'T-2', description: 'Washer', category: 'fastener', mass: 0.01, shape: 'sphere', dimensions: { diameter: 0.02 }, level_id: level.level.id, securing: 'unsecured' },
  });
  expect(light.status()).toBe(201);

  await page.goto(`/sites/${site.site.id}`);
  const plot = page.locator('.js-plotly-plot');
  await expect(plot.locator('.legend')).toBeAttached({ timeout: 120_000 });
  // The item's rung is named in the legend as typed, tags and all, and nothing in the plot is a link.
  const rung = (await item.json()).item.consequence_level_id as string;
  const ladder = (await (await api.get('/api/v1/consequence-levels')).json()).levels as { id: string; name: string }[];
  await expect(plot.locator('.legend')).toContainText(ladder.find((l) => l.id === rung)!.name);
  await expect(plot.locator('.ytick')).toContainText(['<a href="https://example.invalid/level">Deck</a> · 20 m']);
  await expect(plot.locator('a')).toHaveCount(0);
});
