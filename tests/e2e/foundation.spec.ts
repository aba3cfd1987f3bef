import { expect, test } from './fixtures';
import { formsReady, screens } from './screens';

const stamp = Date.now();
const admin = { email: `e2e-admin-${stamp}@test.example`, password: 'e2e-admin-password' };
const viewer = { email: `e2e-viewer-${stamp}@test.example`, name: 'Vic Viewer' };

test('sign up, sign out, sign in, invite a viewer who is refused the members page', async ({ page }) => {
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in$/);
  await screens(page, 'sign-in');

  await page.getByRole('link', { name: 'Set up your organisation' }).click();
  await formsReady(page);
  await page.getByRole('button', { name: 'Create organisation' }).click();
  await expect(page.getByText('Organisation name must be at least 2 characters.')).toBeVisible();
  await screens(page, 'sign-up-errors');

  await page.getByLabel('Organisation').fill('Fathom Deck Crews (test)');
  await page.getByLabel('Your name').fill('Eda Admin');
  await page.getByLabel('E-mail').fill(admin.email);
  await page.getByLabel('Password').fill(admin.password);
  await page.getByRole('button', { name: 'Create organisation' }).click();
  await expect(page.getByRole('heading', { name: 'Welcome, Eda Admin' })).toBeVisible();
  await expect(page.getByLabel('Safety caution')).toBeVisible();
  await screens(page, 'home-admin');

  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await formsReady(page);

  await page.getByLabel('E-mail').fill(admin.email);
  await page.getByLabel('Password').fill('wrong-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByText('That e-mail and password do not match an account.')).toBeVisible();
  await page.getByLabel('Password').fill(admin.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: 'Welcome, Eda Admin' })).toBeVisible();

  await page.getByRole('link', { name: 'Members', exact: true }).click();
  await formsReady(page);
  const invite = page.getByRole('form', { name: 'Invite a member' });
  await invite.getByLabel('Name').fill(viewer.name);
  await invite.getByLabel('E-mail').fill(viewer.email);
  await invite.getByLabel('Role').selectOption('viewer');
  await invite.getByRole('button', { name: 'Invite member' }).click();
  const secret = (await page.getByTestId('temporary-password').textContent())?.trim() ?? '';
  expect(secret).toMatch(/^[A-Za-z2-9]{14}$/);
  await expect(page.getByText(viewer.email, { exact: true })).toBeVisible();
  await screens(page, 'members');

  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await formsReady(page);
  await page.getByLabel('E-mail').fill(viewer.email);
  await page.getByLabel('Password').fill(secret);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/profile\?welcome=1$/);
  await expect(page.getByText('You signed in with a one-time password.')).toBeVisible();
  await formsReady(page);
  await screens(page, 'profile-first-sign-in');

  const pw = page.getByRole('form', { name: 'Change password' });
  await pw.getByLabel('Current password').fill(secret);
  await pw.getByLabel('New password', { exact: true }).fill('viewer-own-password');
  await pw.getByLabel('Repeat the new password').fill('viewer-own-password');
  await pw.getByRole('button', { name: 'Change password' }).click();
  await expect(page.getByText('Password changed.')).toBeVisible();

  await expect(page.getByRole('link', { name: 'Members', exact: true })).toHaveCount(0);
  const refused = await page.goto('/members');
  expect(refused?.status()).toBe(403);
  await expect(page.getByRole('heading', { name: 'Your role does not open this page' })).toBeVisible();
  await expect(page.getByRole('form', { name: 'Invite a member' })).toHaveCount(0);
  await screens(page, 'members-forbidden-viewer');
});
