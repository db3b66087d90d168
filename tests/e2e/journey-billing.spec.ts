import { expect, test, type Page } from '@playwright/test';
import { demoSignIns, DEMO_PASSWORD } from '../../lib/auth/demo-users';
import { e2ePorts } from './ports';
import { query } from './support/scenario';
import { signIn } from './support/sign-in';

const marta = demoSignIns.find((u) => u.email.startsWith('marta.quill'))!;

async function payWith(page: Page, card: string) {
  // The checkout page fills the e-mail from the customer record and may lock it.
  const email = page.getByLabel('Email');
  if (await email.isEditable()) await email.fill(marta.email);
  await page.getByLabel('Card number').fill(card);
  await page.getByLabel('Expiry (MM/YY)').fill('12/39');
  await page.getByLabel('CVC').fill('123');
  await page.getByLabel('Name on card').fill('Marta Quill');
  await page.getByRole('button', { name: /Pay .* and subscribe/ }).click();
}

test('a customer unlocks datasheets by subscribing; a declined card leaves them locked; cancelling locks at period end', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await signIn(page, marta.email, DEMO_PASSWORD, '/datasheets');

  // Locked at first: the list and a preview, no download.
  await page.goto('/datasheets');
  await expect(page.getByTestId('datasheet-locked').first()).toBeVisible();
  await expect(page.getByTestId('datasheet-download')).toHaveCount(0);

  // The decline card: a clear message at checkout, nothing unlocked.
  await page.goto('/billing');
  await page.getByRole('button', { name: 'Subscribe: Desk monthly' }).click();
  await expect(page).toHaveURL(new RegExp(`:${e2ePorts.stripe}/`));
  await payWith(page, '4000 0000 0000 0002');
  await expect(page.getByRole('alert')).toContainText('Your card was declined.');
  await page.getByRole('link', { name: 'Back without paying' }).click();
  await expect(page.getByTestId('checkout-cancelled')).toContainText('nothing was charged');
  await expect(page.getByTestId('subscription-status')).toContainText('locked');

  // The success card: the signed webhook arrives and the datasheets unlock.
  await page.getByRole('button', { name: 'Subscribe: Desk monthly' }).click();
  await payWith(page, '4242 4242 4242 4242');
  await expect(page).toHaveURL(/\/billing\?checkout=success/);
  await expect(page.getByTestId('subscription-status')).toContainText('Active', { timeout: 20_000 });
  await page.goto('/datasheets');
  const download = page.waitForEvent('download');
  await page.getByTestId('datasheet-download').first().click();
  const file = await download;
  const bytes = await (await file.createReadStream())!.toArray();
  expect(Buffer.concat(bytes).subarray(0, 5).toString()).toBe('%PDF-');

  // Cancel in the portal: still unlocked until the period ends, locked after.
  await page.goto('/billing');
  await page.getByRole('button', { name: 'Change or cancel' }).click();
  await page.getByRole('button', { name: 'Cancel at period end' }).click();
  await page.getByRole('link', { name: 'Back to Dutywise' }).click();
  await expect(page.getByTestId('subscription-status')).toContainText('Cancelled at period end', { timeout: 20_000 });
  const [sub] = await query<{ id: string }>(
    "select s.stripe_subscription_id as id from subscriptions s join accounts a on a.id = s.account_id where a.name = 'Greyfen Biogas' order by s.updated_at desc limit 1",
  );
  await fetch(`http://127.0.0.1:${e2ePorts.stripe}/_control/subscriptions/${sub!.id}/advance-period-end`, {
    method: 'POST',
  });
  await expect
    .poll(
      async () =>
        (
          await query<{ status: string }>('select status from subscriptions where stripe_subscription_id = $1', [
            sub!.id,
          ])
        )[0]?.status,
      { timeout: 20_000 },
    )
    .toBe('canceled');
  await page.goto('/datasheets');
  await expect(page.getByTestId('datasheet-locked').first()).toBeVisible();
  await expect(page.getByTestId('datasheet-download')).toHaveCount(0);
});
