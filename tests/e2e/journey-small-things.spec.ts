import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD } from '../../lib/auth/demo-users';
import { query, signInFor } from './support/scenario';
import { signIn } from './support/sign-in';

/** Runs in the page before its scripts: a developer-tools hook, which React calls on every commit. */
function countReactCommits() {
  const w = window as unknown as { __reactCommits: number; __REACT_DEVTOOLS_GLOBAL_HOOK__: unknown };
  w.__reactCommits = 0;
  w.__REACT_DEVTOOLS_GLOBAL_HOOK__ = {
    supportsFiber: true,
    isDisabled: false,
    renderers: new Map(),
    inject: () => 1,
    checkDCE: () => {},
    onCommitFiberRoot: () => {
      w.__reactCommits += 1;
    },
    onCommitFiberUnmount: () => {},
    onPostCommitFiberRoot: () => {},
  };
}

/** True once React has claimed the element (it keeps its fiber on the DOM node). */
function hydratedByReact(el: Element) {
  return Object.keys(el).some((k) => k.startsWith('__reactFiber$'));
}

test('small things: result in view on a phone, a locked datasheet link shows a page, /mail hydrates cleanly, a favicon', async ({
  page,
  browser,
}) => {
  test.setTimeout(90_000);
  // A phone: the result sits far below the fields, so a summary bar keeps the headline figure in view.
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/size');
  await expect(page.getByTestId('sizing-desk')).toHaveAttribute('data-hydrated', 'true');
  await page.getByTestId('field-flow').fill('1500');
  const bar = page.getByTestId('result-summary-bar');
  await expect(bar).toBeVisible();
  await expect(page.getByTestId('result-summary-figure')).toContainText(/[\d,.]+ kW design duty/, { timeout: 20_000 });
  const box = await bar.boundingBox();
  expect(box!.y + box!.height).toBeLessThanOrEqual(844 + 1);
  const resultTop = await page.getByTestId('result-panel').evaluate((el) => el.getBoundingClientRect().top);
  expect(resultTop).toBeGreaterThan(844);

  // A favicon is declared and served.
  const icon = await page.locator('link[rel="icon"]').first().getAttribute('href');
  expect(icon).toBeTruthy();
  expect((await page.request.get(icon!)).status()).toBe(200);

  // A customer without a subscription opening a datasheet link directly sees a page that says why.
  const [revision] = await query<{ id: string }>(
    `select r.id from datasheet_revisions r join datasheets d on d.id = r.datasheet_id
       join accounts a on a.id = d.account_id
      where a.name = 'Tarnside Polymers'
        and not exists (select 1 from subscriptions s where s.account_id = a.id and s.status in ('active', 'trialing', 'past_due'))
      limit 1`,
  );
  expect(revision, 'the demo scenario issues Tarnside a datasheet and gives it no subscription').toBeTruthy();
  const customer = await browser.newPage();
  await signIn(customer, 'olu.bennet@tarnside.example', DEMO_PASSWORD, '/datasheets');
  await customer.goto(`/api/v1/datasheets/${revision!.id}`);
  await expect(customer).toHaveURL(/\/billing\?locked=datasheet/);
  await expect(customer.getByTestId('datasheet-locked')).toContainText('That datasheet is locked');
  await expect(customer.locator('body')).not.toContainText('"errors"');
  await customer.close();

  // The demo inbox renders its messages without a hydration error.
  const errors: string[] = [];
  const admin = await browser.newPage();
  admin.on('console', (m) => {
    if (m.type() === 'error') errors.push(m.text());
  });
  admin.on('pageerror', (e) => errors.push(e.message));
  await signIn(admin, signInFor.admin.email, signInFor.admin.password, '/mail');
  await admin.addInitScript(countReactCommits);
  await admin.goto('/mail');
  await expect(admin.getByRole('heading', { level: 1 })).toHaveText('Demo mail inbox');
  await expect(admin.getByTestId('mail-message').first()).toBeVisible();
  // React reports hydration mismatches in the same task as its first commit, so once a commit is counted
  // (and the messages belong to React) any mismatch has been reported.
  await admin.waitForFunction(() => (window as unknown as { __reactCommits: number }).__reactCommits > 0);
  expect(await admin.getByTestId('mail-message').first().evaluate(hydratedByReact)).toBe(true);
  expect(errors.filter((e) => /hydrat|did not match|#418|#423|#425/i.test(e))).toEqual([]);
  await admin.close();
});
