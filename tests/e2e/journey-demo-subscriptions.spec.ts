import { expect, test, type Page } from '@playwright/test';
import { formatDate } from '../../app/_components/format';
import { demoSignIns, DEMO_PASSWORD } from '../../lib/auth/demo-users';
import { subscriptionLabels } from '../../lib/billing/labels';
import { e2eBaseUrl, e2ePorts } from './ports';
import { linkFromInbox } from './support/inbox';
import { query } from './support/scenario';
import { signIn } from './support/sign-in';

// The demo's three subscription states (db/seed-scenario-billing.ts, made by db/seed-billing.ts), as each customer
// sees them. These accounts belong to no other journey, so their states hold whatever ran before.
const who = (email: string) => demoSignIns.find((u) => u.email === email)!;
const active = who('aster.penhallow@cobbleford.example');
const pastDue = who('ludo.sarratt@wrayburn.example');
const never = who('nell.oyelaran@lowmere.example');
// The app in the journeys runs with the default grace period (lib/env.ts, BILLING_GRACE_DAYS).
const GRACE_DAYS = 7;

async function downloadsPdf(page: Page) {
  await page.goto('/datasheets');
  const download = page.waitForEvent('download');
  await page.getByTestId('datasheet-download').first().click();
  const bytes = await (await (await download).createReadStream())!.toArray();
  expect(Buffer.concat(bytes).subarray(0, 5).toString()).toBe('%PDF-');
}

test('the sign-in page offers a customer of each subscription state', async ({ page }) => {
  await page.goto('/sign-in');
  const panel = page.getByTestId('demo-sign-ins');
  for (const u of [active, pastDue, never]) {
    await expect(panel.getByRole('row', { name: new RegExp(u.email.replace(/\./g, '\\.')) })).toContainText(u.label);
  }
});

test('demo subscriptions: active downloads and manages, past due keeps downloads until its grace ends, never is sent to subscribe', async ({
  browser,
}) => {
  test.setTimeout(120_000);

  // Active: the download works, the page says so, and the payment portal opens for this customer.
  const a = await (await browser.newContext()).newPage();
  await signIn(a, active.email, DEMO_PASSWORD, '/datasheets');
  await downloadsPdf(a);
  await a.goto('/billing');
  await expect(a.getByTestId('subscription-status')).toHaveText(
    `${subscriptionLabels.active}: datasheets are unlocked.`,
  );
  await expect(a.getByText(/^Renews on \d{4}-\d{2}-\d{2}$/)).toBeVisible();
  await a.getByRole('button', { name: 'Change or cancel' }).click();
  await expect(a).toHaveURL(new RegExp(`:${e2ePorts.stripe}/manage/`));
  await expect(a.locator('body')).toContainText(active.email);
  await expect(a.getByRole('button', { name: 'Cancel at period end' })).toBeVisible();
  await a.context().close();

  // Past due: Dutywise's words for the state, the grace end date, and downloads still unlocked.
  const [due] = await query<{ since: Date }>(
    `select s.past_due_since as since from subscriptions s join accounts a on a.id = s.account_id
      where a.name = 'Wrayburn Kilnworks' order by s.updated_at desc limit 1`,
  );
  expect(due?.since, 'the demo gives Wrayburn Kilnworks a failed renewal').toBeTruthy();
  const graceEnds = formatDate(new Date(due!.since.getTime() + GRACE_DAYS * 86_400_000));
  const p = await (await browser.newContext()).newPage();
  await signIn(p, pastDue.email, DEMO_PASSWORD, '/billing');
  await p.goto('/billing');
  await expect(p.getByTestId('subscription-status')).toContainText(
    `${subscriptionLabels.grace}: datasheets stay unlocked`,
  );
  await expect(p.getByTestId('grace-ends')).toContainText(`Grace period ends on ${graceEnds}`);
  await expect(p.locator('main')).not.toContainText('past_due');
  await downloadsPdf(p);
  await p.context().close();
  // The failed renewal reached the app as the payment service's event: its billing contact was told, with the way back.
  const billing = await linkFromInbox(pastDue.email, /subscription payment failed/, /http\S+\/billing/);
  expect(billing).toBe(`${e2eBaseUrl}/billing`);

  // Never subscribed: the datasheet is locked, and its download link lands on the subscription page.
  const [revision] = await query<{ id: string }>(
    `select r.id from datasheet_revisions r join datasheets d on d.id = r.datasheet_id
      join accounts a on a.id = d.account_id where a.name = 'Lowmere Water' limit 1`,
  );
  expect(revision, 'the demo issues Lowmere Water a datasheet').toBeTruthy();
  const n = await (await browser.newContext()).newPage();
  await signIn(n, never.email, DEMO_PASSWORD, '/datasheets');
  await n.goto('/datasheets');
  await expect(n.getByTestId('datasheet-locked').first()).toBeVisible();
  await expect(n.getByTestId('datasheet-download')).toHaveCount(0);
  await n.goto(`/api/v1/datasheets/${revision!.id}`);
  await expect(n).toHaveURL(/\/billing\?locked=datasheet/);
  await expect(n.getByTestId('datasheet-locked')).toContainText('That datasheet is locked');
  await expect(n.getByTestId('subscription-status')).toContainText(
    `${subscriptionLabels.none}: datasheets are locked.`,
  );
  await expect(n.getByRole('button', { name: /^Subscribe: / }).first()).toBeVisible();
  await n.context().close();
});
