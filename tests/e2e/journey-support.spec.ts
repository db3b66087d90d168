import { expect, test } from '@playwright/test';
import { e2ePorts } from './ports';
import { signInFor } from './support/scenario';
import { signIn } from './support/sign-in';

type Inbox = { data?: { to: string[] | string; subject: string }[] } | { to: string[] | string; subject: string }[];

async function inboxFor(address: string): Promise<{ subject: string }[]> {
  const res = await fetch(`http://127.0.0.1:${e2ePorts.smtpHttp}/messages?to=${encodeURIComponent(address)}`);
  const body = (await res.json()) as Inbox;
  return Array.isArray(body) ? body : (body.data ?? []);
}

test('support finds a sizing from a mistyped tag, narrows it, reads its record and resends the datasheet e-mail', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await signIn(page, signInFor.support.email, signInFor.support.password, '/support');
  await page.goto('/support');
  await page.getByTestId('lookup-search').fill('EH 310');
  await expect(page.getByTestId('lookup-results')).toContainText('EH-301');

  const today = new Date().toISOString().slice(0, 10);
  await page.getByTestId('filter-gas').selectOption('air');
  await page.getByTestId('filter-from').fill(today);
  await page.getByTestId('filter-to').fill(today);
  await expect(page).toHaveURL(/gas=air/);
  await expect(page.getByTestId('lookup-row')).toHaveCount(1);
  await expect(page.getByTestId('lookup-row')).toContainText('Pellet dryer air heater');

  await page.getByTestId('lookup-row').getByRole('link').first().click();
  await expect(page.getByRole('heading', { name: 'Pellet dryer air heater' })).toBeVisible();
  await expect(page.getByTestId('datasheet-revisions')).toContainText(/DS\d{2}-\d+/);
  await expect(page.getByTestId('audit-trail')).toContainText('datasheet.issued');

  const before = (await inboxFor('olu.bennet@tarnside.example')).length;
  await page.getByTestId('resend-datasheet-email').click();
  await expect(page.getByTestId('resend-result')).toContainText('Copy queued to olu.bennet@tarnside.example');
  await expect
    .poll(async () => (await inboxFor('olu.bennet@tarnside.example')).length, { timeout: 30_000 })
    .toBeGreaterThan(before);
  const latest = (await inboxFor('olu.bennet@tarnside.example')).at(-1);
  expect(latest?.subject).toMatch(/Copy: Datasheet DS\d{2}-\d+ rev\. [A-Z]+/);

  // the look-up itself is on record
  await page.reload();
  await expect(page.getByTestId('audit-trail')).toContainText('datasheet.email_resent');
});
