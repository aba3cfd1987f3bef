import { expect, test } from './fixtures';
import { signUpFresh } from './helpers';
import { formsReady, screens } from './screens';

// Return-path forms follow the OWASP Unvalidated Redirects and Forwards Cheat Sheet; the defaults are this
// project's own round values (lib/calculator/values.ts), and 50 °F = 10 °C is in the calculator's 0-40 °C water range.

test('a link with bad values opens with the defaults and names what it ignored', async ({ page }) => {
  await signUpFresh(page, 'links-bad');
  await page.goto('/calculator?units=si&shape=foo&mass=abc&dropHeight=12&colour=red');
  await formsReady(page);
  const note = page.getByTestId('link-ignored');
  await expect(note).toContainText('shape');
  await expect(note).toContainText('mass');
  await expect(note).toContainText('colour');
  await expect(note).not.toContainText('dropHeight');
  await expect(page.getByLabel('Shape')).toHaveValue('tumbling_box');
  await expect(page.getByRole('textbox', { name: /^Mass \(/ })).toHaveValue('5');
  await expect(page.getByLabel('Drop height')).toHaveValue('12');
  // The form is computable at once: results, not "fix the fields marked".
  await expect(page.getByTestId('fall-time')).toBeVisible();
  await expect(page.getByTestId('form-problems')).toHaveCount(0);
  await screens(page, 'links-bad-link');
});

test('US customary opens with its own round defaults, and fresh water is usable at once', async ({ page }) => {
  await signUpFresh(page, 'links-us');
  // Switching an untouched SI form gives the US defaults, not 98.4252 ft.
  await page.goto('/calculator?units=si');
  await formsReady(page);
  await page.getByRole('radio', { name: 'US customary' }).click();
  await expect(page.getByLabel('Drop height')).toHaveValue('100');
  await page.goto('/calculator?units=us');
  await formsReady(page);
  await expect(page.getByRole('textbox', { name: /^Mass \(/ })).toHaveValue('10');
  await expect(page.getByLabel('Drop height')).toHaveValue('100');
  await page.getByLabel('Falls through').selectOption('freshwater');
  await expect(page.getByLabel('Water temperature')).toHaveValue('50');
  await expect(page.getByTestId('fall-time')).toBeVisible();
  // A value out of range on the field just shown is listed above the results by name.
  await page.getByLabel('Water temperature').fill('10');
  await expect(page.getByTestId('form-problems')).toContainText('Water temperature');
  await screens(page, 'links-us-problem');
});

test('a signed-out visitor returns to the shared page after signing in, and only to this app', async ({ page }) => {
  const { email, password } = await signUpFresh(page, 'links-back');
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);

  await page.goto('/calculator?units=si&mass=3');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fcalculator%3Funits%3Dsi%26mass%3D3$/);
  await formsReady(page);
  await screens(page, 'links-sign-in-return');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/calculator\?units=si&mass=3$/);
  await expect(page.getByRole('textbox', { name: /^Mass \(/ })).toHaveValue('3');

  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await page.goto('/sign-in?next=%2F%2Fevil.example');
  await formsReady(page);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: /Welcome/ })).toBeVisible();
  await expect(page).toHaveURL(/127\.0\.0\.1:\d+\/$/);
});
