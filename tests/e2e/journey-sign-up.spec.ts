import { expect, test } from '@playwright/test';
import { linkFromInbox } from './support/inbox';
import { signIn } from './support/sign-in';

const suffix = Date.now().toString(36);
const email = `wren.albright.${suffix}@saltmarsh.example`;
const password = 'brine-and-steam-2026';

test('a customer signs up, confirms the address from the mailed link, signs in, and a reset link signs out the old session', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const page = await browser.newPage();
  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill('Wren Albright');
  await page.getByLabel('Work e-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByLabel('Company', { exact: true }).fill(`Saltmarsh Evaporators ${suffix}`);
  await page.getByRole('button', { name: 'Create customer account' }).click();
  await expect(page.getByTestId('sign-up-sent')).toContainText(email);

  // Not active yet: the password alone does not open the desk.
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('form-error')).toContainText('Confirm your e-mail address');

  // The refused sign-in mailed a fresh link, which replaces the first: wait for both, use the newest.
  const verify = await linkFromInbox(email, /Confirm your e-mail address/, /http:\/\/\S+\/verify\/[\w-]+/, 2);
  await page.goto(verify);
  await page.getByRole('button', { name: 'Confirm my e-mail address' }).click();
  await expect(page.getByTestId('email-verified')).toBeVisible();
  await signIn(page, email, password, '/sizings');
  await expect(page).toHaveURL(/\/sizings/);

  // A password reset from another browser ends the session this one holds.
  const other = await (await browser.newContext()).newPage();
  await other.goto('/forgot-password');
  await other.getByLabel('E-mail').fill(email);
  await other.getByRole('button', { name: 'Send me a reset link' }).click();
  await expect(other.getByTestId('reset-sent')).toBeVisible();
  const reset = await linkFromInbox(email, /Choose a new Dutywise password/, /http:\/\/\S+\/reset-password\/[\w-]+/);
  await other.goto(reset);
  await other.getByLabel('New password', { exact: true }).fill('fresh-brine-2027');
  await other.getByRole('button', { name: 'Set the new password' }).click();
  await expect(other.getByTestId('password-reset-done')).toBeVisible();
  await page.goto('/sizings');
  await expect(page).toHaveURL(/\/sign-in/);
  await signIn(other, email, 'fresh-brine-2027', '/sizings');
});
