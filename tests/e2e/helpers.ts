import { expect, type Page } from '@playwright/test';
import { formsReady } from './screens';

let counter = 0;

/** A new organisation and its admin, signed in; each call makes a fresh one so tests never share state. */
export async function signUpFresh(page: Page, label: string): Promise<{ email: string; password: string }> {
  const email = `e2e-${label}-${Date.now()}-${counter++}@test.example`;
  const password = 'e2e-long-password';
  await page.goto('/sign-up');
  await formsReady(page);
  await page.getByLabel('Organisation').fill(`Test crew ${label}`);
  await page.getByLabel('Your name').fill('Test Engineer');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Create organisation' }).click();
  await expect(page.getByRole('heading', { name: /Welcome/ })).toBeVisible();
  return { email, password };
}
