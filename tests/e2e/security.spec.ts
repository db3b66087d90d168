import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { secretCanaries } from './support/canaries';
import { signInFor } from './support/scenario';

const root = path.join(__dirname, '..', '..');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const full = path.join(dir, n);
    return statSync(full).isDirectory() ? files(full) : [full];
  });
}

test('responses carry the security headers', async ({ request }) => {
  const res = await request.get('/');
  const h = res.headers();
  expect(h['content-security-policy']).toContain("frame-ancestors 'none'");
  expect(h['content-security-policy']).toContain("object-src 'none'");
  expect(h['content-security-policy']).not.toContain('unsafe-eval');
  expect(h['x-content-type-options']).toBe('nosniff');
  expect(h['referrer-policy']).toBe('strict-origin-when-cross-origin');
  expect(h['x-frame-options']).toBe('DENY');
  expect(h['x-powered-by']).toBeUndefined();
});

test('API answers carry the strict API policy and the common headers; pages keep the page policy', async ({
  request,
}) => {
  const api = await request.get('/api/v1/openapi');
  const h = api.headers();
  expect(h['content-security-policy']).toBe("default-src 'none'; frame-ancestors 'none'");
  expect(h['x-content-type-options']).toBe('nosniff');
  expect(h['x-frame-options']).toBe('DENY');
  expect(h['referrer-policy']).toBe('strict-origin-when-cross-origin');
  const page = await request.get('/size');
  expect(page.headers()['content-security-policy']).toContain("script-src 'self'");
  expect(page.headers()['content-security-policy']).not.toContain("default-src 'none'");
});

test('the session cookie is http-only and SameSite', async ({ request }) => {
  const res = await request.post('/api/auth/sign-in', { data: signInFor.support });
  expect(res.status()).toBe(200);
  const cookie = res.headers()['set-cookie'] ?? '';
  expect(cookie).toMatch(/dw_session=/);
  expect(cookie).toMatch(/HttpOnly/i);
  expect(cookie).toMatch(/SameSite=Lax/i);
});

test('pages work under the Content-Security-Policy (no violation reported)', async ({ page }) => {
  const violations: string[] = [];
  page.on('console', (m) => {
    if (/Content Security Policy|Refused to/i.test(m.text())) violations.push(m.text());
  });
  for (const url of ['/', '/pricing', '/sign-in', '/size']) {
    await page.goto(url);
    await expect(page.locator('body')).toBeVisible();
  }
  expect(violations).toEqual([]);
});

test('no server secret reaches the browser bundles', () => {
  const dir = path.join(root, process.env.NEXT_DIST_DIR ?? '.next-test', 'static');
  const bundle = files(dir).filter((f) => /\.(js|css|json|html)$/.test(f));
  expect(bundle.length).toBeGreaterThan(5);
  const leaks: string[] = [];
  for (const f of bundle) {
    const text = readFileSync(f, 'utf8');
    for (const [name, value] of Object.entries(secretCanaries))
      if (text.includes(value)) leaks.push(`${name} in ${path.relative(root, f)}`);
    if (/postgres(ql)?:\/\/[^"'\s]*@/.test(text)) leaks.push(`a database URL in ${path.relative(root, f)}`);
  }
  expect(leaks).toEqual([]);
});
