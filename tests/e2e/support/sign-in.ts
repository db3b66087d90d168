import { expect, type Page } from '@playwright/test';

/** Signs in through the sign-in page as a person would. */
export async function signIn(page: Page, email: string, password: string, next = '/size') {
  await page.goto(`/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('signed-in-as')).toBeVisible();
}
