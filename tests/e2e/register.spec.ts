import { readFile } from 'node:fs/promises';
import Papa from 'papaparse';
import { expect, test } from './fixtures';
import { computeItem } from '@/lib/register/compute';
import { itemsTemplateCsv } from '@/lib/register/csv-write';
import { DEFAULT_LADDER } from '@/lib/domain/default-ladder';
import { formatNumber } from '@/lib/units';
import { signUpFresh } from './helpers';
import { formsReady, screens } from './screens';

// Expected figures come from the physics core run here: the test checks what the pages store and show, not the physics.
const LEVEL = { floor_height_m: 18, surface: 'ground' as const, water_depth_m: null, altitude_m: 0, design_wind_m_s: 12, current_m_s: 0 };
const calculatorBox = { mass_kg: 5, shape: 'tumbling_box', dimensions_m: { length: 0.3, width: 0.2, height: 0.1 }, cd: null, area_m2: null, volume_m3: null, height_m: 30 };
const expected = computeItem(calculatorBox, LEVEL, DEFAULT_LADDER.map((l) => ({ id: l.name, lower_bound_j: l.lower_bound_j })));

test('a site, a level, an item from the calculator, a CSV import with a bad row, filtering and export', async ({ page }) => {
  await signUpFresh(page, 'register');

  await page.getByRole('link', { name: 'Sites', exact: true }).first().click();
  await formsReady(page);
  await expect(page.getByText('No sites yet.')).toBeVisible();
  await page.getByLabel('Site name').fill('Test Quay warehouse');
  await page.getByRole('textbox', { name: /^Design wind speed/ }).fill('12');
  await page.getByRole('button', { name: 'Create site' }).click();
  await expect(page.getByRole('heading', { name: 'Test Quay warehouse' })).toBeVisible();
  await formsReady(page);
  await page.getByRole('textbox', { name: 'Level name' }).fill('Deck 2');
  await page.getByRole('textbox', { name: /^Floor height/ }).fill('18');
  await page.getByRole('button', { name: 'Add level' }).click();
  await expect(page.getByText('Level “Deck 2” added.')).toBeVisible();
  await expect(page.getByRole('list', { name: 'Levels' })).toContainText('18 m');
  const siteUrl = page.url();
  await screens(page, 'register-site-empty');

  await page.getByRole('link', { name: 'Drop calculator' }).first().click();
  await formsReady(page);
  await expect(page.getByTestId('fall-time')).toBeVisible();
  await page.getByRole('link', { name: 'Add to register' }).click();
  await page.getByRole('link', { name: 'Add to Test Quay warehouse' }).click();
  await formsReady(page);
  await expect(page.getByText('Filled from the drop calculator')).toBeVisible();
  await expect(page.getByRole('textbox', { name: /^Mass/ })).toHaveValue('5');
  await expect(page.getByRole('textbox', { name: /^Drop height/ })).toHaveValue('30');
  await page.getByLabel('Tag').fill('TQ-001');
  await page.getByLabel('Description').fill('Toolbox on the deck edge');
  await screens(page, 'register-item-new');
  await page.getByRole('button', { name: 'Add to the register' }).click();
  await expect(page.getByText('Added to the register')).toBeVisible();
  await expect(page.getByTestId('stored-impact-energy')).toContainText(formatNumber(expected.effective_energy_j!, 3));
  await expect(page.getByTestId('stored-fall-time')).toContainText(formatNumber(expected.fall_time_s!, 3));
  await expect(page.getByTestId('stored-drift')).toContainText(formatNumber(expected.drift_m!, 3));
  await expect(page.getByText(/Matches the item.s current inputs/)).toBeVisible();
  await expect(page.getByLabel('Safety caution').first()).toBeVisible();
  await page.waitForSelector('.js-plotly-plot');
  await screens(page, 'register-item');

  await page.goto(siteUrl);
  await page.getByRole('link', { name: 'Import CSV' }).click();
  const template = itemsTemplateCsv('si', ['Deck 2']).trimEnd();
  const withBadRow = `${template}\r\nX-900,Bad mass row,hand_tool,1,-1,long_bar,,,0.3,0.03,,,,,,,,Deck 2,,tethered,,\r\n`;
  const badLine = withBadRow.trimEnd().split(/\r\n/).length;
  await page.getByLabel('CSV file to import').setInputFiles({ name: 'deck-2.csv', mimeType: 'text/csv', buffer: Buffer.from(withBadRow) });
  const problems = page.getByTestId('import-problems');
  await expect(problems).toContainText('Mass must be greater than 0 kg.');
  await expect(problems).toContainText(String(badLine));
  await expect(problems).toContainText('mass_kg');
  await expect(page.getByRole('button', { name: /^Import all/ })).toBeDisabled();
  // Each control says what it does: checking writes nothing, one button skips the bad rows, the other is all or none.
  await expect(page.getByTestId('import-steps')).toContainText('Choosing a file only checks it');
  await expect(page.getByRole('button', { name: 'Import the 4 valid rows' })).toHaveAccessibleDescription('Import the 4 valid rows writes 4 valid rows and skips 1 row with problems.');
  await expect(page.getByRole('button', { name: /^Import all/ })).toHaveAccessibleDescription(/writes every row or none, so it is unavailable while 1 row has problems\./);
  await expect(page.getByText(/lands whole/)).toHaveCount(0);
  await screens(page, 'register-import-check');
  await page.getByRole('button', { name: 'Import the 4 valid rows' }).click();
  await expect(page.getByText(/Imported 4 items into Test Quay warehouse/)).toBeVisible();
  await screens(page, 'register-import-done');

  await page.getByRole('link', { name: 'Open the register' }).click();
  const table = page.getByRole('table');
  await expect(table.getByRole('link', { name: 'TQ-001' })).toBeVisible();
  await expect(table.getByRole('link', { name: 'P-004' })).toBeVisible();
  await page.waitForSelector('.js-plotly-plot');
  await screens(page, 'register-site');
  await page.getByRole('combobox', { name: 'Securing' }).selectOption({ label: 'Tethered' });
  await expect(table.getByRole('link', { name: 'T-001' })).toBeVisible();
  await expect(table.getByRole('link', { name: 'TQ-001' })).toHaveCount(0);
  await page.getByRole('combobox', { name: 'Securing' }).selectOption({ label: 'All' });
  await page.getByLabel('Search tag or description').fill('panel');
  await expect(table.getByRole('link', { name: 'P-004' })).toBeVisible();
  await expect(table.getByRole('link', { name: 'B-002' })).toHaveCount(0);
  await screens(page, 'register-site-filtered');

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: /Export CSV/ }).click()]);
  const csv = (await readFile((await download.path())!, 'utf8')).replace(/^\uFEFF/, '');
  const lines = csv.trimEnd().split(/\r?\n/);
  expect(lines[0]).toContain('mass_kg');
  expect(lines[0]).toContain('effective_energy_j');
  expect(lines).toHaveLength(1 + 5);
  expect(csv).toContain('TQ-001');
  // TQ-001 came from the calculator at its own 30 m; the imported rows use Deck 2's 18 m, typed above.
  const [header, ...cells] = Papa.parse<string[]>(csv, { skipEmptyLines: true }).data;
  const byTag = (tag: string, column: string) => cells.find((c) => c[0] === tag)![header.indexOf(column)];
  expect([byTag('TQ-001', 'drop_height_m'), byTag('TQ-001', 'height_from'), byTag('TQ-001', 'height_m')]).toEqual(['30', 'item', '30']);
  expect([byTag('P-004', 'drop_height_m'), byTag('P-004', 'height_from'), byTag('P-004', 'height_m')]).toEqual(['18', 'level', '']);

  // The sites list at tablet width: every chip names its level in text (WCAG 2.1, 1.4.1 Use of Color), and the
  // table fits its box, so no column header is cut off.
  await page.setViewportSize({ width: 820, height: 1180 });
  await page.goto('/sites');
  const chips = page.getByTestId('level-chip');
  await expect(chips.first()).toBeVisible();
  const ladderNames = new RegExp(`^(${DEFAULT_LADDER.map((l) => l.name).join('|')}):\\s*\\d+$`);
  for (const chip of await chips.all()) expect((await chip.innerText()).trim()).toMatch(ladderNames);
  const sitesTable = page.getByRole('table');
  const fits = await sitesTable.evaluate((t) => {
    const box = t.parentElement!.getBoundingClientRect();
    return [...t.querySelectorAll('th')].every((th) => th.getBoundingClientRect().right <= box.right + 0.5) && t.parentElement!.scrollWidth <= t.parentElement!.clientWidth;
  });
  expect(fits).toBe(true);
  await screens(page, 'register-sites');
});

test('a viewer reads a register but gets no controls to change it', async ({ page, browser }) => {
  await signUpFresh(page, 'viewer-check');
  await page.getByRole('link', { name: 'Sites', exact: true }).first().click();
  await formsReady(page);
  await page.getByLabel('Site name').fill('Read-only yard');
  await page.getByRole('textbox', { name: /^Design wind speed/ }).fill('10');
  await page.getByRole('button', { name: 'Create site' }).click();
  await expect(page.getByRole('heading', { name: 'Read-only yard' })).toBeVisible();
  const siteUrl = page.url();

  await page.goto('/members');
  await formsReady(page);
  const email = `viewer-${Date.now()}@test.example`;
  await page.getByLabel('Name', { exact: true }).fill('Val Viewer');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Role', { exact: true }).selectOption('viewer');
  await page.getByRole('button', { name: 'Invite member' }).click();
  const oneTime = (await page.getByTestId('temporary-password').textContent())!.trim();

  const context = await browser.newContext();
  const viewer = await context.newPage();
  await viewer.goto('/sign-in');
  await formsReady(viewer);
  await viewer.getByLabel('E-mail').fill(email);
  await viewer.getByLabel('Password').fill(oneTime);
  await viewer.getByRole('button', { name: 'Sign in' }).click();
  await viewer.waitForURL(/\/profile/);
  await viewer.goto(siteUrl);
  await expect(viewer.getByRole('heading', { name: 'Read-only yard' })).toBeVisible();
  await expect(viewer.getByRole('link', { name: 'Add item' })).toHaveCount(0);
  await expect(viewer.getByRole('link', { name: 'Import CSV' })).toHaveCount(0);
  await expect(viewer.getByRole('button', { name: 'Add level' })).toHaveCount(0);
  await expect(viewer.getByText('Site details and conditions')).toHaveCount(0);
  await viewer.goto(`${siteUrl}/import`);
  await expect(viewer.getByRole('heading', { name: 'Your role does not open this page' })).toBeVisible();
  await context.close();
});
