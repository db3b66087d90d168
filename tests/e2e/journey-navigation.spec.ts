import { expect, test, type Page } from '@playwright/test';
import { query, signInFor } from './support/scenario';
import { signIn } from './support/sign-in';

/** Signs in from the plain sign-in page (no page asked for), as someone following the "Sign in" link. */
async function signInPlain(page: Page, who: keyof typeof signInFor) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(signInFor[who].email);
  await page.getByLabel('Password').fill(signInFor[who].password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('signed-in-as')).toBeVisible();
}

const expectedHome = { sales_engineer: '/size', customer: '/size', support: '/support', admin: '/admin' } as const;
const mustShow = {
  sales_engineer: ['Batch sizing', 'Look-up'],
  customer: ['Batch sizing', 'Subscription'],
  support: ['Look-up', 'Audit trail', 'Demo inbox'],
  admin: ['Batch sizing', 'Look-up', 'Audit trail', 'Demo inbox', 'People'],
} as const;

for (const who of ['sales_engineer', 'customer', 'support', 'admin'] as const) {
  test(`navigation: ${who} lands on their home and every link in their navigation opens a page`, async ({ page }) => {
    test.setTimeout(90_000);
    await signInPlain(page, who);
    await expect(page).toHaveURL((url) => url.pathname === expectedHome[who]);
    const nav = page.getByRole('navigation', { name: 'Desk' });
    for (const label of mustShow[who]) await expect(nav.getByRole('link', { name: label })).toBeVisible();
    const hrefs = await nav.locator('ul a').evaluateAll((as) => as.map((a) => a.getAttribute('href') ?? ''));
    for (const href of hrefs) {
      const res = await page.goto(href);
      expect(res?.status(), href).toBe(200);
      expect(new URL(page.url()).pathname, `${href} redirected`).toBe(href);
      await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
    }
  });
}

test("look-up: a sales engineer finds their customer's datasheet typed without the leading zero, best match first", async ({
  page,
}) => {
  const [ds] = await query<{ number: string; title: string }>(
    `select d.number, s.title from datasheets d join sizings s on s.id = d.sizing_id
      join users u on u.id = s.created_by_user_id where u.email = $1 order by d.number limit 1`,
    [signInFor.sales_engineer.email],
  );
  expect(ds, 'the demo scenario has a datasheet issued on a sizing this engineer made').toBeTruthy();
  const short = ds!.number.replace(/-0+(\d)/, '-$1');
  expect(short).not.toBe(ds!.number);
  // Straight to the look-up (the navigation test above opens it from the menu).
  await signIn(page, signInFor.sales_engineer.email, signInFor.sales_engineer.password, '/support');
  await expect(page).toHaveURL((url) => url.pathname === '/support');
  await expect(page.getByTestId('lookup-scope')).toContainText('your customers');
  await page.getByTestId('lookup-search').fill(short);
  await expect(page.getByTestId('lookup-row').first()).toContainText(ds!.number);
  await expect(page.getByTestId('lookup-row').first()).toContainText(ds!.title);
});
