import { expect, test } from './fixtures';
import { toDropCase } from '@/lib/calculator/drop-case';
import { DEFAULT_VALUES } from '@/lib/calculator/values';
import { simulateDrop } from '@/lib/physics';
import { formatNumber, fromSI } from '@/lib/units';
import { signUpFresh } from './helpers';
import { formsReady, screens } from './screens';

// The expected figures come from the physics core itself, run here in the test process; the browser must show them.
const steelBoxInWind = toDropCase({ ...DEFAULT_VALUES, massSource: 'material', material: 'steel', wind: '10' });
const expected = simulateDrop(steelBoxInWind);

test('a steel box dropped 30 m in a 10 m/s wind, in SI and US units, shared by link', async ({ page, context }) => {
  await signUpFresh(page, 'calc');
  await page.getByRole('link', { name: 'Drop calculator' }).first().click();
  await formsReady(page);

  await page.getByLabel('From material and size').check();
  await page.getByLabel('Material', { exact: true }).selectOption('steel');
  await expect(page.getByLabel('Object properties')).toContainText('47.1 kg');
  await page.getByLabel('Drop height').fill('30');
  await page.getByLabel('Wind speed').fill('10');

  const fall = page.getByTestId('fall-time');
  await expect(fall).toContainText(formatNumber(expected.fall_time_s, 3));
  await expect(fall).toContainText('s');
  await expect(page.getByTestId('impact-energy')).toContainText(formatNumber(expected.effective_impact_energy_j, 3));
  await expect(page.getByTestId('impact-speed')).toContainText(formatNumber(expected.impact_speed_m_s, 3));
  await expect(page.getByTestId('drift')).toContainText(formatNumber(Math.abs(expected.drift_m), 3));
  await expect(page.getByTestId('verification')).toContainText('No closed form covers this case');
  await expect(page.getByLabel('Safety caution')).toBeVisible();
  await expect(page.getByText('Impact energy among published reference energies')).toBeVisible();
  await page.waitForSelector('.js-plotly-plot');
  await screens(page, 'calculator-si');

  await page.getByRole('radio', { name: 'US customary' }).click();
  await expect(page.getByLabel('Drop height')).toHaveValue('98.4252');
  await expect(page.getByTestId('impact-energy')).toContainText('ft·lbf');
  await expect(page.getByTestId('impact-energy')).toContainText(formatNumber(fromSI('energy', expected.effective_impact_energy_j, 'us'), 3));
  await expect(fall).toContainText(formatNumber(expected.fall_time_s, 3));
  await screens(page, 'calculator-us');
  await page.getByRole('radio', { name: 'SI', exact: true }).click();
  await expect(page.getByLabel('Drop height')).toHaveValue('30');
  await expect(page.getByTestId('impact-energy')).toContainText(formatNumber(expected.effective_impact_energy_j, 3));

  const link = page.url();
  expect(link).toContain('wind=10');
  const second = await context.newPage();
  await second.goto(link);
  await expect(second.getByTestId('fall-time')).toContainText(formatNumber(expected.fall_time_s, 3));
  await expect(second.getByTestId('drift')).toContainText(formatNumber(Math.abs(expected.drift_m), 3));
  await second.close();

  // In still air from rest a closed form covers the fall, and the server's answer carries its curve for the plot.
  await page.getByLabel('Wind speed').fill('0');
  await expect(page.getByTestId('verification')).not.toContainText('No closed form covers this case');
  await expect(page.locator('.js-plotly-plot').getByText('Closed form', { exact: true })).toBeVisible();
  await expect(page.getByLabel('Object properties')).toContainText('0.055 m²');
  await screens(page, 'calculator-still-air');

  await page.getByLabel('Mass known').check();
  await page.getByRole('textbox', { name: /^Mass \(/ }).fill('-3');
  // The message shows under the field and again, by name, in the note where the results would be.
  await expect(page.getByRole('form', { name: 'Drop case' }).getByText('Mass must be greater than 0 kg.')).toBeVisible();
  await expect(page.getByTestId('fall-time')).toHaveCount(0);
  await expect(page.getByText('Fix the fields marked in the form')).toBeVisible();
  await expect(page.getByTestId('form-problems')).toContainText('Mass must be greater than 0 kg.');
  await screens(page, 'calculator-bad-mass');
});

test('a fall from a deck through seawater shows the water layer and the effective energy', async ({ page }) => {
  await signUpFresh(page, 'sea');
  await page.goto('/calculator?units=si&path=deck_to_sea&airGap=20&waterDepth=60&shape=cylinder_side_on&length=1.5&diameter=0.2&mass=120');
  await formsReady(page);
  await expect(page.getByTestId('impact-energy')).toBeVisible();
  await expect(page.getByText('Effective impact energy')).toBeVisible();
  await expect(page.getByText(/Layer 2, seawater/)).toBeVisible();
  await page.waitForSelector('.js-plotly-plot');
  await screens(page, 'calculator-deck-to-seabed');
});

test('a sheet that floats shows its arrival at the sea surface and names that surface', async ({ page }) => {
  await signUpFresh(page, 'float');
  // 15 kg in 0.052 m³ (2.4 × 1.2 × 0.018 m) is lighter than the seawater it displaces, so it stops at the surface.
  await page.goto('/calculator?units=si&path=deck_to_sea&airGap=100&waterDepth=60&shape=flat_plate&width=2.4&height=1.2&thickness=0.018&mass=15');
  await formsReady(page);
  await expect(page.getByTestId('floats')).toContainText('It floats in the seawater');
  await expect(page.getByText('Warning time (to the surface it floats at)')).toBeVisible();
  await expect(page.getByTestId('impact-energy')).toBeVisible();
  await expect(page.getByTestId('impact-speed')).toBeVisible();
  await expect(page.getByText(/top of layer/)).toHaveCount(0);
  await screens(page, 'calculator-floating-sheet');
});
