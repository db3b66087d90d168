import { expect, test } from '@playwright/test';
import { e2ePorts } from './ports';
import { query, signInFor } from './support/scenario';
import { signIn } from './support/sign-in';

const inbox = `http://127.0.0.1:${e2ePorts.smtpHttp}`;

/** The invitation link in the newest message to `to`, once the job worker has delivered it. */
async function invitationLink(to: string): Promise<string | null> {
  const list = (await (await fetch(`${inbox}/messages?to=${encodeURIComponent(to)}`)).json()) as {
    data: { id: string }[];
  };
  const last = list.data.at(-1);
  if (!last) return null;
  const full = (await (await fetch(`${inbox}/messages/${encodeURIComponent(last.id)}`)).json()) as { text?: string };
  return /\/invite\/[A-Za-z0-9_-]+/.exec(full.text ?? '')?.[0] ?? null;
}

test('people: an admin invites staff with a role, searches, confirms role changes and reads the audit trail in words', async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  const suffix = Date.now().toString(36);
  const email = `cole.varga.${suffix}@halvard.example`;
  await signIn(page, signInFor.admin.email, signInFor.admin.password, '/admin');

  await page.getByTestId('invite-staff').getByLabel('E-mail').fill(email);
  await page.getByTestId('invite-staff').getByLabel('Role').selectOption('support');
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByTestId('form-notice')).toContainText(`Invitation sent to ${email} as Support`);

  let link: string | null = null;
  await expect.poll(async () => (link = await invitationLink(email)), { timeout: 30_000 }).not.toBeNull();
  const staff = await browser.newPage();
  await staff.goto(link!);
  await expect(staff.getByRole('heading', { level: 1 })).toHaveText('Join the Dutywise team');
  await expect(staff.locator('main')).toContainText('Support');
  await staff.getByLabel('Your name').fill('Cole Varga');
  await staff.getByLabel('Choose a password').fill('a-long-enough-password');
  await staff.locator('form').getByRole('button', { name: /^Join/ }).click();
  await staff.waitForURL((url) => url.pathname === '/support');
  await staff.close();

  // Search, then change the new person's role: nothing changes until confirmed, and the page says what changed.
  await page.getByTestId('people-search').fill('Cole Varga');
  await page.getByRole('button', { name: 'Search' }).click();
  await expect(page.getByTestId('people-table').locator('tbody tr')).toHaveCount(1);
  await page.getByLabel('Role of Cole Varga').selectOption('sales_engineer');
  await page.getByRole('button', { name: 'Change', exact: true }).click();
  await expect(page.getByTestId('confirm-step')).toContainText('Change Cole Varga from Support to Sales engineer?');
  await page.getByRole('button', { name: 'Cancel' }).click();
  const [before] = await query<{ role: string }>('select role from users where email = $1', [email]);
  expect(before!.role).toBe('support');
  await page.getByLabel('Role of Cole Varga').selectOption('sales_engineer');
  await page.getByRole('button', { name: 'Change', exact: true }).click();
  await page.getByTestId('confirm-yes').click();
  await expect(page.getByTestId('people-notice')).toContainText('Cole Varga is now Sales engineer (was Support)');

  await page.getByRole('button', { name: 'Disable Cole Varga' }).click();
  await expect(page.getByTestId('confirm-step')).toContainText("Disable Cole Varga's sign-in?");
  await page.getByTestId('confirm-yes').click();
  // The role change's notice stays beside its form; the disable button says what it did next to itself.
  await expect(page.getByTestId('people-notice').filter({ hasText: 'sign-in is disabled' })).toContainText(
    "Cole Varga's sign-in is disabled",
  );

  // The audit trail: names and changes in words, no ids or JSON, and a filter by record number.
  await page.getByRole('navigation', { name: 'Desk' }).getByRole('link', { name: 'Audit trail' }).click();
  const trail = page.getByTestId('audit-table');
  const roleRow = trail.locator('tr', { hasText: 'Changed a role' }).first();
  await expect(roleRow).toContainText('Cole Varga');
  await expect(roleRow).toContainText('Support → Sales engineer');
  await expect(trail).not.toContainText('{"');
  await expect(trail).not.toContainText('user.role_changed');

  // The demo issues two revisions of the EH-301 datasheet; its number typed short finds both, and only them.
  const [sheet] = await query<{ number: string }>(
    "select d.number from datasheets d join sizings s on s.id = d.sizing_id where s.equipment_tag = 'EH-301'",
  );
  const short = sheet!.number.replace(/-0+(\d)/, '-$1');
  expect(short).not.toBe(sheet!.number);
  await page.getByLabel('Record number or id').fill(short);
  await page.getByRole('button', { name: 'Apply filters' }).click();
  await expect(page).toHaveURL((url) => url.searchParams.get('entityId') === short);
  const rows = trail.locator('tbody tr');
  // Its issues, and any copies resent or revisions made by earlier journeys, each name the revision.
  await expect(rows.filter({ hasText: `${sheet!.number} rev A` }).first()).toBeVisible();
  await expect(rows.filter({ hasText: `${sheet!.number} rev B` }).first()).toBeVisible();
  for (const text of await rows.allTextContents()) expect(text).toContain(sheet!.number);
});
