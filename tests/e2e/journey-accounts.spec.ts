import Papa from 'papaparse';
import { expect, test } from '@playwright/test';
import { batchColumnNames } from '../../lib/batch/columns';
import { linkFromInbox } from './support/inbox';
import { query, signInFor } from './support/scenario';
import { signIn } from './support/sign-in';
import { formatHeadline } from '@/lib/sizings/headline';
import { chooseAccount } from './support/choose-account';

const suffix = Date.now().toString(36);
const company = `Brackwater Maltings ${suffix}`;
const customerEmail = `rhona.dale.${suffix}@brackwater.example`;

function enquiryCsv(): Buffer {
  const rows: Record<string, string>[] = [
    {
      service: 'heater',
      title: 'Kiln air heater',
      equipment_tag: `BW-EH-${suffix}`,
      gas: 'air',
      flow_value: '3500',
      flow_unit: 'kg/h',
      inlet_temperature_value: '12',
      inlet_temperature_unit: 'degC',
      inlet_pressure_value: '0.5',
      inlet_pressure_unit: 'barg',
      outlet_temperature_value: '95',
      outlet_temperature_unit: 'degC',
      heat_loss_percent: '5',
      design_margin_percent: '10',
      supply_voltage_v: '400',
      supply_phases: '3',
    },
    {
      service: 'compressor',
      title: 'CO2 recovery compressor',
      equipment_tag: `BW-K-${suffix}`,
      gas: 'carbon-dioxide',
      flow_value: '300',
      flow_unit: 'kg/h',
      inlet_temperature_value: '20',
      inlet_temperature_unit: 'degC',
      inlet_pressure_value: '1.05',
      inlet_pressure_unit: 'bar',
      discharge_pressure_value: '18',
      discharge_pressure_unit: 'bar',
      stages: '2',
      isentropic_efficiency: '0.75',
      intercooler_outlet_temperature_value: '30',
      intercooler_outlet_temperature_unit: 'degC',
    },
  ];
  return Buffer.from(
    Papa.unparse({ fields: batchColumnNames, data: rows.map((r) => batchColumnNames.map((c) => r[c] ?? '')) }),
  );
}

test('a sales engineer opens an account and quotes two sizings; the customer sees exactly that; support finds it; another customer cannot', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const se = await browser.newPage();
  await signIn(se, signInFor.sales_engineer.email, signInFor.sales_engineer.password, '/accounts/new');

  // 1. a new customer account for the prospect
  await se.goto('/accounts/new');
  await se.getByLabel('Company', { exact: true }).fill(company);
  await se.getByLabel('Site', { exact: true }).fill('Brackwater kiln house');
  await se.getByLabel('Billing contact name').fill('Rhona Dale');
  await se.getByLabel('Billing contact e-mail').fill(customerEmail);
  await se.getByRole('button', { name: 'Create customer account' }).click();
  await expect(se).toHaveURL(/\/accounts\/[0-9a-f-]{36}$/);
  await expect(se.getByTestId('account-details')).toContainText('Brackwater kiln house');
  const accountUrl = se.url();

  // 2. two sizings from an enquiry sheet, straight onto a new quote
  await se.goto('/batch');
  await se.getByTestId('batch-file').setInputFiles({ name: 'enquiry.csv', mimeType: 'text/csv', buffer: enquiryCsv() });
  await se.getByTestId('batch-check').click();
  await expect(se.getByTestId('batch-summary')).toContainText('2 rows sized');
  await chooseAccount(se.getByTestId('batch-account'), company);
  await se.getByTestId('batch-quote-title').fill('Kiln house heat and gas');
  await se.getByTestId('batch-save').click();
  await expect(se.getByTestId('batch-saved')).toContainText('Saved 2 sizings to quote Q');
  const quoteNumber = (await se.getByTestId('batch-saved').textContent())!.match(/Q\d{2}-\d+/)![0];
  const [quote] = await query<{ id: string }>('select id from quotes where number = $1', [quoteNumber]);
  // A customer sees a quote once it is sent (drafts stay internal): mark it sent.
  await se.goto(`/quotes/${quote!.id}`);
  await se.getByLabel('Mark quote as').selectOption('sent');
  await se.getByRole('button', { name: 'Change status' }).click();
  await expect
    .poll(
      async () => (await query<{ status: string }>('select status from quotes where id = $1', [quote!.id]))[0]?.status,
    )
    .toBe('sent');

  // 3. invite the customer, who joins through the link
  await se.goto(accountUrl);
  await se.getByLabel('E-mail of the person to invite').fill(customerEmail);
  await se.getByRole('button', { name: 'Send invitation' }).click();
  await expect(se.getByTestId('invite-sent')).toContainText(customerEmail);
  // The invitee follows the link in their own inbox, as outside demo mode.
  const inviteUrl = await linkFromInbox(customerEmail, /You are invited/, /http:\/\/\S+\/invite\/[\w-]+/);
  const customerCtx = await browser.newContext();
  const customer = await customerCtx.newPage();
  await customer.goto(inviteUrl!);
  await customer.getByLabel('Your name').fill('Rhona Dale');
  await customer.getByLabel('Choose a password').fill('malt-and-steam-2026');
  await customer.getByRole('button', { name: 'Join the customer account' }).click();
  await expect(customer).toHaveURL(/\/size/);
  await customer.goto('/quotes');
  const rows = customer.locator('tbody tr');
  await expect(rows).toHaveCount(1);
  await expect(rows.first()).toContainText(quoteNumber);
  await customer.goto(`/quotes/${quote!.id}`);
  await expect(customer.getByText('Kiln air heater')).toBeVisible();
  await expect(customer.getByText('CO2 recovery compressor')).toBeVisible();
  const [heater] = await query<{ kw: number }>(
    "select s.headline_kw as kw from sizings s join quote_items qi on qi.sizing_id = s.id where qi.quote_id = $1 and s.service = 'heater'",
    [quote!.id],
  );
  await expect(customer.getByTestId('quote-totals')).toContainText(
    `heaters, 1 unit: ${formatHeadline('heater', Number(heater!.kw))}`,
  );
  await expect(customer.getByTestId('quote-totals')).toContainText('compressors, 1 unit:');

  // 4. support finds it from part of the customer's name
  const supportCtx = await browser.newContext();
  const support = await supportCtx.newPage();
  await signIn(support, signInFor.support.email, signInFor.support.password, '/support');
  await support.goto('/support');
  await support.getByTestId('lookup-search').fill(`Brackwater ${suffix}`);
  await expect(support.getByTestId('lookup-row')).toHaveCount(2);
  await expect(support.getByTestId('lookup-results')).toContainText(quoteNumber);

  // 5. a customer of another account gets not-found for that quote
  const otherCtx = await browser.newContext();
  const other = await otherCtx.newPage();
  await signIn(other, signInFor.customer.email, signInFor.customer.password, '/quotes');
  const res = await other.goto(`/quotes/${quote!.id}`);
  expect(res?.status()).toBe(404);
  await other.goto('/quotes');
  await expect(other.locator('body')).not.toContainText(quoteNumber);
});
