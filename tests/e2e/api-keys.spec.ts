import { expect, request, test } from '@playwright/test';
import { e2eBaseUrl } from './ports';
import { signInFor } from './support/scenario';
import { signIn } from './support/sign-in';

const heater = {
  service: 'heater',
  gas: { preset: 'nitrogen' },
  flow: { value: 400, unit: 'kg/h' },
  inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 5, unit: 'barg' } },
  outletTemperature: { value: 180, unit: 'degC' },
};

test('a customer makes an API key, sees it once, sees its use counted under its prefix, and revokes it', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await signIn(page, signInFor.customer.email, signInFor.customer.password, '/api-keys');
  await page.goto('/api-keys');
  await expect(page.getByRole('heading', { name: 'API keys' })).toBeVisible();

  // A bad limit is refused at its field, with the allowed range.
  await page.getByTestId('api-key-name').fill('Estimating workbook');
  await page.getByTestId('api-key-per-minute').fill('5000');
  await page.getByTestId('api-key-create').click();
  await expect(page.getByText('The limit must be 1 to 1000 requests a minute.')).toBeVisible();

  await page.getByTestId('api-key-per-minute').fill('20');
  await page.getByTestId('api-key-create').click();
  const shown = page.getByTestId('api-key-value');
  await expect(shown).toHaveText(/^dwk_[a-z2-9]{8}_[A-Za-z0-9_-]{43}$/);
  const key = (await shown.textContent()) ?? '';
  const prefix = key.split('_').slice(0, 2).join('_');
  const row = page.getByTestId('api-keys-table').getByRole('row').filter({ hasText: 'Estimating workbook' });
  await expect(row).toContainText(`${prefix}_…`);
  expect(await page.content()).toContain(key);

  // A machine client, with no session of its own: the key alone admits it under the key's limit.
  const client = await request.newContext({ baseURL: e2eBaseUrl });
  const calc = () => client.post('/api/v1/calculate', { data: heater, headers: { authorization: `Bearer ${key}` } });
  const ok = await calc();
  expect(ok.status()).toBe(200);
  expect(ok.headers()['ratelimit-policy']).toBe('20;w=60;comment="per API key"');

  // Shown once: after a reload only the prefix is on the page, and today's count is 1.
  await page.reload();
  await expect(page.getByTestId('api-key-value')).toHaveCount(0);
  expect(await page.content()).not.toContain(key);
  await expect(row.getByRole('cell').nth(1)).toHaveText('20');
  await expect(row.getByRole('cell').nth(2)).toHaveText('1');

  page.once('dialog', (d) => void d.accept());
  await row.getByRole('button', { name: 'Revoke Estimating workbook' }).click();
  await expect(row).toContainText('Revoked');
  expect((await calc()).status()).toBe(401);
  await client.dispose();
});
