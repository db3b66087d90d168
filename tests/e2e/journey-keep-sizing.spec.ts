import { expect, test, type Page } from '@playwright/test';
import { linkFromInbox } from './support/inbox';

async function deskReady(page: Page) {
  await expect(page.getByTestId('sizing-desk')).toHaveAttribute('data-hydrated', 'true');
}

test('a prospect keeps their sizing through reload, Back and creating an account', async ({ page }) => {
  test.setTimeout(90_000);
  const suffix = Date.now().toString(36);
  await page.goto('/pricing');
  await page.goto('/size');
  await deskReady(page);
  await page.getByTestId('field-flow').fill('2345');
  await page.getByTestId('eos-peng-robinson').check();
  await expect(page.getByTestId('result-panel')).toHaveAttribute('data-state', 'ready', { timeout: 20_000 });
  await expect(page).toHaveURL(/[?&]i=1\./);

  await page.reload();
  await deskReady(page);
  await expect(page.getByTestId('field-flow')).toHaveValue('2345');
  await expect(page.getByTestId('eos-peng-robinson')).toBeChecked();
  await expect(page.getByTestId('desk-notices')).toHaveCount(0);

  // Back leaves the desk; Forward returns to the same inputs.
  await page.goBack();
  await expect(page).toHaveURL(/\/pricing/);
  await page.goForward();
  await deskReady(page);
  await expect(page.getByTestId('field-flow')).toHaveValue('2345');

  // "Create an account" from the desk, then sign-up, the mailed confirmation and sign-in bring the inputs back.
  const email = `wren.ashby.${suffix}@fellmoor.example`;
  const password = 'a-long-enough-password';
  await page.getByTestId('create-account-to-save').click();
  await expect(page).toHaveURL(/\/sign-up\?next=/);
  await page.getByLabel('Your name').fill('Wren Ashby');
  await page.getByLabel('Work e-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByLabel('Company', { exact: true }).fill(`Fellmoor Dairy ${suffix}`);
  await page.getByRole('button', { name: 'Create customer account' }).click();
  await expect(page.getByTestId('sign-up-sent')).toContainText(email);
  const verify = await linkFromInbox(
    email,
    /Confirm your e-mail address/,
    /http:\/\/\S+\/verify\/[\w-]+\?next=[\w%.~-]+/,
  );
  await page.goto(verify);
  await page.getByRole('button', { name: 'Confirm my e-mail address' }).click();
  await page.getByTestId('verified-sign-in').click();
  await expect(page).toHaveURL(/\/sign-in\?next=/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => url.pathname === '/size' && url.searchParams.has('i'));
  await deskReady(page);
  await expect(page.getByTestId('field-flow')).toHaveValue('2345');
  await expect(page.getByTestId('eos-peng-robinson')).toBeChecked();
  await expect(page.getByTestId('save-submit')).toBeVisible();
});

test('the sign-in page’s Create an account link carries the desk’s inputs too', async ({ page }) => {
  await page.goto('/size');
  await deskReady(page);
  await page.getByTestId('field-flow').fill('1750');
  await expect(page).toHaveURL(/[?&]i=1\./);
  await page.getByTestId('sign-in-to-save').click();
  await expect(page).toHaveURL(/\/sign-in\?next=/);
  const href = (await page.getByTestId('create-account-link').getAttribute('href')) ?? '';
  const next = new URL(href, 'http://x').searchParams.get('next') ?? '';
  expect(next.startsWith('/size?i=1.')).toBe(true);
});
