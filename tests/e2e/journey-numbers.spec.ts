import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD } from '../../lib/auth/demo-users';
import { query, signInFor } from './support/scenario';
import { signIn } from './support/sign-in';

const RAW_PROVIDER_STATES = /past.due|incomplete|trialing|canceled|unpaid/i;

test('numbers agree: list counts equal the account page; states in our words; US units on the desk; ambiguous numbers refused', async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  await signIn(page, signInFor.sales_engineer.email, signInFor.sales_engineer.password, '/accounts');
  const row = page.getByTestId('accounts-table').locator('tr', { hasText: 'Tarnside Polymers' });
  const cells = row.locator('td');
  const listQuotes = Number(await cells.nth(3).textContent());
  const listSizings = Number(await cells.nth(4).textContent());
  const listState = (await row.getByTestId('subscription-badge').textContent()) ?? '';
  const [db] = await query<{ quotes: number; sizings: number }>(
    `select (select count(*)::int from quotes q where q.account_id = a.id) as quotes,
            (select count(*)::int from sizings s where s.account_id = a.id) as sizings
       from accounts a where a.name = 'Tarnside Polymers'`,
  );
  expect(listQuotes).toBe(db!.quotes);
  expect(listQuotes).toBeGreaterThan(0);
  expect(listSizings).toBe(db!.sizings);
  expect(listState).not.toMatch(RAW_PROVIDER_STATES);
  await row.getByRole('link', { name: 'Tarnside Polymers' }).click();
  await expect(page.getByTestId('account-quote-count')).toHaveText(String(listQuotes));
  await expect(page.getByTestId('account-sizing-count')).toHaveText(String(listSizings));
  await expect(page.getByTestId('account-figures').getByTestId('subscription-badge')).toHaveText(listState);
  await expect(page.getByTestId('sizings-table')).toContainText('Air (dry)');

  // A US customary customer: the account's units become its people's desk defaults, site pressure included.
  await page.goto('/accounts');
  await page.getByRole('link', { name: 'Oakhollow Glassworks' }).click();
  await page.getByText('Edit details').click();
  await page.getByLabel('Units for datasheets, e-mails and the desk').selectOption('us');
  await page.getByRole('button', { name: 'Save changes' }).click();
  await expect(page.getByTestId('account-details')).toContainText('US customary');

  const customer = await browser.newPage();
  await signIn(customer, 'dev.hartigan@oakhollow.example', DEMO_PASSWORD, '/size');
  await expect(customer.getByTestId('sizing-desk')).toHaveAttribute('data-hydrated', 'true');
  await expect(customer.getByTestId('field-flow-unit')).toHaveValue('lb/h');
  await expect(customer.getByTestId('field-site-barometricPressure-unit')).toHaveValue('psia');
  await expect(customer.getByTestId('result-panel')).toHaveAttribute('data-state', 'ready', { timeout: 20_000 });
  const warnings = customer.getByTestId('warnings');
  await expect(warnings).toContainText('°F');
  await expect(warnings).not.toContainText('°C');

  // "1.000" is refused as ambiguous rather than read as 1 lb/h.
  await customer.getByTestId('field-flow').fill('1.000');
  await expect(customer.getByTestId('error-flow')).toContainText('could be 1 or 1000');
  await expect(customer.getByTestId('result-panel')).toHaveAttribute('data-state', 'invalid');
  await customer.close();
});
